/** Names of the values Roundtide works out; RoundTask.readingSpecs lists only the typed ones. */
export const DERIVED_NAMES: Record<string, { name: string; unit: string }> = {
  do_pct: { name: 'DO saturation', unit: '% sat' },
  nh3_mgL: { name: 'Un-ionised ammonia-N', unit: 'mg/L NH3-N' },
}
