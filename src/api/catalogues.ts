import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import {
  AreaInputSchema,
  AreaSchema,
  BatchInputSchema,
  BatchSchema,
  EquipmentInputSchema,
  EquipmentSchema,
  SystemInputSchema,
  SystemSchema,
  TankInputSchema,
  TankSchema,
} from '#shared/schemas/facility'
import { apiFetch } from '../lib/api-client'

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

// One key per catalogue for every page: an edit on the tanks page reaches the board's filters and the routine editor.
export const catalogueKeys = {
  all: ['catalogue'] as const,
  list: (name: CatalogueName) => [...catalogueKeys.all, name] as const,
}

const catalogue = <K extends CatalogueName>(name: K) =>
  queryOptions({ queryKey: catalogueKeys.list(name), queryFn: () => apiFetch(`/${name}`, z.array(itemSchema(name))) })

export const catalogueQueries = {
  areas: () => catalogue('areas'),
  systems: () => catalogue('systems'),
  tanks: () => catalogue('tanks'),
  equipment: () => catalogue('equipment'),
  batches: () => catalogue('batches'),
}
