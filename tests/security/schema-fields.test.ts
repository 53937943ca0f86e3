import fc from 'fast-check'
import { beforeAll, describe, expect, test } from 'vitest'
import { sharedSchemas, stringLeaves, type StringLeaf } from '#tests/support/schema-leaves'
import { impossibleDate, impossibleWallTime, malformedText } from '#tests/support/fuzz-values'

const RUNS = Math.min(Number(process.env.ROUNDTIDE_FUZZ_RUNS ?? 500), 200)

/** Every string field the walk finds, by where it is. */
let fields: StringLeaf[] = []
/** One field per distinct schema: many fields share one (every bare `text()` is the same instance), and a schema is fuzzed once. */
let leaves: StringLeaf[] = []
beforeAll(async () => {
  const seen = new Set<unknown>()
  for (const [name, schema] of await sharedSchemas()) {
    for (const leaf of stringLeaves(schema, name)) {
      fields.push(leaf)
      if (seen.has(leaf.schema)) continue
      seen.add(leaf.schema)
      leaves.push(leaf)
    }
  }
  fields = fields.sort((a, b) => a.where.localeCompare(b.where))
  leaves = leaves.sort((a, b) => a.where.localeCompare(b.where))
})

const accepts = (leaf: StringLeaf, value: string) => leaf.schema.safeParse(value).success
/** A date field: it takes a real date of its shape and refuses the same shape in letters (a code field takes both). */
const takesOnly = (leaf: StringLeaf, sample: string) => accepts(leaf, sample) && !accepts(leaf, sample.replace(/\d/g, 'x'))

describe('every string field in the shared schemas, fuzzed', () => {
  test('the walk finds the fields (hundreds of them, dates among them)', () => {
    expect(fields.length).toBeGreaterThan(200)
    expect(fields.filter((l) => takesOnly(l, '2026-03-31')).length).toBeGreaterThan(3)
    expect(fields.filter((l) => takesOnly(l, '2026-03-31T07:30:00')).length).toBeGreaterThan(1)
    expect(fields.filter((l) => takesOnly(l, '2026-03-31T07:30:00.000Z')).length).toBeGreaterThan(1)
    // Each distinct schema is fuzzed; the shared ones count once, yet there are still dozens.
    expect(leaves.length).toBeGreaterThan(50)
  })

  test('no string field takes malformed Unicode (a lone UTF-16 surrogate)', () => {
    const letThrough = leaves.filter((leaf) => {
      const outcome = fc.check(
        fc.property(malformedText, (value) => !accepts(leaf, value)),
        { numRuns: 20 },
      )
      return outcome.failed
    })
    expect(letThrough.map((l) => l.where)).toEqual([])
  })

  test('no date field takes a day that does not exist (2026-02-30, 2026-13-01, 2026-04-31, 2027-02-29 …)', () => {
    const dateFields = leaves.filter((l) => takesOnly(l, '2026-03-31'))
    fc.assert(
      fc.property(impossibleDate, (day) => {
        const letThrough = dateFields.filter((leaf) => accepts(leaf, day)).map((l) => l.where)
        expect(letThrough, day).toEqual([])
      }),
      { numRuns: RUNS },
    )
  })

  test('no date-and-time field takes a day or a time that does not exist, in any of its shapes', () => {
    const shapes = ['T07:30:00', 'T07:30', 'T07:30:00.000Z', 'T07:30:00+01:00', 'T07:30:00Z']
    for (const shape of shapes) {
      const fields = leaves.filter((l) => takesOnly(l, `2026-03-31${shape}`))
      fc.assert(
        fc.property(
          fc.oneof(
            impossibleDate.map((d) => `${d}${shape}`),
            impossibleWallTime(shape),
          ),
          (value) => {
            const letThrough = fields.filter((leaf) => accepts(leaf, value)).map((l) => l.where)
            expect(letThrough, value).toEqual([])
          },
        ),
        { numRuns: RUNS },
      )
    }
  })
})
