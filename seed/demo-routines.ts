// The demo station's recurring care routines. Targets are codes, resolved when seeding;
// dtstart dates are rewritten to the demo's anchor so the rules run from "today".
import type { AssigneeRule, Category, TargetKind } from '#shared/schemas/routine'

export interface DemoRoutine {
  name: string
  category: Category
  instructions: string
  targetKind: TargetKind
  targets: string[]
  onlyInUse?: boolean
  rrule: string
  time: string
  durationMinutes: number
  graceMinutes: number
  welfareCritical?: boolean
  assignee: AssigneeRule | { kind: 'named'; email: string }
  readings: string[]
}

const NURSERY = ['NUR-T01', 'NUR-T02', 'NUR-T03', 'NUR-T04', 'NUR-T05', 'NUR-T06']
const TRIAL = Array.from({ length: 12 }, (_, i) => `TRL-A${String(i + 1).padStart(2, '0')}`)
const HOLDING = ['TRL-H01', 'TRL-H02', 'TRL-H03']
const QUARANTINE = ['QUA-B01', 'QUA-B02', 'QUA-B03', 'QUA-B04']
const SYSTEMS = ['RAS-1', 'RAS-2', 'RAS-3']
const onShift: AssigneeRule = { kind: 'role_on_shift', role: 'technician' }
const senior = { kind: 'named' as const, email: 'tomas.ferreira@brackenwater.example' }

