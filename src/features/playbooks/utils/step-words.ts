import type { PlaybookStep } from '#shared/schemas/playbook'

export type StepTiming = Pick<PlaybookStep, 'dayOffset' | 'time' | 'minutesOffset' | 'repeatDays'>

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`

function duration(minutes: number): string {
  const h = Math.floor(minutes / 60)
  const m = minutes % 60
  if (h === 0) return `${m} min`
  return m === 0 ? `${h} h` : `${h} h ${m} min`
}

/** "1 day before", "on the day", "the next day", "30 days after". */
function dayWords(offset: number): string {
  if (offset === 0) return 'on the day'
  if (offset === 1) return 'the next day'
  return offset < 0 ? `${plural(-offset, 'day')} before` : `${plural(offset, 'day')} after`
}

/** "from the next day", "from 2 days before", "from the day itself". */
function fromWords(offset: number): string {
  if (offset === 0) return 'from the day itself'
  if (offset === 1) return 'from the next day'
  return `from ${dayWords(offset)}`
}

/** Minutes and days from the start as "+10 min", "−2 h", "+1 day 30 min", or "at the start". */
function offsetWords(days: number, minutes: number): string {
  const total = days * 1440 + minutes
  if (total === 0) return 'at the start'
  const sign = total < 0 ? '−' : '+'
  const abs = Math.abs(total)
  const d = Math.floor(abs / 1440)
  const rest = abs % 1440
  const parts = [d > 0 ? plural(d, 'day') : '', rest > 0 ? duration(rest) : ''].filter(Boolean)
  return `${sign}${parts.join(' ')}`
}

/** When a playbook step falls, in the words a technician would use. */
export function describeStepTiming(step: StepTiming): string {
  if (step.time) {
    if (step.repeatDays > 1) return `daily for ${plural(step.repeatDays, 'day')} ${fromWords(step.dayOffset)} at ${step.time}`
    return `${dayWords(step.dayOffset)} at ${step.time}`
  }
  const at = offsetWords(step.dayOffset, step.minutesOffset)
  return step.repeatDays > 1 ? `daily for ${plural(step.repeatDays, 'day')} from ${at === 'at the start' ? 'the start' : at}` : at
}
