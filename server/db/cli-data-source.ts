// Used by the TypeORM CLI (migration:generate / migration:show).
import { loadConfig } from '../lib/config'
import { createDataSource } from './data-source'

export default createDataSource(loadConfig().db)
