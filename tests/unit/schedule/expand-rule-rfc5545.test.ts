import { describe, expect, it } from 'vitest'
import { expandRule } from '#shared/schedule/expand-rule'
import fixture from '../../fixtures/rrule_rfc5545.json' with { type: 'json' }
import { inputForPrintedList, rfcExamples, rfcFixtureNote } from './support/rfc5545-examples'

// Source: RFC 5545 §3.8.5.3 "Recurrence Rule" examples, expanded in America/New_York
// (tests/fixtures/rrule_rfc5545.json keeps the transcription note and a source per row).
describe('RFC 5545 §3.8.5.3 recurrence examples', () => {
  it('when the fixture is loaded, then it is the RFC 5545 §3.8.5.3 list in Eastern US time with no example needing EXDATE or RDATE', () => {
    expect(rfcFixtureNote).toContain('RFC 5545 3.8.5.3')
    expect(rfcExamples).toHaveLength(26)
    expect(rfcExamples.filter((example) => example.needsExdate)).toEqual([])
    expect(new Set(rfcExamples.map((example) => example.input.tzid))).toEqual(new Set(['America/New_York']))
  })

  describe.each(rfcExamples)('RFC 5545 §3.8.5.3 example "$title"', (example) => {
    if (example.completeSet) {
      it('when the bounded rule is expanded in full, then it gives exactly the occurrences the RFC lists', () => {
        const occurrences = expandRule(example.input)
        expect(occurrences).toHaveLength(example.expectedCount)
        expect(occurrences).toEqual(example.expected)
      })
    } else {
      it('when the unbounded rule is expanded, then it starts with the occurrences the RFC prints and goes on past them', () => {
        expect(expandRule(inputForPrintedList(example))).toEqual(example.expected)
        const longer = expandRule({ ...example.input, limit: example.expected.length + 1 })
        expect(longer).toHaveLength(example.expected.length + 1)
      })
    }
  })

  it('when the "every 3 hours until 17:00Z" example is expanded, then UNTIL is read as the instant 13:00 EDT and only 09:00 and 12:00 remain (the RFC prints a third time that contradicts its own UNTIL)', () => {
    const row = fixture.examples.find((candidate) => candidate.title.startsWith('Every 3 hours'))
    const example = rfcExamples.find((candidate) => candidate.title.startsWith('Every 3 hours'))
    expect(row?.known_inconsistency).toBeDefined()
    const locals = expandRule(example!.input).map((occurrence) => occurrence.local)
    expect(locals).toEqual(['1997-09-02T09:00:00', '1997-09-02T12:00:00'])
    expect(row?.rfc_printed_occurrences).toHaveLength(3)
  })
})
