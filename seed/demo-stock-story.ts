// A year of the station's stock register, invented: deliveries with their permits and transport
// water, splits and gradings between tanks, deaths with causes, culls, research sampling and
// dispatch. Days are counted back from the demo's "today"; tank codes are the demo's own.
import { generator } from './demo-history'

export interface StoryMovement {
  batch: string
  daysAgo: number
  time: string
  kind: 'arrival' | 'transfer' | 'grading' | 'mortality' | 'cull' | 'sampling' | 'dispatch'
  from?: string
  to?: string
  /** Fish; 'rest' moves or sends out everything the batch still has in the tank. */
  count: number | 'rest'
  meanWeightG?: number
  origin?: string
  permitRef?: string
  healthCertificateRef?: string
  transportWater?: { tempC: number; pH: number; doMgL: number }
  destination?: string
  reason?: string
  cause?: string
  necropsy?: boolean
  note?: string
}

const NURSERY = ['NUR-T01', 'NUR-T02', 'NUR-T03', 'NUR-T04', 'NUR-T05', 'NUR-T06']
const TRIAL = Array.from({ length: 12 }, (_, i) => `TRL-A${String(i + 1).padStart(2, '0')}`)
const TALLOWMERE = 'Tallowmere Hatchery (invented)'
const QUOLLRIDGE = 'Quollridge Fingerlings (invented)'
const STRESS = 'Handling or transport stress'

/** A few deaths now and then, from a seeded generator so every fresh demo tells the same story. */
function background(batch: string, tanks: string[], fromDaysAgo: number, toDaysAgo: number, chance: number, seed: number): StoryMovement[] {
  const r = generator(seed)
  const causes = ['unknown', 'unknown', 'unknown', 'Disease (suspected)', 'Jumped out', 'Aggression or cannibalism']
  const out: StoryMovement[] = []
  for (let d = fromDaysAgo; d > toDaysAgo; d -= 3) {
    for (const tank of tanks) {
      if (r.next() >= chance) continue
      out.push({
        batch,
        daysAgo: d,
        time: '07:40',
        kind: 'mortality',
        from: tank,
        count: 1 + Math.floor(r.next() * 3),
        cause: causes[Math.floor(r.next() * causes.length)],
      })
    }
  }
  return out
}

