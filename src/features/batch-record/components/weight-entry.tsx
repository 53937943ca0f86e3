import { Plus } from 'lucide-react'
import { useId, useRef, useState } from 'react'
import { Button } from '../../../components/ui/button'
import { readWeight } from '../utils/weights'

/** One box for one fish after another: Enter adds the weight and clears the box for the next. */
export function WeightEntryField({ count, onAdd, disabled }: { count: number; onAdd: (grams: number, decimals: number) => void; disabled: boolean }) {
  const id = useId()
  const input = useRef<HTMLInputElement>(null)
  const [text, setText] = useState('')
  const [error, setError] = useState<string | null>(null)

  const add = () => {
    const read = readWeight(text)
    if ('error' in read) {
      setError(read.error)
    } else {
      onAdd(read.grams, read.decimals)
      setText('')
      setError(null)
    }
    input.current?.focus()
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        Weight of fish {count + 1} (g)
      </label>
      <div className="flex gap-2">
        <input
          ref={input}
          id={id}
          value={text}
          disabled={disabled}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={(e) => {
            if (e.key !== 'Enter') return
            e.preventDefault()
            add()
          }}
          inputMode="decimal"
          enterKeyHint="next"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-help`}
          className="min-h-14 min-w-0 flex-1 rounded-lg border-2 border-tide-300 bg-white px-4 text-2xl font-semibold tabular-nums focus:border-tide-600"
        />
        <Button type="button" onClick={add} disabled={disabled} className="min-h-14" aria-label="Add weight">
          <Plus aria-hidden className="size-6" /> Add
        </Button>
      </div>
      <p id={`${id}-help`} className={error ? 'text-sm font-semibold text-alarm-700' : 'text-sm text-tide-600'} role={error ? 'alert' : undefined}>
        {error ?? 'Press Enter after each fish.'}
      </p>
    </div>
  )
}
