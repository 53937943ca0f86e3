import type { Tank } from '#shared/schemas/facility'

/** "T1, T2 and 3 more": enough to recognise the tanks without swamping a row. */
export function tankCodes(ids: number[], tanks: Tank[], shown = 3): string {
  const byId = new Map(tanks.map((t) => [t.id, t.code]))
  const codes = ids.map((id) => byId.get(id) ?? `#${id}`)
  if (codes.length === 0) return 'No tanks'
  return codes.length <= shown ? codes.join(', ') : `${codes.slice(0, shown).join(', ')} and ${codes.length - shown} more`
}
