// Usage: tsx seed/index.ts [--if-empty | --reset]
//   --if-empty  seed only when the database holds no people (npm start uses this)
//   --reset     drop every table, migrate again and seed (npm run db:reset)
import { createDataSource, setDataSource } from '#server/db/data-source'
import { loadConfig } from '#server/lib/config'
import { seedDemo } from './seed-demo'

process.env.TZ = 'UTC'
const config = loadConfig()
const args = new Set(process.argv.slice(2))
const ds = createDataSource(config.db)
await ds.initialize()
setDataSource(ds)

if (args.has('--reset')) {
  console.log(`Resetting database "${config.db.database}": every table is dropped.`)
  await ds.dropDatabase()
  await ds.runMigrations({ transaction: 'each' })
}
const [{ count }] = await ds.query('SELECT COUNT(*) AS count FROM people')
if (Number(count) > 0 && !args.has('--reset')) {
  console.log('Demo data already present; leaving the database as it is.')
} else {
  await seedDemo(config.demoPassword)
}
await ds.destroy()
