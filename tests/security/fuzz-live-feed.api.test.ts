import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'
import { rawSocketConnect, startLiveServer, type LiveServer } from '#tests/support/live-server'

const RUNS = Math.min(Number(process.env.ROUNDTIDE_FUZZ_RUNS ?? 500), 150)

let live: LiveServer
beforeAll(async () => {
  live = await startLiveServer()
  await ensureFacilityAndParameters()
})
afterAll(() => live?.stop())

// The parts of an engine.io handshake an attacker controls, each with the odd values that
// have slipped past checks before: empty, NUL, encoded blanks, repeated, array syntax, very long.
const oddValue = fc.oneof(
  fc.constantFrom('', '%00', '%20', '0', 'undefined', 'null', '[]', '%5B%5D', '%E2%80%8B', '%ED%A0%80', 'a'.repeat(4096)),
  fc.string({ maxLength: 30 }).map(encodeURIComponent),
  fc.integer({ min: 1, max: 300 }).map((n) => 'x'.repeat(n)),
)
const param = fc.oneof(
  fc.tuple(fc.constantFrom('sid', 'sid[]', 'SID', 'sid%00', ' sid'), oddValue),
  fc.tuple(fc.constant('EIO'), fc.oneof(fc.constantFrom('4', '3', '5', '', '04', '4.0', '-1'), oddValue)),
  fc.tuple(fc.constant('transport'), fc.oneof(fc.constantFrom('polling', 'websocket', 'webtransport', 'POLLING', ''), oddValue)),
  fc.tuple(fc.constantFrom('t', 'j', 'b64', 'token', 'auth'), oddValue),
)
// Mostly a handshake the engine accepts (EIO=4, polling), so the odd parts reach the session check.
const handshakeQuery = fc
  .tuple(
    fc.oneof({ weight: 4, arbitrary: fc.constant<[string, string]>(['EIO', '4']) }, param),
    fc.oneof({ weight: 4, arbitrary: fc.constant<[string, string]>(['transport', 'polling']) }, param),
    fc.array(param, { maxLength: 4 }),
  )
  .map(([eio, transport, rest]) => [eio, transport, ...rest].map(([k, v]) => `${k}=${v}`).join('&'))

describe('fuzzing the live feed handshake', () => {
  test('no query string, however odd, gives a socket without a signed-in person', async () => {
    const outcomes = new Map<string, number>()
    await fc.assert(
      fc.asyncProperty(handshakeQuery, async (query) => {
        const reached = await rawSocketConnect(live.url, query)
        outcomes.set(reached, (outcomes.get(reached) ?? 0) + 1)
        return reached !== 'namespace'
      }),
      { numRuns: RUNS },
    )
    console.log(`handshake fuzz: ${[...outcomes].map(([k, n]) => `${k} ${n}`).join(', ')}`)
    expect(outcomes.get('namespace')).toBeUndefined()
  })

  test('the same odd queries with a signed-in cookie from a foreign page never reach the feed either', async () => {
    const { cookie } = await live.signIn('supervisor')
    await fc.assert(
      fc.asyncProperty(
        handshakeQuery,
        async (query) => (await rawSocketConnect(live.url, query, { cookie, origin: 'http://attacker.invalid' })) !== 'namespace',
      ),
      { numRuns: Math.ceil(RUNS / 3) },
    )
  })

  test('the generator can tell: a signed-in cookie with the plain handshake does reach the feed', async () => {
    const { cookie } = await live.signIn('technician')
    expect(await rawSocketConnect(live.url, 'EIO=4&transport=polling', { cookie })).toBe('namespace')
  })
})
