import { describe, expect, test } from 'vitest'
import type { Round, RoundTask } from '#shared/schemas/round'
import { firstTasks, groupRound } from '../../../src/features/round/utils/group-round'

// Only the fields grouping reads; the rest of a task does not matter here.
const task = (id: number, areaId: number, tankId: number) =>
  ({ id, areaId, targetKind: 'tank', targetId: tankId, targetLabel: `T${tankId}` }) as unknown as RoundTask

const round = {
  areas: [
    { id: 1, name: 'Hall A' },
    { id: 2, name: 'Hall B' },
  ],
  // Hall A: tank 10 has three tasks, tank 11 two; Hall B: tank 20 has four.
  tasks: [task(1, 1, 10), task(2, 1, 10), task(3, 1, 10), task(4, 1, 11), task(5, 1, 11), task(6, 2, 20), task(7, 2, 20), task(8, 2, 20), task(9, 2, 20)],
} as unknown as Round

const ids = (groups: ReturnType<typeof groupRound>) => groups.map((g) => g.targets.map((t) => t.tasks.map((x) => x.id)))

describe("a round's first screen", () => {
  test('keeps the walking order and cuts inside a tank once the first tasks are counted', () => {
    expect(ids(firstTasks(groupRound(round), 4))).toEqual([[[1, 2, 3], [4]]])
    expect(ids(firstTasks(groupRound(round), 7))).toEqual([
      [
        [1, 2, 3],
        [4, 5],
      ],
      [[6, 7]],
    ])
  })

  test('a round shorter than the first screen is drawn whole, and nothing is lost from the full grouping', () => {
    expect(ids(firstTasks(groupRound(round), 20))).toEqual(ids(groupRound(round)))
    expect(ids(groupRound(round)).flat(2)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9])
  })
})