export const DEMO_STOCK_STORY: StoryMovement[] = [
  // Last year's spring cohort: reared in the nursery, grown on in holding, released and sold.
  {
    batch: 'B-SPR-25',
    daysAgo: 360,
    time: '10:15',
    kind: 'arrival',
    to: 'NUR-T01',
    count: 2400,
    meanWeightG: 0.9,
    origin: TALLOWMERE,
    permitRef: 'GP-24-0871 (invented)',
    healthCertificateRef: 'TH-HC-2411 (invented)',
    transportWater: { tempC: 27.5, pH: 7.8, doMgL: 7.9 },
  },
  {
    batch: 'B-SPR-25',
    daysAgo: 360,
    time: '10:40',
    kind: 'arrival',
    to: 'NUR-T02',
    count: 2400,
    meanWeightG: 0.9,
    origin: TALLOWMERE,
    permitRef: 'GP-24-0871 (invented)',
    healthCertificateRef: 'TH-HC-2411 (invented)',
    transportWater: { tempC: 27.3, pH: 7.8, doMgL: 8.1 },
    note: 'Second bag set of the same delivery',
  },
  { batch: 'B-SPR-25', daysAgo: 359, time: '07:45', kind: 'mortality', from: 'NUR-T01', count: 18, cause: STRESS },
  { batch: 'B-SPR-25', daysAgo: 359, time: '07:50', kind: 'mortality', from: 'NUR-T02', count: 11, cause: STRESS },
  { batch: 'B-SPR-25', daysAgo: 340, time: '09:00', kind: 'transfer', from: 'NUR-T01', to: 'NUR-T03', count: 800, note: 'Split to halve the density' },
  { batch: 'B-SPR-25', daysAgo: 340, time: '09:30', kind: 'transfer', from: 'NUR-T02', to: 'NUR-T04', count: 800 },
  ...background('B-SPR-25', NURSERY.slice(0, 4), 338, 302, 0.25, 2501),
  {
    batch: 'B-SPR-25',
    daysAgo: 300,
    time: '08:30',
    kind: 'grading',
    from: 'NUR-T01',
    to: 'NUR-T05',
    count: 600,
    meanWeightG: 6.8,
    note: 'Shooters graded out',
  },
  {
    batch: 'B-SPR-25',
    daysAgo: 300,
    time: '09:10',
    kind: 'grading',
    from: 'NUR-T03',
    to: 'NUR-T06',
    count: 300,
    meanWeightG: 3.1,
    note: 'Smallest graded out',
  },
  {
    batch: 'B-SPR-25',
    daysAgo: 299,
    time: '11:00',
    kind: 'cull',
    from: 'NUR-T06',
    count: 40,
    reason: 'Deformed opercula found at grading; euthanised under the approved protocol',
  },
  ...background('B-SPR-25', NURSERY, 297, 252, 0.2, 2502),
  {
    batch: 'B-SPR-25',
    daysAgo: 250,
    time: '10:00',
    kind: 'sampling',
    from: 'NUR-T01',
    count: 30,
    reason: 'Growth and histology sampling, protocol BW-24-03 (invented)',
  },
  ...NURSERY.map((tank, i): StoryMovement => ({
    batch: 'B-SPR-25',
    daysAgo: 220,
    time: `0${8 + Math.floor(i / 2)}:${i % 2 ? '30' : '00'}`,
    kind: 'transfer',
    from: tank,
    to: i < 3 ? 'TRL-H01' : 'TRL-H02',
    count: 'rest',
  })),
  ...background('B-SPR-25', ['TRL-H01', 'TRL-H02'], 218, 152, 0.35, 2503),
  {
    batch: 'B-SPR-25',
    daysAgo: 150,
    time: '06:30',
    kind: 'dispatch',
    from: 'TRL-H01',
    count: 1200,
    destination: 'Stock-enhancement release, Kessling Creek (invented permit SE-25-14)',
  },
  {
    batch: 'B-SPR-25',
    daysAgo: 130,
    time: '06:30',
    kind: 'dispatch',
    from: 'TRL-H01',
    count: 'rest',
    destination: 'Marrowbay Aquaculture grow-out (invented)',
  },
  {
    batch: 'B-SPR-25',
    daysAgo: 130,
    time: '07:15',
    kind: 'dispatch',
    from: 'TRL-H02',
    count: 'rest',
    destination: 'Marrowbay Aquaculture grow-out (invented)',
  },

  // The feeding trial: delivered to holding, 52 fish into each trial tank, sampled at set weeks.
  {
    batch: 'B-TRIAL',
    daysAgo: 112,
    time: '11:20',
    kind: 'arrival',
    to: 'TRL-H01',
    count: 640,
    meanWeightG: 9.5,
    origin: QUOLLRIDGE,
    permitRef: 'GP-26-0112 (invented)',
    healthCertificateRef: 'QF-HC-0412 (invented)',
    transportWater: { tempC: 27.8, pH: 7.7, doMgL: 8.4 },
  },
  { batch: 'B-TRIAL', daysAgo: 111, time: '07:35', kind: 'mortality', from: 'TRL-H01', count: 6, cause: STRESS },
  { batch: 'B-TRIAL', daysAgo: 110, time: '07:35', kind: 'mortality', from: 'TRL-H01', count: 3, cause: STRESS, necropsy: true },
  ...TRIAL.map((tank): StoryMovement => ({
    batch: 'B-TRIAL',
    daysAgo: 100,
    time: '09:00',
    kind: 'transfer',
    from: 'TRL-H01',
    to: tank,
    count: 52,
    meanWeightG: 14.2,
  })),
  {
    batch: 'B-TRIAL',
    daysAgo: 100,
    time: '11:00',
    kind: 'cull',
    from: 'TRL-H01',
    count: 'rest',
    reason: 'Runts and fin damage below trial entry size; euthanised under the approved protocol',
  },
  ...background('B-TRIAL', TRIAL, 98, 58, 0.08, 2601),
  ...TRIAL.map((tank): StoryMovement => ({
    batch: 'B-TRIAL',
    daysAgo: 56,
    time: '10:00',
    kind: 'sampling',
    from: tank,
    count: 2,
    reason: 'Trial week 6 weigh-in: 2 fish per tank for histology (protocol BW-26-02, invented)',
  })),
  ...background('B-TRIAL', TRIAL, 55, 30, 0.06, 2602),
  ...TRIAL.map((tank): StoryMovement => ({
    batch: 'B-TRIAL',
    daysAgo: 28,
    time: '10:00',
    kind: 'sampling',
    from: tank,
    count: 2,
    reason: 'Trial week 10 weigh-in: 2 fish per tank for histology (protocol BW-26-02, invented)',
  })),
  {
    batch: 'B-TRIAL',
    daysAgo: 20,
    time: '07:40',
    kind: 'mortality',
    from: 'TRL-A07',
    count: 4,
    cause: 'Equipment failure',
    necropsy: true,
    note: 'Air line to the diffuser split overnight; DO 3.1 mg/L at the morning check',
  },

  // This year's nursery cohort: two bag sets, split over the six nursery tanks, one bad week.
  {
    batch: 'B-NUR-APR',
    daysAgo: 49,
    time: '10:05',
    kind: 'arrival',
    to: 'NUR-T01',
    count: 2500,
    meanWeightG: 1.5,
    origin: QUOLLRIDGE,
    permitRef: 'GP-26-0388 (invented)',
    healthCertificateRef: 'QF-HC-0437 (invented)',
    transportWater: { tempC: 28.1, pH: 7.9, doMgL: 8.0 },
  },
  {
    batch: 'B-NUR-APR',
    daysAgo: 49,
    time: '10:30',
    kind: 'arrival',
    to: 'NUR-T02',
    count: 2500,
    meanWeightG: 1.5,
    origin: QUOLLRIDGE,
    permitRef: 'GP-26-0388 (invented)',
    healthCertificateRef: 'QF-HC-0437 (invented)',
    transportWater: { tempC: 28.0, pH: 7.9, doMgL: 8.2 },
  },
  { batch: 'B-NUR-APR', daysAgo: 48, time: '07:40', kind: 'mortality', from: 'NUR-T01', count: 14, cause: STRESS },
  { batch: 'B-NUR-APR', daysAgo: 48, time: '07:45', kind: 'mortality', from: 'NUR-T02', count: 9, cause: STRESS },
  { batch: 'B-NUR-APR', daysAgo: 45, time: '09:00', kind: 'transfer', from: 'NUR-T01', to: 'NUR-T03', count: 830 },
  { batch: 'B-NUR-APR', daysAgo: 45, time: '09:20', kind: 'transfer', from: 'NUR-T01', to: 'NUR-T05', count: 830 },
  { batch: 'B-NUR-APR', daysAgo: 45, time: '09:40', kind: 'transfer', from: 'NUR-T02', to: 'NUR-T04', count: 830 },
  { batch: 'B-NUR-APR', daysAgo: 45, time: '10:00', kind: 'transfer', from: 'NUR-T02', to: 'NUR-T06', count: 830 },
  {
    batch: 'B-NUR-APR',
    daysAgo: 41,
    time: '07:35',
    kind: 'mortality',
    from: 'NUR-T02',
    count: 68,
    cause: 'Water quality',
    necropsy: true,
    note: 'Gasping at the surface; salinity step the day before',
  },
  { batch: 'B-NUR-APR', daysAgo: 40, time: '07:35', kind: 'mortality', from: 'NUR-T02', count: 41, cause: 'Water quality' },
  ...background('B-NUR-APR', NURSERY, 39, 22, 0.3, 2701),
  { batch: 'B-NUR-APR', daysAgo: 21, time: '08:30', kind: 'grading', from: 'NUR-T03', to: 'NUR-T05', count: 120, meanWeightG: 9.4 },
  { batch: 'B-NUR-APR', daysAgo: 21, time: '09:00', kind: 'grading', from: 'NUR-T04', to: 'NUR-T06', count: 95, meanWeightG: 9.1 },
  {
    batch: 'B-NUR-APR',
    daysAgo: 20,
    time: '11:00',
    kind: 'cull',
    from: 'NUR-T06',
    count: 22,
    reason: 'Cannibal shooters found at grading; euthanised under the approved protocol',
  },
  ...background('B-NUR-APR', NURSERY, 19, 14, 0.3, 2702),

  // Into quarantine last week.
  {
    batch: 'B-QUA-NEW',
    daysAgo: 6,
    time: '09:50',
    kind: 'arrival',
    to: 'QUA-B01',
    count: 400,
    meanWeightG: 2.1,
    origin: TALLOWMERE,
    permitRef: 'GP-26-0502 (invented)',
    healthCertificateRef: 'TH-HC-2604 (invented)',
    transportWater: { tempC: 26.9, pH: 7.6, doMgL: 8.8 },
  },
  {
    batch: 'B-QUA-NEW',
    daysAgo: 6,
    time: '11:30',
    kind: 'transfer',
    from: 'QUA-B01',
    to: 'QUA-B02',
    count: 200,
    note: 'Split over the two bins after tempering',
  },
]
