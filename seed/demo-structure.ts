// The invented demo facility: a warm-water research station with a nursery, a trial hall,
// a plant room and a quarantine room. Names, codes and people are invented.
import type { Facility } from '#shared/schemas/facility'

export const DEMO_FACILITY: Omit<Facility, 'id' | 'defaultLadderId' | 'fastLadderId'> = {
  name: 'Brackenwater Aquatic Research Station',
  timeZone: 'Australia/Brisbane',
  handoverTime: '08:00',
  quarantineDays: 30,
  arrivalTempDiffLimitC: 2,
  minOxygenHours: 24,
  digestTime: '07:00',
}

export const DEMO_AREAS = [
  { code: 'NUR', name: 'Nursery Hall', roundOrder: 10, quarantine: false },
  { code: 'TRL', name: 'Trial Hall', roundOrder: 20, quarantine: false },
  { code: 'PLT', name: 'Plant Room & Services', roundOrder: 30, quarantine: false },
  { code: 'QUA', name: 'Quarantine Room', roundOrder: 40, quarantine: true },
]

export const DEMO_SYSTEMS = [
  { code: 'RAS-1', name: 'Nursery RAS', area: 'NUR', volumeL: 20000, salinitySetpoint: 15 },
  { code: 'RAS-2', name: 'Trial RAS', area: 'TRL', volumeL: 16000, salinitySetpoint: 2 },
  { code: 'RAS-3', name: 'Holding RAS', area: 'TRL', volumeL: 30000, salinitySetpoint: 15 },
  { code: 'QB', name: 'Quarantine bins (stand-alone)', area: 'QUA', volumeL: 2000, salinitySetpoint: 15 },
]

const range = (n: number) => Array.from({ length: n }, (_, i) => String(i + 1).padStart(2, '0'))

export const DEMO_TANKS = [
  ...range(6).map((n) => ({
    code: `NUR-T${n}`,
    name: `Nursery tank ${Number(n)}`,
    area: 'NUR',
    system: 'RAS-1',
    volumeL: 2500,
    kind: 'tank' as const,
    inUse: true,
  })),
  ...range(12).map((n) => ({ code: `TRL-A${n}`, name: `Trial tank A${n}`, area: 'TRL', system: 'RAS-2', volumeL: 1000, kind: 'tank' as const, inUse: true })),
  ...range(3).map((n) => ({
    code: `TRL-H${n}`,
    name: `Holding tank H${n}`,
    area: 'TRL',
    system: 'RAS-3',
    volumeL: 8000,
    kind: 'tank' as const,
    inUse: n !== '03',
  })),
  ...range(4).map((n) => ({
    code: `QUA-B${n}`,
    name: `Quarantine bin B${n}`,
    area: 'QUA',
    system: 'QB',
    volumeL: 500,
    kind: 'bin' as const,
    inUse: n === '01' || n === '02',
  })),
]

export const DEMO_EQUIPMENT = [
  { code: 'EQ-DO-HH1', name: 'Handheld DO/temperature meter 1 (rounds)', kind: 'DO meter', area: 'PLT' },
  { code: 'EQ-DO-HH2', name: 'Handheld DO/temperature meter 2 (quarantine only)', kind: 'DO meter', area: 'QUA' },
  { code: 'EQ-PH-BENCH', name: 'Bench pH meter', kind: 'pH meter', area: 'PLT' },
  { code: 'EQ-GEN', name: 'Standby diesel generator', kind: 'Generator', area: 'PLT' },
  { code: 'EQ-O2', name: 'Oxygen cylinder manifold (in-use and reserve banks)', kind: 'Oxygen supply', area: 'PLT' },
  { code: 'EQ-BLOW', name: 'Duty/standby blowers', kind: 'Blowers', area: 'PLT' },
  { code: 'EQ-ALARM', name: 'Alarm panel and call-out', kind: 'Alarm system', area: 'PLT' },
]

/**
 * Batches: arrival dates are days before the demo's "today", so the demo never ages. Counts and
 * tanks are then set from the stock register the demo writes (demo-stock-story.ts).
 */
export const DEMO_BATCHES = [
  {
    code: 'B-SPR-25',
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Tallowmere Hatchery (invented)',
    daysAgo: 360,
    count: 0,
    meanWeightG: 310,
    tanks: [] as string[],
    status: 'dispatched' as const,
    feedRatePct: null,
  },
  {
    code: 'B-NUR-APR',
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Quollridge Fingerlings (invented)',
    daysAgo: 49,
    count: 4750,
    meanWeightG: 18.2,
    tanks: ['NUR-T01', 'NUR-T02', 'NUR-T03', 'NUR-T04', 'NUR-T05', 'NUR-T06'],
    status: 'active' as const,
    feedRatePct: 3,
  },
  {
    code: 'B-TRIAL',
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Quollridge Fingerlings (invented)',
    daysAgo: 112,
    count: 576,
    meanWeightG: 61.5,
    tanks: ['TRL-A01', 'TRL-A02', 'TRL-A03', 'TRL-A04', 'TRL-A05', 'TRL-A06', 'TRL-A07', 'TRL-A08', 'TRL-A09', 'TRL-A10', 'TRL-A11', 'TRL-A12'],
    status: 'active' as const,
    feedRatePct: 2.5,
  },
  {
    code: 'B-QUA-NEW',
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Tallowmere Hatchery (invented)',
    daysAgo: 6,
    count: 400,
    meanWeightG: 2.1,
    tanks: ['QUA-B01', 'QUA-B02'],
    status: 'quarantine' as const,
    feedRatePct: 2,
  },
]
