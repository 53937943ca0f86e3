import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createApp } from '#server/app'
import { createSessionStore } from '#server/modules/auth/session'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let clientDir: string
let store: ReturnType<typeof createSessionStore>
let app: ReturnType<typeof createApp>['app']
beforeAll(async () => {
  t = await startTestApp()
  // A built client in miniature: the page, one content-hashed asset and the service worker's loader.
  clientDir = mkdtempSync(path.join(os.tmpdir(), 'roundtide-client-'))
  mkdirSync(path.join(clientDir, 'assets'))
  writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Roundtide</title>')
  writeFileSync(path.join(clientDir, 'assets', 'index-Ab12Cd34.js'), 'export {}')
  writeFileSync(path.join(clientDir, 'registerSW.js'), '// registers the worker')
  store = createSessionStore(t.config)
  app = createApp({ config: t.config, sessionStore: store, clientDir }).app
})
afterAll(async () => {
  await store.close()
  await t.close()
  rmSync(clientDir, { recursive: true, force: true })
})

describe('serving the built client', () => {
  test('when a phone asks for a content-hashed asset, then it may keep it for a year without asking again', async () => {
    const res = await request(app).get('/assets/index-Ab12Cd34.js').expect(200)
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable')
  })

  test('when it asks for the page or the service worker loader, then it must check for a newer one', async () => {
    expect((await request(app).get('/round').expect(200)).headers['cache-control']).toBe('no-cache')
    expect((await request(app).get('/registerSW.js').expect(200)).headers['cache-control']).toBe('no-cache')
  })
})
