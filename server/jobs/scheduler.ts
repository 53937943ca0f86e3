import { DataSource, type EntityManager, type QueryRunner } from 'typeorm'
import { db } from '../db/data-source'
import type { AppConfig } from '../lib/config'
import { logger } from '../lib/logger'
import { deliverPending, type Channels, type Transport } from '../modules/escalation/deliver'
import { sendDailyDigestIfDue } from '../modules/escalation/digest'
import { runEscalations } from '../modules/escalation/escalate'
import { resolveStuckSends } from '../modules/escalation/stuck-sends'
import { escalateOverdueIncidents } from '../modules/incidents/incidents.service'
import { materialise } from '../modules/scheduling/materialiser'
import { advanceTaskStatuses } from './status-clock'

const LOCK_NAME = 'roundtide_scheduler'
const HORIZON_EVERY_MS = 60 * 60 * 1000

export interface SchedulerOptions {
  intervalMs?: number
  now?: () => Date
  /** Processes sharing a lock name share one leader; tests use their own name. */
  lockName?: string
  /** Without mail settings the clock still moves tasks but sends nothing. */
  mail?: { config: AppConfig; transport: Transport; channels?: Channels }
}

/**
 * The background clock. Only one process acts at a time: it must hold a MariaDB advisory
 * lock (GET_LOCK, tied to one connection) to tick, so several app processes on one database
 * never double-act; if the holder dies its connection drops and another takes over.
 */
export function startScheduler(source: DataSource | EntityManager, opts: SchedulerOptions = {}) {
  const ds = source instanceof DataSource ? source : source.dataSource
  const intervalMs = opts.intervalMs ?? 30_000
  const now = opts.now ?? (() => new Date())
  const lockName = opts.lockName ?? LOCK_NAME
  let runner: QueryRunner | null = null
  let holding = false
  let lastHorizon = 0
  let running: Promise<void> | null = null
  let stopped = false

  async function ensureLock(): Promise<boolean> {
    try {
      if (!runner || runner.isReleased) {
        runner = ds.createQueryRunner()
        holding = false
      }
      if (holding) {
        // The lock lives and dies with its connection: after a database restart it is gone (and
        // another process may hold it), so check it is still ours before every tick.
        const [row] = await runner.query('SELECT IS_USED_LOCK(?) = CONNECTION_ID() AS mine', [lockName])
        holding = Number(row?.mine) === 1
      }
      if (!holding) {
        const [row] = await runner.query('SELECT GET_LOCK(?, 0) AS got', [lockName])
        holding = Number(row?.got) === 1
      }
      return holding
    } catch (err) {
      logger.warn({ err }, 'scheduler could not reach the database; will retry')
      await runner?.release().catch(() => undefined)
      runner = null
      holding = false
      return false
    }
  }

  async function tick() {
    if (stopped || !(await ensureLock())) return
    try {
      const at = now()
      // One commit for the tick's state: statuses, their alerts and incidents, the ladders'
      // next steps and the outbox rows that tell the live feed. Mail goes after it: each
      // message is claimed and committed before it is sent (record 009).
      await db().transaction(async () => {
        await advanceTaskStatuses(db(), at)
        await escalateOverdueIncidents(at)
        await runEscalations(at)
      })
      if (opts.mail) {
        // Before delivery, so the fallback for a message its sender never finished goes out in this tick.
        await resolveStuckSends(at)
        await deliverPending(opts.mail.config, opts.mail.transport, at, opts.mail.channels)
        await sendDailyDigestIfDue(opts.mail.config, opts.mail.transport, at).catch((err) => logger.warn({ err }, 'daily digest not sent'))
      }
      if (at.getTime() - lastHorizon > HORIZON_EVERY_MS) {
        lastHorizon = at.getTime()
        await materialise({ from: at })
      }
    } catch (err) {
      logger.error({ err }, 'scheduler tick failed')
    }
  }

  const run = () => {
    if (!running) running = tick().finally(() => (running = null))
    return running
  }
  const timer = setInterval(run, intervalMs)
  void run()

  return {
    tick: run,
    isLeader: () => holding,
    async stop() {
      stopped = true
      clearInterval(timer)
      await running
      if (runner && !runner.isReleased) {
        await runner.query('SELECT RELEASE_LOCK(?)', [lockName]).catch(() => undefined)
        await runner.release().catch(() => undefined)
      }
    },
  }
}
