import { DateTime } from 'luxon'
import type { PlaybookStep } from '../schemas/playbook'

export interface StepOccurrence {
  /** Local wall time in the facility's zone, `YYYY-MM-DDTHH:mm:ss`. */
  local: string
  utc: Date
}

/**
 * When each occurrence of a playbook step falls for an event starting at `eventLocal` in
 * `zone`: a set time of day on the event's date plus the day offset, or the event's start
 * plus the minutes offset; repeated daily when `repeatDays` > 1. Wall-clock times hold
 * across DST changes; a time that does not exist moves forward.
 */
export function stepOccurrences(
  step: Pick<PlaybookStep, 'dayOffset' | 'time' | 'minutesOffset' | 'repeatDays'>,
  eventLocal: string,
  zone: string,
): StepOccurrence[] {
  const start = DateTime.fromISO(eventLocal, { zone })
  if (!start.isValid) throw new Error(`Invalid event start "${eventLocal}"`)
  const out: StepOccurrence[] = []
  for (let day = 0; day < step.repeatDays; day++) {
    let at: DateTime
    if (step.time) {
      const [hour, minute] = step.time.split(':').map(Number)
      at = start
        .startOf('day')
        .plus({ days: step.dayOffset + day })
        .set({ hour, minute, second: 0, millisecond: 0 })
    } else {
      at = start.plus({ days: step.dayOffset + day }).plus({ minutes: step.minutesOffset })
    }
    out.push({ local: at.toFormat("yyyy-MM-dd'T'HH:mm:ss"), utc: at.toJSDate() })
  }
  return out
}
