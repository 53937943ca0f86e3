import path from 'node:path'
import { loadConfig } from './lib/config'
import { logger } from './lib/logger'
import { UnsafeConfigError } from './lib/secrets'
import { startServer } from './start-server'

// Every date computation assumes a UTC process; facility time zones are applied explicitly.
process.env.TZ = 'UTC'

const config = loadConfig()
const running = await startServer(config, { clientDir: path.resolve('dist'), schedulerIntervalMs: config.schedulerIntervalMs }).catch((err: unknown) => {
  // An unsafe configuration is the operator's to fix: say what, without a stack trace.
  if (!(err instanceof UnsafeConfigError)) throw err
  console.error(`\n${err.message}\n`)
  process.exit(1)
})
logger.info(`Roundtide is running at ${running.url}`)
console.log(`\nRoundtide is running at ${running.url}`)
console.log(`Demo sign-ins (password "${config.demoPassword}"): maren.holloway@brackenwater.example (manager),`)
console.log('  tomas.ferreira@brackenwater.example (supervisor), priya.nandakumar@brackenwater.example (technician),')
console.log('  ruth.amsel@brackenwater.example (observer). Press Ctrl-C to stop; `npm run stop` stops the database.\n')

let stopping = false
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (stopping) return
    stopping = true
    logger.info({ signal }, 'shutting down')
    running.stop().then(
      () => process.exit(0),
      () => process.exit(1),
    )
  })
}