export const DEMO_ROUTINES: DemoRoutine[] = [
  { name: 'Morning tank check', category: 'welfare', instructions: 'Look at every fish: swimming, colour, appetite signs. Remove and count dead or moribund fish. Read DO and temperature at the outlet.', targetKind: 'tank', targets: [...NURSERY, ...TRIAL, ...HOLDING], rrule: 'FREQ=DAILY', time: '07:30', durationMinutes: 3, graceMinutes: 60, welfareCritical: true, assignee: onShift, readings: ['mortalities', 'do_mgL', 'temp_c'] },
  { name: 'Afternoon tank check', category: 'welfare', instructions: 'Behaviour score 0–3, count any losses, read DO and temperature.', targetKind: 'tank', targets: [...NURSERY, ...TRIAL, ...HOLDING], rrule: 'FREQ=DAILY', time: '14:00', durationMinutes: 2, graceMinutes: 60, welfareCritical: true, assignee: onShift, readings: ['behaviour_score', 'mortalities', 'do_mgL', 'temp_c'] },
  { name: 'Quarantine bin check', category: 'quarantine', instructions: 'Quarantine last: own boots, net and bucket. Check fish, DO, temperature; note any lesions or flashing.', targetKind: 'tank', targets: QUARANTINE, onlyInUse: true, rrule: 'FREQ=DAILY;BYHOUR=9,14;BYMINUTE=45', time: '09:45', durationMinutes: 6, graceMinutes: 60, welfareCritical: true, assignee: onShift, readings: ['mortalities', 'do_mgL', 'temp_c'] },
  { name: 'Feeding – nursery tanks', category: 'feeding', instructions: 'Feed the day’s ration split over four feeds; note the feeding response.', targetKind: 'tank', targets: NURSERY, rrule: 'FREQ=DAILY;BYHOUR=8,10,12,14;BYMINUTE=0', time: '08:00', durationMinutes: 3, graceMinutes: 45, assignee: onShift, readings: ['feed_g'] },
  { name: 'Feeding – trial tanks', category: 'feeding', instructions: 'Feed to satiation by hand; collect uneaten pellets after 30 min and weigh them.', targetKind: 'tank', targets: TRIAL, rrule: 'FREQ=DAILY;BYHOUR=9,14;BYMINUTE=30', time: '09:30', durationMinutes: 5, graceMinutes: 30, assignee: onShift, readings: ['feed_g', 'uneaten_feed_g'] },
  { name: 'Feeding – holding tanks', category: 'feeding', instructions: 'Feed the ration; note the response.', targetKind: 'tank', targets: HOLDING, onlyInUse: true, rrule: 'FREQ=DAILY;BYHOUR=9,14;BYMINUTE=0', time: '09:00', durationMinutes: 4, graceMinutes: 60, assignee: onShift, readings: ['feed_g'] },
  { name: 'Plant room daily check', category: 'life_support', instructions: 'Sump level, drum filter, biofilter, UV lamps, heat pump set-point, make-up water. Note anything unusual.', targetKind: 'system', targets: SYSTEMS, rrule: 'FREQ=DAILY', time: '08:30', durationMinutes: 8, graceMinutes: 90, assignee: onShift, readings: ['temp_c'] },
  { name: 'Oxygen supply and aeration check', category: 'life_support', instructions: 'Read the in-use bank pressure; check the reserve bank and both blowers.', targetKind: 'equipment', targets: ['EQ-O2'], rrule: 'FREQ=DAILY', time: '08:45', durationMinutes: 5, graceMinutes: 90, assignee: onShift, readings: ['cylinder_bar'] },
  { name: 'Water chemistry panel', category: 'water_quality', instructions: 'Sample at the biofilter outlet. TAN and nitrite by test kit, pH by bench meter, salinity by refractometer.', targetKind: 'system', targets: SYSTEMS, rrule: 'FREQ=WEEKLY;BYDAY=MO,WE,FR', time: '10:15', durationMinutes: 20, graceMinutes: 120, assignee: senior, readings: ['tan_mgL', 'no2_mgL', 'ph', 'salinity', 'temp_c'] },
  { name: 'Weekly chemistry: nitrate, alkalinity, CO2', category: 'water_quality', instructions: 'Top up bicarbonate if alkalinity is under 100 mg/L.', targetKind: 'system', targets: SYSTEMS, rrule: 'FREQ=WEEKLY;BYDAY=TU', time: '10:30', durationMinutes: 30, graceMinutes: 240, assignee: senior, readings: ['no3_mgL', 'alkalinity_mgL', 'co2_mgL'] },
  { name: 'Drum filter screen and nozzle service', category: 'maintenance', instructions: 'Inspect the screen for tears; clean the spray nozzles.', targetKind: 'system', targets: SYSTEMS, rrule: 'FREQ=WEEKLY;BYDAY=TH', time: '13:00', durationMinutes: 30, graceMinutes: 1440, assignee: senior, readings: [] },
  { name: 'UV service', category: 'maintenance', instructions: 'Clean the quartz sleeve, log lamp hours, replace lamps at 12 months.', targetKind: 'system', targets: SYSTEMS, rrule: 'FREQ=MONTHLY;INTERVAL=3;BYDAY=1MO', time: '13:00', durationMinutes: 45, graceMinutes: 4320, assignee: senior, readings: [] },
  { name: 'Tank cleaning', category: 'hygiene', instructions: 'Siphon, wipe walls, check standpipes and screens.', targetKind: 'tank', targets: [...NURSERY, ...TRIAL], rrule: 'FREQ=WEEKLY;BYDAY=TU,FR', time: '11:00', durationMinutes: 10, graceMinutes: 1440, assignee: onShift, readings: [] },
  { name: 'DO meter calibration', category: 'calibration', instructions: 'Air-saturation calibration; change the membrane if the reading drifts.', targetKind: 'equipment', targets: ['EQ-DO-HH1', 'EQ-DO-HH2'], rrule: 'FREQ=WEEKLY;BYDAY=MO', time: '15:00', durationMinutes: 25, graceMinutes: 1440, assignee: senior, readings: [] },
  { name: 'pH meter two-point calibration', category: 'calibration', instructions: 'Buffers 7 and 10; record slope and offset in the meter log.', targetKind: 'equipment', targets: ['EQ-PH-BENCH'], rrule: 'FREQ=WEEKLY;BYDAY=MO,WE,FR', time: '09:45', durationMinutes: 10, graceMinutes: 30, assignee: senior, readings: [] },
  { name: 'Alarm and call-out test', category: 'alarms', instructions: 'Trigger a DO-low test input; confirm the on-call phone is reached and the emergency oxygen opens.', targetKind: 'equipment', targets: ['EQ-ALARM'], rrule: 'FREQ=WEEKLY;BYDAY=FR', time: '14:00', durationMinutes: 30, graceMinutes: 120, assignee: senior, readings: [] },
  { name: 'Standby generator test under load', category: 'maintenance', instructions: 'Run 30 minutes under load; check fuel and the transfer switch.', targetKind: 'equipment', targets: ['EQ-GEN'], rrule: 'FREQ=MONTHLY;BYDAY=1TU', time: '10:00', durationMinutes: 60, graceMinutes: 4320, assignee: senior, readings: [] },
  { name: 'Stores check', category: 'stores', instructions: 'Bicarbonate, salt, feed days on hand, reagents, full oxygen cylinders, disinfectant.', targetKind: 'facility', targets: [], rrule: 'FREQ=WEEKLY;BYDAY=FR', time: '11:00', durationMinutes: 20, graceMinutes: 1440, assignee: senior, readings: [] },
  { name: 'Weekly health and quarantine review', category: 'veterinary', instructions: 'Walk the nursery, trial hall and quarantine in that order; record health status.', targetKind: 'area', targets: ['NUR', 'TRL', 'QUA'], rrule: 'FREQ=WEEKLY;BYDAY=WE', time: '10:00', durationMinutes: 60, graceMinutes: 1440, assignee: { kind: 'named', email: 'ruth.amsel@brackenwater.example' }, readings: [] },
  { name: 'Weekly records review and sign-off', category: 'records', instructions: 'Review the week’s readings, flags and missed tasks; sign off.', targetKind: 'facility', targets: [], rrule: 'FREQ=WEEKLY;BYDAY=MO', time: '16:00', durationMinutes: 30, graceMinutes: 1440, assignee: { kind: 'named', email: 'maren.holloway@brackenwater.example' }, readings: [] },
  { name: 'On-call handover', category: 'on_call', instructions: 'Outgoing and incoming on-call person go through open flags, rechecks and the weekend plan; test call.', targetKind: 'facility', targets: [], rrule: 'FREQ=WEEKLY;BYDAY=FR', time: '16:15', durationMinutes: 15, graceMinutes: 30, assignee: { kind: 'on_call' }, readings: [] },
]
