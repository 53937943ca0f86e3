import { join } from 'node:path'
import { ESLint } from 'eslint'
import tseslint from 'typescript-eslint'
import { beforeAll, describe, expect, test } from 'vitest'
import { boundaryConfig, staleEntityImports } from '../../../eslint.boundaries.js'

// A miniature tree (tests/fixtures/lint) linted with the same boundary rules as the project.
const root = join(import.meta.dirname, '../../fixtures/lint')

let problems: Map<string, string[]>

beforeAll(async () => {
  const eslint = new ESLint({
    cwd: root,
    overrideConfigFile: true,
    overrideConfig: [
      { files: ['**/*.ts'], languageOptions: { parser: tseslint.parser } },
      ...boundaryConfig({ root, allowedEntityImports: { 'feeding/legacy-plan.ts': ['hatchery/hatchery.entity.ts'] } }),
    ],
  })
  const results = await eslint.lintFiles(['**/*.ts'])
  problems = new Map(results.map((r) => [r.filePath.slice(root.length + 1), r.messages.map((m) => `${m.ruleId}: ${m.message}`)]))
}, 60_000)

const problemsOf = (file: string) => {
  expect(problems.has(file), `${file} was linted`).toBe(true)
  return problems.get(file)!
}

describe('import boundaries', () => {
  test('when a feature imports another feature, then lint fails and says to compose them in src/app', () => {
    const found = problemsOf('src/features/ponds/components/pond-list.ts')
    expect(found).toHaveLength(1)
    expect(found[0]).toMatch(/^import-x\/no-restricted-paths: .*"\.\.\/\.\.\/nets\/api\/net-queries".*Features never import each other/)
  })

  test("when a module imports another module's entity, then lint fails and points to the service API", () => {
    const found = problemsOf('server/modules/feeding/feed-plan.ts')
    expect(found).toHaveLength(1)
    expect(found[0]).toMatch(/^import-x\/no-restricted-paths: .*hatchery\.entity.*through its service API/)
  })

  test('when two files import each other, even through the #shared alias, then lint fails on both', () => {
    expect(problemsOf('shared/units/litres.ts')).toEqual([expect.stringMatching(/^import-x\/no-cycle:/)])
    expect(problemsOf('shared/units/volume.ts')).toEqual([expect.stringMatching(/^import-x\/no-cycle:/)])
  })

  test('when shared code imports the client, then lint fails', () => {
    expect(problemsOf('shared/schemas/pond.ts')).toEqual([expect.stringMatching(/^import-x\/no-restricted-paths: .*imports neither/)])
  })

  test('when files keep to the rules, or an entity import is on the temporary list, then lint passes them', () => {
    for (const file of [
      'src/api/facility.ts',
      'src/features/nets/api/net-queries.ts',
      'src/features/ponds/api/pond-queries.ts',
      'server/modules/hatchery/hatchery.entity.ts',
      'server/modules/hatchery/hatchery.service.ts',
      // A cycle of modules, not of files: lint passes it, and module-graph.test.ts does not.
      'server/modules/hatchery/hatchery-rations.ts',
      'server/modules/feeding/feeding.service.ts',
      'server/modules/feeding/legacy-plan.ts',
    ]) {
      expect(problemsOf(file), file).toEqual([])
    }
  })

  test('when a file on the temporary list stops importing the entity, then its entry is reported for removal', () => {
    const allowed = { 'feeding/legacy-plan.ts': ['hatchery/hatchery.entity.ts'], 'feeding/feeding.service.ts': ['hatchery/hatchery.entity.ts'] }
    expect(staleEntityImports(root, allowed)).toEqual(['feeding/feeding.service.ts -> hatchery/hatchery.entity.ts'])
  })
})
