// Child process: the app server on the bench database, so load generators and the browser
// in the parent do not share its event loop. Reports its URL over IPC; stops on 'stop' or disconnect.
import { startServer } from '#server/start-server'
import { benchConfig } from './bench-db'

const clientDir = process.argv[2] || undefined
const running = await startServer(benchConfig(), { clientDir, scheduler: false, localSmtp: false })
process.send?.({ url: running.url })

let stopping = false
const stop = () => {
  if (stopping) return
  stopping = true
  running.stop().then(
    () => process.exit(0),
    () => process.exit(1),
  )
}
process.on('message', (m) => {
  if (m === 'stop') stop()
})
process.on('disconnect', stop)
process.on('SIGTERM', stop)
