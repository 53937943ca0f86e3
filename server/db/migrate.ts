import { loadConfig } from '../lib/config'
import { createDataSource } from './data-source'

const ds = createDataSource(loadConfig().db)
await ds.initialize()
const applied = await ds.runMigrations({ transaction: 'each' })
console.log(applied.length ? `Applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}` : 'Database schema is up to date.')
await ds.destroy()
