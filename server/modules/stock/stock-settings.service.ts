import type { StockSettings, UpdateStockSettingsInput } from '#shared/schemas/stock'
import { db } from '../../db/data-source'
import { StockSettingsEntity } from './stock.entities'

/**
 * Defaults: notify the welfare officer within 24 h, the ethics committee within 72 h, a full
 * report within 7 days (common practice for institutional animal-ethics rules; local codes
 * decide). 2 % of a batch dead in 7 days is the demo station's own threshold (invented).
 */
export const DEFAULT_STOCK_SETTINGS: StockSettings = {
  mortalityCauses: ['Handling or transport stress', 'Disease (suspected)', 'Water quality', 'Jumped out', 'Aggression or cannibalism', 'Equipment failure'],
  mortalityWeekPct: 2,
  notifyWelfareOfficerHours: 24,
  notifyCommitteeHours: 72,
  fullReportHours: 168,
}

const repo = () => db().getRepository(StockSettingsEntity)

export async function getStockSettings(): Promise<StockSettings> {
  const row = await repo().findOneBy({ id: 1 })
  if (!row) return DEFAULT_STOCK_SETTINGS
  const { id: _id, ...settings } = row
  return settings
}

export async function updateStockSettings(data: UpdateStockSettingsInput): Promise<StockSettings> {
  const next = { ...(await getStockSettings()), ...data }
  await repo().save({ id: 1, ...next })
  return next
}
