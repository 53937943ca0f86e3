import { join } from 'node:path'
import { describe, expect, test } from 'vitest'
import { moduleCycles, moduleImports } from '../../../eslint.boundaries.js'

const project = join(import.meta.dirname, '../../..')
// The miniature tree of the lint test: feeding and hatchery import each other, file by file without a cycle.
const fixture = join(import.meta.dirname, '../../fixtures/lint')

describe('the graph of server modules', () => {
  test('when two modules import each other through files that form no cycle, then the check names the cycle and the files', () => {
    expect(moduleCycles(fixture)).toEqual(['feeding → hatchery → feeding (via feeding/feed-plan.ts, hatchery/hatchery-rations.ts)'])
  })

  test("the project's modules form layers: no module reaches back to one that imports it", () => {
    expect(moduleCycles(project)).toEqual([])
  })

  test('scheduling sits above the modules it plans with, and none of them imports it', () => {
    const graph = moduleImports(project)
    expect([...graph.get('scheduling')!.keys()]).toEqual(expect.arrayContaining(['tasks', 'roster', 'routines', 'playbooks', 'facility']))
    const importers = [...graph].filter(([, edges]) => edges.has('scheduling')).map(([name]) => name)
    expect(importers).toEqual([])
  })
})
