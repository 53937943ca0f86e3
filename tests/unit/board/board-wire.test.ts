import { describe, expect, test } from 'vitest'
import { BoardCardColumnsEnvelopeSchema, BoardCardWireSchema, cardAt, emptyColumns, pushCard, wireCards, type BoardCardWire } from '#shared/schemas/board'

const cards: BoardCardWire[] = [
  { id: 41, kind: 0, target: 0, time: '07:30', status: 'open', version: 1, assignee: 7 },
  { id: 42, kind: 0, target: 1, time: '07:45', status: 'open', version: 3, flag: 'watch' },
  { id: 43, kind: 1, target: 0, time: '08:00', status: 'held', version: 2, held: 'Fasting before grading' },
  { id: 44, kind: 1, target: 2, time: '09:00', status: 'done', version: 5, assignee: 9, flag: 'critical' },
]

describe('a day’s cards travel as columns', () => {
  test('cards written into columns and sent as JSON read back as the same cards, empty fields still left out', () => {
    const columns = emptyColumns()
    for (const card of cards) pushCard(columns, card)
    const sent = JSON.parse(JSON.stringify(columns)) as unknown
    expect(wireCards(sent as typeof columns)).toEqual(cards)
    const envelope = BoardCardColumnsEnvelopeSchema.parse(sent)
    expect(cardAt(envelope, 0)).not.toHaveProperty('flag')
    expect(cardAt(envelope, 1)).not.toHaveProperty('assignee')
  })

  test('field names are written once, not once per card', () => {
    const columns = emptyColumns()
    for (let i = 0; i < 1000; i++) pushCard(columns, { ...cards[0], id: 1000 + i })
    const json = JSON.stringify(columns)
    expect(json.match(/"time"/g)).toHaveLength(1)
    // Against the same cards as objects, the columns are under half the size.
    expect(json.length).toBeLessThan(JSON.stringify(columns.id.map((id) => ({ ...cards[0], id }))).length / 2)
  })

  test('columns of unequal length are refused, and a card with a wrong value fails its own check', () => {
    const columns = emptyColumns()
    for (const card of cards) pushCard(columns, card)
    expect(BoardCardColumnsEnvelopeSchema.safeParse({ ...columns, time: columns.time.slice(1) }).success).toBe(false)
    const envelope = BoardCardColumnsEnvelopeSchema.parse({ ...columns, status: ['open', 'open', 'lost', 'done'] })
    expect(BoardCardWireSchema.safeParse(cardAt(envelope, 2)).success).toBe(false)
    expect(BoardCardWireSchema.safeParse(cardAt(envelope, 1)).success).toBe(true)
  })
})
