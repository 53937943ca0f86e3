import type { z } from 'zod'
import {
  AreaInputSchema, AreaSchema, BatchInputSchema, BatchSchema, EquipmentInputSchema, EquipmentSchema,
  SystemInputSchema, SystemSchema, TankInputSchema, TankSchema,
} from '#shared/schemas/facility'

/** The five facility catalogues share one REST shape: /api/<name> and /api/<name>/:id. */
export const CATALOGUES = {
  areas: { item: AreaSchema, input: AreaInputSchema, noun: 'area' },
  systems: { item: SystemSchema, input: SystemInputSchema, noun: 'system' },
  tanks: { item: TankSchema, input: TankInputSchema, noun: 'tank' },
  equipment: { item: EquipmentSchema, input: EquipmentInputSchema, noun: 'equipment' },
  batches: { item: BatchSchema, input: BatchInputSchema, noun: 'batch' },
} as const

export type CatalogueName = keyof typeof CATALOGUES
export type CatalogueItem<K extends CatalogueName> = z.infer<(typeof CATALOGUES)[K]['item']>
export type CatalogueInput<K extends CatalogueName> = z.infer<(typeof CATALOGUES)[K]['input']>

export const itemSchema = <K extends CatalogueName>(name: K) => CATALOGUES[name].item as unknown as z.ZodType<CatalogueItem<K>>
