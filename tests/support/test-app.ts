import request from 'supertest'
import type { Role } from '#shared/schemas/person'
import { createApp } from '#server/app'
import { createDataSource, setDataSource } from '#server/db/data-source'
import { loadConfig, type AppConfig } from '#server/lib/config'
import { withStoredSecrets } from '#server/lib/secrets'
import { createOwnDatabase, dropOwnDatabase } from './own-database'
import { createSessionStore } from '#server/modules/auth/session'
import { createPerson } from '#server/modules/people/people.service'
import { buildPersonInput, TEST_PASSWORD } from '#seed/factories'

export function testConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  return {
    ...loadConfig({
      ...process.env,
      ROUNDTIDE_DB_NAME: process.env.ROUNDTIDE_DB_NAME ?? 'roundtide_test',
      ROUNDTIDE_SMTP_PORT: '0',
      ROUNDTIDE_PUSH_LOCAL_PORT: '0',
    }),
    ...overrides,
  }
}

/**
 * One in-process app on the test database, with helpers to sign people in. `ownDatabase` gives
 * the file a fresh database of its own (files that run the escalation clock over every alert).
 */
export async function startTestApp(overrides: Partial<AppConfig> = {}, opts: { ownDatabase?: boolean } = {}) {
  const shared = testConfig(overrides)
  const own = opts.ownDatabase ? await createOwnDatabase(shared.db, 'own') : null
  const given = own ? { ...shared, db: { ...shared.db, database: own } } : shared
  const dataSource = createDataSource(given.db)
  await dataSource.initialize()
  setDataSource(dataSource)
  const config = await withStoredSecrets(given, dataSource)
  const stores: Array<ReturnType<typeof createSessionStore>> = []

  function newApp() {
    const store = createSessionStore(config)
    stores.push(store)
    return createApp({ config, sessionStore: store }).app
  }

  const app = newApp()

  async function createPersonWithRole(role: Role, extra: Parameters<typeof buildPersonInput>[0] = {}) {
    return createPerson(buildPersonInput({ role, ...extra }))
  }

  /** A supertest agent that keeps its session cookie, signed in as a new person of that role. */
  async function signedInAgent(role: Role, target = app) {
    const person = await createPersonWithRole(role)
    const agent = request.agent(target)
    await agent.post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    return { agent, person }
  }

  return {
    app,
    config,
    dataSource,
    newApp,
    createPersonWithRole,
    signedInAgent,
    async close() {
      await Promise.all(stores.map((s) => s.close()))
      await dataSource.destroy()
      if (own) await dropOwnDatabase(shared.db, own)
    },
  }
}

export type TestApp = Awaited<ReturnType<typeof startTestApp>>
