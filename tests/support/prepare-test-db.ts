// Recreates the test database from the migrations, so every run starts clean and the
// demo database is never touched.
import { createDataSource } from '#server/db/data-source'
import { loadConfig } from '#server/lib/config'

const config = loadConfig()
if (!config.db.database.endsWith('_test')) {
  throw new Error(`Refusing to reset "${config.db.database}": test databases end in _test`)
}
const ds = createDataSource(config.db)
await ds.initialize()
await ds.dropDatabase()
const applied = await ds.runMigrations({ transaction: 'each' })
await ds.destroy()
console.log(`Test database ${config.db.database} recreated (${applied.length} migrations).`)
