import type { ShiftPatternInput } from '#shared/schemas/roster'

type Pattern = Omit<ShiftPatternInput, 'personId' | 'from' | 'to'> & { email: string }

/** The demo station's usual week: two technicians and the senior on weekdays, a casual at weekends. */
export const DEMO_SHIFT_PATTERNS: Pattern[] = [
  { email: 'priya.nandakumar@brackenwater.example', weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'], start: '07:00', end: '15:30', kind: 'early' },
  { email: 'josh.kettering@brackenwater.example', weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'], start: '08:30', end: '17:00', kind: 'day' },
  { email: 'tomas.ferreira@brackenwater.example', weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'], start: '07:30', end: '16:00', kind: 'day' },
  { email: 'sione.taufa@brackenwater.example', weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'], start: '08:00', end: '16:30', kind: 'day' },
  { email: 'maren.holloway@brackenwater.example', weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'], start: '08:00', end: '16:30', kind: 'day' },
  { email: 'ana.lutui@brackenwater.example', weekdays: ['SA', 'SU'], start: '07:00', end: '15:00', kind: 'weekend' },
]

export const DEMO_ON_CALL = [
  'tomas.ferreira@brackenwater.example',
  'priya.nandakumar@brackenwater.example',
  'josh.kettering@brackenwater.example',
  'maren.holloway@brackenwater.example',
]
