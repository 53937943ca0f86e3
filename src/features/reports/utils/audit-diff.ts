export interface DiffRow {
  key: string
  before: string
  after: string
  changed: boolean
}

function parse(text: string): unknown {
  try {
    return JSON.parse(text)
  } catch {
    return text
  }
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)
const show = (v: unknown) => (v === undefined || v === null ? '' : typeof v === 'string' ? v : JSON.stringify(v))

/** Before and after side by side, one row per field; a whole value when either side is not an object. */
export function auditDiff(beforeText: string, afterText: string): DiffRow[] {
  const before = parse(beforeText)
  const after = parse(afterText)
  const b = before === null ? {} : before
  const a = after === null ? {} : after
  if (!isRecord(b) || !isRecord(a))
    return [{ key: 'value', before: show(before ?? undefined), after: show(after ?? undefined), changed: show(before) !== show(after) }]
  const keys = [...new Set([...Object.keys(b), ...Object.keys(a)])]
  return keys.map((key) => ({ key, before: show(b[key]), after: show(a[key]), changed: show(b[key]) !== show(a[key]) }))
}

/** Pretty JSON for the raw view. */
export const prettyJson = (text: string) => {
  const v = parse(text)
  return typeof v === 'string' ? v : JSON.stringify(v, null, 2)
}
