import { readdirSync } from 'node:fs'
import path from 'node:path'
import type { z } from 'zod'

export interface StringLeaf {
  /** Where the field sits, e.g. `RoutineInputSchema.skipDates[]`. */
  where: string
  schema: z.ZodType
}

type Def = { type: string; [key: string]: unknown }
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def

/** Every string-typed field inside a zod schema, however deep: objects, arrays, records (keys too), unions, pipes. */
export function stringLeaves(schema: z.ZodType, where: string, out: StringLeaf[] = [], seen = new Set<unknown>()): StringLeaf[] {
  if (seen.has(schema)) return out
  seen.add(schema)
  const def = defOf(schema)
  const walk = (child: unknown, at: string) => child && stringLeaves(child as z.ZodType, at, out, seen)
  switch (def.type) {
    case 'string':
      out.push({ where, schema })
      break
    case 'object':
      for (const [key, child] of Object.entries(def.shape as Record<string, unknown>)) walk(child, `${where}.${key}`)
      break
    case 'array':
    case 'set':
      walk(def.element ?? def.valueType, `${where}[]`)
      break
    case 'record':
    case 'map':
      walk(def.keyType, `${where}{key}`)
      walk(def.valueType, `${where}{}`)
      break
    case 'union':
      ;(def.options as unknown[]).forEach((option, i) => walk(option, `${where}|${i}`))
      break
    case 'intersection':
      walk(def.left, where)
      walk(def.right, where)
      break
    case 'pipe':
      walk(def.in, where)
      break
    case 'tuple':
      ;(def.items as unknown[]).forEach((item, i) => walk(item, `${where}[${i}]`))
      walk(def.rest, `${where}[]`)
      break
    case 'lazy':
      walk((def.getter as () => unknown)(), where)
      break
    default:
      // optional, nullable, default, prefault, catch, readonly, nonoptional: one schema inside.
      walk(def.innerType, where)
  }
  return out
}

/** Every zod schema exported by the files in shared/schemas, by export name. */
export async function sharedSchemas(): Promise<Array<[string, z.ZodType]>> {
  // The project's own shared/schemas, from the project root (tests/support is two levels down).
  const dir = path.join(path.resolve(import.meta.dirname, '..', '..'), 'shared', 'schemas')
  const found: Array<[string, z.ZodType]> = []
  for (const file of readdirSync(dir)
    .filter((f) => f.endsWith('.ts'))
    .sort()) {
    const mod = (await import(path.join(dir, file))) as Record<string, unknown>
    for (const [name, value] of Object.entries(mod)) {
      if (value && typeof value === 'object' && '_zod' in value) found.push([name, value as z.ZodType])
    }
  }
  return found
}
