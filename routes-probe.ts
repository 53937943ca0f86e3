import { startTestApp } from '#tests/support/test-app'
import { listRoutes } from '#tests/support/route-list'
const t = await startTestApp()
for (const r of listRoutes(t.app)) console.log(r.method, r.path)
await t.close()
