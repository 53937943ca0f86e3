/**
 * Published potassium permanganate bath figures, shown beside the bath calculator as reference.
 * They record what the cited sources print; they are not a recommendation for any particular fish,
 * system or water (see BATH_CAUTIONS).
 */

const FA37_SOURCE =
  'Francis-Floyd, R. & Klinger, R. (1997, reviewed 2002) Use of Potassium Permanganate to Control External ' +
  'Infections of Ornamental Fish. UF/IFAS EDIS FA37 (read via reproductions; original PDF not read directly).'

const INAD_9246_SOURCE =
  "U.S. Fish & Wildlife Service AADAP, 'Drug Summary & History - Potassium Permanganate INAD 9246' (archived 2008): " +
  'treatment rate = 2.5 x 15-min KMnO4 demand (PPD), applied in 2-4 ppm increments, max 10 ppm, ' +
  '1-h static or flow-through treatment, withdrawal 7 d.'

export type PublishedBath = {
  id: string
  use: string
  /** The concentration printed, mg/L; null when the source gives a rule instead of a figure. */
  mgPerL: number | null
  /** A ceiling the source prints alongside, mg/L. */
  upToMgPerL: number | null
  duration: string
  details: string
  source: string
}

export const PUBLISHED_PERMANGANATE_BATHS: readonly PublishedBath[] = [
  {
    id: 'fa37-prolonged',
    use: 'Prolonged bath',
    mgPerL: 2,
    upToMgPerL: null,
    duration: 'at least 4 h',
    details: 'One secondary summary gives 2–4 h instead.',
    source: FA37_SOURCE,
  },
  {
    id: 'fa37-short',
    use: 'Short bath',
    mgPerL: 10,
    upToMgPerL: null,
    duration: '30 min',
    details: 'Described as a closely watched bath.',
    source: FA37_SOURCE,
  },
  {
    id: 'fa37-sensitive',
    use: 'Sensitive species or first treatment',
    mgPerL: 1,
    upToMgPerL: null,
    duration: 'as for the prolonged bath',
    details: 'Lower starting concentration.',
    source: FA37_SOURCE,
  },
  {
    id: 'fa37-organic-demand',
    use: 'Top-up for organic demand',
    mgPerL: 2,
    upToMgPerL: 6,
    duration: 'colour checked over 4 h',
    details:
      'Further 2 mg/L if the purple colour turns brown within 4 h; if 6 mg/L in total does not hold ' +
      'the colour for 4 h, the source says to clean the system.',
    source: FA37_SOURCE,
  },
  {
    id: 'inad-9246',
    use: 'Investigational new animal drug study regime (INAD 9246)',
    mgPerL: null,
    upToMgPerL: 10,
    duration: '1 h, static or flow-through',
    details: '2.5 × the 15-minute permanganate demand of the water, added in 2–4 mg/L increments; ' + 'withdrawal period 7 days.',
    source: INAD_9246_SOURCE,
  },
]

export type DemandBasedConcentration = { mgPerL: number; capped: boolean }

const DEMAND_MULTIPLIER = 2.5
const DEMAND_REGIME_CEILING_MG_PER_L = 10

/**
 * The INAD 9246 rule applied to a measured 15-minute demand: 2.5 × demand, never above 10 mg/L.
 * Shown as the arithmetic of that published regime, for use within it.
 */
export function demandBasedPermanganateMgPerL(demand15MinMgPerL: number): DemandBasedConcentration {
  if (!Number.isFinite(demand15MinMgPerL) || demand15MinMgPerL <= 0) {
    throw new RangeError(`The measured 15-minute demand must be above 0 mg/L, got ${demand15MinMgPerL}`)
  }
  const uncapped = DEMAND_MULTIPLIER * demand15MinMgPerL
  return uncapped > DEMAND_REGIME_CEILING_MG_PER_L ? { mgPerL: DEMAND_REGIME_CEILING_MG_PER_L, capped: true } : { mgPerL: uncapped, capped: false }
}

/** Cautions that apply to any bath treatment; show them with every calculated amount. */
export const BATH_CAUTIONS: readonly string[] = [
  'These figures are published reference values, not a prescription for your fish or system.',
  'Toxicity depends on the organic load and the water chemistry, and rises with temperature: the same ' +
    'concentration can be tolerated in one system and harmful in another.',
  'Try the treatment on a few fish first and watch how they respond before treating the whole group.',
  'Watch the fish throughout the exposure and be ready to end it with clean water.',
  "Follow the veterinarian's instructions, the product label or permit, and local regulations.",
  'Wear gloves and eye protection when weighing and dissolving the product.',
]

/** Specific to potassium permanganate. */
export const PERMANGANATE_CAUTIONS: readonly string[] = [
  'Never mix potassium permanganate with formalin: the FA37 reproduction warns the combination can be explosive.',
]
