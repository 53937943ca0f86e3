import Papa from 'papaparse'
import { TankInputSchema, type TankImportResult, type TankInput } from '#shared/schemas/facility'
import { db } from '../../db/data-source'
import { validationError } from '../../lib/errors'
import { recordChange } from '../../realtime/change-outbox'
import { AreaEntity, SystemEntity, TankEntity } from './facility.entities'
import { tankUseChanged } from './tank-changes'

export const TANK_CSV_COLUMNS = ['code', 'name', 'area', 'system', 'volume_l', 'kind', 'in_use'] as const
const TRUE = new Set(['yes', 'true', '1', 'y'])
const FALSE = new Set(['no', 'false', '0', 'n', ''])

/**
 * Imports tanks from CSV (code,name,area,system,volume_l,kind,in_use; area and system by code).
 * Every row is checked first; one bad row means nothing from the file is imported, and the
 * error lists each bad line. Rows match existing tanks by code, so re-importing changes nothing.
 */
export async function importTanksCsv(text: string): Promise<TankImportResult> {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  })
  const missing = TANK_CSV_COLUMNS.filter((c) => !parsed.meta.fields?.includes(c))
  if (missing.length) {
    throw validationError(`The CSV needs a header row with: ${TANK_CSV_COLUMNS.join(', ')}. Missing: ${missing.join(', ')}.`, {
      file: [`Missing columns: ${missing.join(', ')}`],
    })
  }
  const areaByCode = new Map((await db().getRepository(AreaEntity).find()).map((a) => [a.code.toLowerCase(), a.id]))
  const systemByCode = new Map((await db().getRepository(SystemEntity).find()).map((s) => [s.code.toLowerCase(), s.id]))

  const lines: string[] = parsed.errors.map((e) => `Line ${(e.row ?? 0) + 2}: ${e.message}`)
  const rows: TankInput[] = []
  const seen = new Map<string, number>()
  parsed.data.forEach((raw, index) => {
    const line = index + 2 // header is line 1
    const problems: string[] = []
    const cell = (k: string) => (raw[k] ?? '').trim()
    const areaId = areaByCode.get(cell('area').toLowerCase())
    if (!areaId) problems.push(`area "${cell('area')}" does not exist`)
    const systemCode = cell('system').toLowerCase()
    const systemId = systemCode ? systemByCode.get(systemCode) : null
    if (systemId === undefined) problems.push(`system "${cell('system')}" does not exist`)
    const inUseText = cell('in_use').toLowerCase()
    if (!TRUE.has(inUseText) && !FALSE.has(inUseText)) problems.push('in_use must be yes or no')
    const candidate = {
      code: cell('code'),
      name: cell('name'),
      areaId: areaId ?? 0,
      systemId: systemId ?? null,
      volumeL: cell('volume_l') === '' ? NaN : Number(cell('volume_l')),
      kind: (cell('kind') || 'tank').toLowerCase(),
      inUse: TRUE.has(inUseText),
    }
    const result = TankInputSchema.safeParse(candidate)
    if (!result.success) {
      for (const issue of result.error.issues) problems.push(`${columnFor(String(issue.path[0]))}: ${issue.message}`)
    }
    const code = candidate.code.toLowerCase()
    if (code && seen.has(code)) problems.push(`code ${candidate.code} repeats line ${seen.get(code)}`)
    seen.set(code, line)
    if (problems.length) lines.push(`Line ${line}: ${problems.join('; ')}`)
    else if (result.success) rows.push(result.data)
  })
  if (lines.length) throw validationError(`Nothing was imported: ${lines.length} line(s) need fixing.`, { file: lines })
  return saveTanks(rows)
}

const columnFor = (field: string) => ({ volumeL: 'volume_l', inUse: 'in_use', areaId: 'area', systemId: 'system' })[field] ?? field

async function saveTanks(rows: TankInput[]): Promise<TankImportResult> {
  const result = { created: 0, updated: 0, unchanged: 0 }
  const changedUse: Array<{ id: number; inUse: boolean }> = []
  await db().transaction(async (manager) => {
    const repo = manager.getRepository(TankEntity)
    const existing = new Map((await repo.find()).map((t) => [t.code.toLowerCase(), t]))
    for (const row of rows) {
      const current = existing.get(row.code.toLowerCase())
      if (!current) {
        const saved = await repo.save(repo.create(row))
        result.created++
        if (saved.inUse) changedUse.push({ id: saved.id, inUse: true })
        continue
      }
      const same = (Object.keys(row) as Array<keyof TankInput>).every((k) => current[k] === row[k])
      if (same) {
        result.unchanged++
        continue
      }
      await repo.save({ ...current, ...row })
      result.updated++
      if (current.inUse !== row.inUse) changedUse.push({ id: current.id, inUse: row.inUse })
    }
    if (result.created || result.updated) await recordChange('catalogue')
  })
  for (const change of changedUse) await tankUseChanged.announce({ tankId: change.id, inUse: change.inUse })
  return result
}
