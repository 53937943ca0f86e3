// The reading catalogue. Physical limits bound what can be typed at all; the facility-wide
// bands are the demo station's working ranges for warm-water barramundi (see the trade notes).
type Bounds = { okMin: number | null; okMax: number | null; criticalMin: number | null; criticalMax: number | null }
const b = (okMin: number | null, okMax: number | null, criticalMin: number | null, criticalMax: number | null): Bounds => ({
  okMin,
  okMax,
  criticalMin,
  criticalMax,
})

export const DEMO_PARAMETERS: Array<{
  key: string
  name: string
  unit: string
  decimals: number
  physicalMin: number
  physicalMax: number
  derived?: boolean
  bands?: Bounds
}> = [
  { key: 'temp_c', name: 'Temperature', unit: '°C', decimals: 1, physicalMin: -2, physicalMax: 45, bands: b(26.5, 31, 24, 33) },
  { key: 'do_mgL', name: 'Dissolved oxygen', unit: 'mg/L', decimals: 1, physicalMin: 0, physicalMax: 30, bands: b(5, 10.5, 4, null) },
  { key: 'do_pct', name: 'DO saturation', unit: '% sat', decimals: 0, physicalMin: 0, physicalMax: 400, derived: true, bands: b(70, 140, 55, null) },
  { key: 'ph', name: 'pH', unit: 'pH', decimals: 2, physicalMin: 0, physicalMax: 14, bands: b(7, 8.2, 6.8, 8.5) },
  { key: 'tan_mgL', name: 'Total ammonia-N', unit: 'mg/L TAN-N', decimals: 2, physicalMin: 0, physicalMax: 100, bands: b(0, 1, null, 2) },
  {
    key: 'nh3_mgL',
    name: 'Un-ionised ammonia-N',
    unit: 'mg/L NH3-N',
    decimals: 3,
    physicalMin: 0,
    physicalMax: 50,
    derived: true,
    bands: b(0, 0.02, null, 0.05),
  },
  { key: 'no2_mgL', name: 'Nitrite-N', unit: 'mg/L NO2-N', decimals: 2, physicalMin: 0, physicalMax: 100, bands: b(0, 0.5, null, 1) },
  { key: 'no3_mgL', name: 'Nitrate-N', unit: 'mg/L NO3-N', decimals: 0, physicalMin: 0, physicalMax: 1000, bands: b(0, 90, null, 150) },
  { key: 'alkalinity_mgL', name: 'Alkalinity', unit: 'mg/L CaCO3', decimals: 0, physicalMin: 0, physicalMax: 1000, bands: b(100, 250, 50, null) },
  { key: 'salinity', name: 'Salinity', unit: 'g/kg', decimals: 1, physicalMin: 0, physicalMax: 45 },
  { key: 'co2_mgL', name: 'Carbon dioxide', unit: 'mg/L CO2', decimals: 1, physicalMin: 0, physicalMax: 200, bands: b(0, 15, null, 25) },
  { key: 'mortalities', name: 'Mortalities removed', unit: 'count', decimals: 0, physicalMin: 0, physicalMax: 100000, bands: b(0, 2, null, 8) },
  {
    key: 'behaviour_score',
    name: 'Behaviour score (0 normal – 3 severe)',
    unit: 'score',
    decimals: 0,
    physicalMin: 0,
    physicalMax: 3,
    bands: b(0, 1, null, 2),
  },
  { key: 'feed_g', name: 'Feed given', unit: 'g', decimals: 0, physicalMin: 0, physicalMax: 100000 },
  { key: 'uneaten_feed_g', name: 'Uneaten feed collected', unit: 'g', decimals: 1, physicalMin: 0, physicalMax: 100000 },
  { key: 'cylinder_bar', name: 'Cylinder pressure', unit: 'bar', decimals: 0, physicalMin: 0, physicalMax: 300, bands: b(40, 300, 20, null) },
]

/** Per-system overrides: the brackish loops hold ~15 g/kg, the trial loop ~2 g/kg. */
export const DEMO_SYSTEM_LIMITS: Array<{ system: string; key: string; bands: Bounds }> = [
  { system: 'RAS-1', key: 'salinity', bands: b(14, 16, 11, 19) },
  { system: 'RAS-3', key: 'salinity', bands: b(14, 16, 11, 19) },
  { system: 'QB', key: 'salinity', bands: b(14, 16, 11, 19) },
  { system: 'RAS-2', key: 'salinity', bands: b(1, 3, 0, 6) },
  { system: 'RAS-1', key: 'no2_mgL', bands: b(0, 0.5, null, 2) },
  { system: 'RAS-3', key: 'no2_mgL', bands: b(0, 0.5, null, 2) },
  { system: 'QB', key: 'no2_mgL', bands: b(0, 0.5, null, 2) },
]

/** The trial batch tolerates no losses without a look (demo override per batch). */
export const DEMO_BATCH_LIMITS = [{ batch: 'B-TRIAL', key: 'mortalities', bands: b(0, 0, null, 1) }]
