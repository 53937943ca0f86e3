import { Waves } from 'lucide-react'

export function RoundEmpty() {
  return (
    <div className="flex flex-col items-center gap-2 rounded-2xl bg-white p-8 text-center ring-1 ring-tide-200">
      <Waves aria-hidden className="size-10 text-tide-400" />
      <p className="text-lg font-semibold text-tide-900">Nothing on your round today</p>
      <p className="text-tide-700">No tasks are assigned to you or waiting to be taken. New ones show up here as soon as they are made.</p>
    </div>
  )
}
