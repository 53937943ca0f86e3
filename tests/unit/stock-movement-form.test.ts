import { describe, expect, test } from 'vitest'
import { checkMovementForm, emptyMovementForm } from '../../src/features/stock-register/utils/movement-form'

describe('the movement form, checked by the server’s own schema', () => {
  test('only the chosen kind’s fields are sent, numbers typed with a comma count, and a tank left unchosen says so', () => {
    const mortality = checkMovementForm(
      emptyMovementForm({ kind: 'mortality', batchId: '4', fromTankId: '9', count: '3', cause: 'other', causeText: 'Outlet screen', destination: 'ignored' }),
      'UTC',
    )
    expect(mortality).toEqual({
      ok: true,
      input: { kind: 'mortality', batchId: 4, fromTankId: 9, count: 3, cause: 'other', causeText: 'Outlet screen', necropsy: false },
    })
    const arrival = checkMovementForm(
      emptyMovementForm({ kind: 'arrival', batchId: '4', toTankId: '9', count: '200', meanWeightG: '2,5', origin: 'Hatchery', occurredAt: '2026-12-01T08:30' }),
      'Australia/Brisbane',
    )
    expect(arrival.ok && arrival.input).toMatchObject({ meanWeightG: 2.5, occurredAt: '2026-12-01T08:30:00.000+10:00' })
    const unchosen = checkMovementForm(emptyMovementForm({ kind: 'transfer', batchId: '4', toTankId: '9', count: '1.5' }), 'UTC')
    expect(unchosen).toEqual({ ok: false, errors: { fromTankId: 'Choose one', count: 'Whole fish only' } })
  })
})
