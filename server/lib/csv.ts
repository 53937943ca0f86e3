import Papa from 'papaparse'

// A cell starting like a formula would run in a spreadsheet; a leading apostrophe keeps it text.
const FORMULA_START = /^[=+\-@\t\r]/

export function neutraliseCell(value: unknown): string | number | boolean | null {
  if (value === null || value === undefined) return ''
  if (typeof value === 'number' || typeof value === 'boolean') return value
  const text = value instanceof Date ? value.toISOString() : String(value)
  return FORMULA_START.test(text) ? `'${text}` : text
}

/** CSV with a header row; commas, quotes and newlines are quoted by the CSV library. */
export function toCsv(rows: Array<Record<string, unknown>>, columns: string[]): string {
  return Papa.unparse({ fields: columns, data: rows.map((r) => columns.map((c) => neutraliseCell(r[c]))) }, { newline: '\r\n' })
}
