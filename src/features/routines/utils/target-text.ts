import type { Routine, TargetKind } from '#shared/schemas/routine'

const NOUNS: Record<Exclude<TargetKind, 'facility' | 'area_tanks'>, [string, string]> = {
  area: ['area', 'areas'],
  system: ['system', 'systems'],
  tank: ['tank', 'tanks'],
  equipment: ['piece of equipment', 'pieces of equipment'],
  batch: ['batch', 'batches'],
}

/** "3 tanks", "Every tank in 2 areas", "Whole facility". */
export function describeTargets({ targetKind, targetIds }: Pick<Routine, 'targetKind' | 'targetIds'>): string {
  const n = targetIds.length
  if (targetKind === 'facility') return 'Whole facility'
  if (targetKind === 'area_tanks') return `Every tank in ${n} ${n === 1 ? 'area' : 'areas'}`
  const [one, many] = NOUNS[targetKind]
  return `${n} ${n === 1 ? one : many}`
}

export const TARGET_KIND_LABELS: Record<TargetKind, string> = {
  facility: 'The whole facility',
  area: 'Areas',
  area_tanks: 'Every tank in an area',
  system: 'Systems',
  tank: 'Tanks',
  equipment: 'Equipment',
  batch: 'Batches',
}
