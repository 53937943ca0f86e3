import { buildRule } from '#shared/schedule/build-rule'
import type { Routine, RoutineInput } from '#shared/schemas/routine'
import { todayIn } from './zone-dates'

export const NEW_ROUTINE_TIME = '08:00'

export function newRoutineValues(timeZone: string): RoutineInput {
  return {
    name: '',
    category: 'welfare',
    instructions: '',
    targetKind: 'tank',
    targetIds: [],
    onlyInUse: true,
    rrule: buildRule({ kind: 'dailyAtTimes', times: [NEW_ROUTINE_TIME] }),
    dtstart: `${todayIn(timeZone)}T${NEW_ROUTINE_TIME}:00`,
    durationMinutes: 5,
    windowBeforeMinutes: 30,
    graceMinutes: 60,
    priority: 'routine',
    assigneeRule: { kind: 'none' },
    requiredReadings: [],
    activeFrom: null,
    activeTo: null,
    paused: false,
    skipDates: [],
    ladderId: null,
  }
}

export function routineValues(routine: Routine): RoutineInput {
  const { id: _id, version: _version, ...values } = routine
  return values
}

export const timeOf = (dtstart: string) => /T(\d{2}:\d{2})/.exec(dtstart)?.[1] ?? ''
export const dateOf = (dtstart: string) => /^(\d{4}-\d{2}-\d{2})/.exec(dtstart)?.[1] ?? ''
export const joinStart = (date: string, time: string) => `${date}T${time || '00:00'}:00`
