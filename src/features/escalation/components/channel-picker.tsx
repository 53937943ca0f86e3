import { BellRing, Mail, MessageSquareText, type LucideIcon } from 'lucide-react'
import { CHANNELS, type Channel } from '#shared/schemas/ladder'

export const CHANNEL_LOOK: Record<Channel, { label: string; icon: LucideIcon }> = {
  email: { label: 'E-mail', icon: Mail },
  sms: { label: 'Text message', icon: MessageSquareText },
  push: { label: 'Push to the app', icon: BellRing },
}

/** Tick the channels a step uses or a person accepts; each box is a 44 px target. */
export function ChannelPicker({
  label,
  value,
  onChange,
  error,
  disabled = [],
}: {
  label: string
  value: Channel[]
  onChange: (v: Channel[]) => void
  error?: string
  disabled?: Channel[]
}) {
  const toggle = (c: Channel, on: boolean) => onChange(CHANNELS.filter((x) => (x === c ? on : value.includes(x))))
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="font-semibold text-tide-900">{label}</legend>
      <div className="flex flex-wrap gap-2">
        {CHANNELS.map((c) => {
          const look = CHANNEL_LOOK[c]
          return (
            <label
              key={c}
              className="inline-flex min-h-11 items-center gap-2 rounded-lg border border-tide-200 px-3 text-tide-900 has-[:checked]:border-tide-600 has-[:checked]:bg-tide-50 has-[:disabled]:opacity-60"
            >
              <input
                type="checkbox"
                className="size-5 accent-tide-700"
                checked={value.includes(c)}
                disabled={disabled.includes(c)}
                onChange={(e) => toggle(c, e.target.checked)}
              />
              <look.icon aria-hidden className="size-4 text-tide-600" /> {look.label}
            </label>
          )
        })}
      </div>
      {error && <p className="text-sm font-semibold text-alarm-700">{error}</p>}
    </fieldset>
  )
}
