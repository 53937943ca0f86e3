import type { PlaybookInput } from '#shared/schemas/playbook'

/** The station's playbooks: what happens around an arrival, a grading, a dispatch and a bath. */
export const DEMO_PLAYBOOKS: PlaybookInput[] = [
  {
    name: 'Fish arrival and quarantine',
    kind: 'arrival',
    description: 'Receiving bins ready the day before; each transport box checked against the receiving water; transport water tested; a sample weighed; into quarantine with daily checks until the veterinarian or welfare officer clears the batch.',
    steps: [
      { title: 'Prepare and test receiving bins', category: 'quarantine', dayOffset: -1, time: '14:00', perTank: true, durationMinutes: 20, requiredReadings: ['temp_c', 'salinity', 'ph', 'tan_mgL', 'no2_mgL', 'do_mgL'], instructions: 'Fill, heat and aerate the bins; match the supplier’s salinity; run the filters seeded from the quarantine starter.' },
      { title: 'Check oxygen supply and backup', category: 'life_support', dayOffset: -1, time: '15:00', perTank: false, durationMinutes: 10, requiredReadings: ['cylinder_bar'], instructions: 'Reserve bank full, battery air pump charged, emergency diffusers tested.' },
      { title: 'Receive consignment and check each transport box', category: 'quarantine', minutesOffset: 0, perTank: false, durationMinutes: 20, priority: 'welfare_critical', instructions: 'Record DO, temperature and pH of every box beside the receiving water (Batch record → Transport box).' },
      { title: 'Transport-water test', category: 'water_quality', minutesOffset: 10, perTank: false, durationMinutes: 15, instructions: 'Alkalinity, pH, total ammonia-N and nitrite-N of the transport water (Batch record → Transport water).' },
      { title: 'Sample weighing (20–30 fish)', category: 'stock', minutesOffset: 20, perTank: false, durationMinutes: 20, instructions: 'Weigh 20–30 fish one after another; the mean sets the batch’s weight and rations.' },
      { title: 'Prophylactic bath, if prescribed', category: 'veterinary', minutesOffset: 40, perTank: false, durationMinutes: 45, instructions: 'Only on the veterinarian’s instruction; use the bath calculator and follow the product label or permit.' },
      { title: 'Transfer into quarantine bins', category: 'quarantine', minutesOffset: 60, perTank: true, durationMinutes: 15, requiredReadings: ['do_mgL', 'temp_c'] },
      { title: 'Daily quarantine check', category: 'quarantine', dayOffset: 1, time: '09:45', repeatDays: 30, perTank: true, durationMinutes: 6, priority: 'welfare_critical', requiredReadings: ['mortalities', 'do_mgL', 'temp_c'] },
      { title: 'First-feed response check', category: 'feeding', dayOffset: 1, time: '10:30', perTank: true, durationMinutes: 5, requiredReadings: ['feed_g'] },
      { title: 'End-of-quarantine review', category: 'veterinary', dayOffset: 30, time: '10:00', perTank: false, durationMinutes: 60, instructions: 'Veterinarian or welfare officer reviews the record and clears (or extends) quarantine.' },
    ],
  },
  {
    name: 'Grading and sample weighing',
    kind: 'grading',
    fastingHours: 24,
    description: 'Feed withheld for 24 hours before handling; checks before and after.',
    steps: [
      { title: 'Pre-handling check', category: 'welfare', minutesOffset: -60, perTank: true, durationMinutes: 3, requiredReadings: ['do_mgL', 'temp_c'] },
      { title: 'Grade, count and sample-weigh', category: 'stock', minutesOffset: 0, perTank: true, durationMinutes: 40 },
      { title: 'Post-handling check', category: 'welfare', dayOffset: 1, time: '08:00', perTank: true, durationMinutes: 3, priority: 'welfare_critical', requiredReadings: ['mortalities', 'behaviour_score'] },
    ],
  },
  {
    name: 'Dispatch',
    kind: 'dispatch',
    fastingHours: 24,
    description: 'Feed withheld before transport; load, dispatch, then clean the emptied tank.',
    steps: [
      { title: 'Pre-dispatch check', category: 'welfare', minutesOffset: -120, perTank: true, durationMinutes: 5, requiredReadings: ['do_mgL', 'temp_c', 'behaviour_score'] },
      { title: 'Load and dispatch', category: 'stock', minutesOffset: 0, perTank: true, durationMinutes: 30 },
      { title: 'Clean and disinfect the emptied tank', category: 'hygiene', dayOffset: 1, time: '10:00', perTank: true, durationMinutes: 45 },
    ],
  },
  {
    name: 'Bath treatment',
    kind: 'treatment',
    description: 'A static bath prescribed by the veterinarian, with checks during and after.',
    steps: [
      { title: 'Prepare the bath', category: 'veterinary', minutesOffset: -30, perTank: false, durationMinutes: 20, instructions: 'Weigh the product with gloves and eye protection; aerate the bath; keep a freshwater flush ready.' },
      { title: 'Bath: watch the fish throughout', category: 'veterinary', minutesOffset: 0, perTank: true, durationMinutes: 60, priority: 'welfare_critical', requiredReadings: ['do_mgL', 'temp_c'] },
      { title: 'Post-bath check', category: 'welfare', minutesOffset: 90, perTank: true, durationMinutes: 5, requiredReadings: ['do_mgL', 'behaviour_score'] },
      { title: 'Next-day check', category: 'welfare', dayOffset: 1, time: '09:00', perTank: true, durationMinutes: 5, requiredReadings: ['mortalities', 'behaviour_score'] },
    ],
  },
]

export const DEMO_CYLINDERS = [
  { code: 'O2-BANK-A', label: 'In-use bank A (2 × 50 L cylinders)', method: 'metric' as const, waterCapacityL: 100, factorLPerPsi: null, compressibility: null, reservePressure: 20, flowLPerMin: 6 },
  { code: 'O2-BANK-B', label: 'Reserve bank B (2 × 50 L cylinders)', method: 'metric' as const, waterCapacityL: 100, factorLPerPsi: null, compressibility: null, reservePressure: 20, flowLPerMin: 6 },
]
