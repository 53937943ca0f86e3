import { monitorEventLoopDelay } from 'node:perf_hooks'
import os from 'node:os'
import { checkPlannableRule } from '#shared/schedule/plannable-rule'
import { ALL_WORST_RULES } from '#tests/support/worst-rules'
import { log, ms, percentile, type Row } from './stats'

const GOAL_MS = 50
// Each rule from several starts, each a day the zone's offset cache has not seen yet.
const STARTS = 5

/**
 * Measurement 9: the longest the event loop is held by one rule check (the server's validation
 * of a routine's rule), over the worst rules of every fuzz class. A check is synchronous, so its
 * duration is the block; the event-loop monitor confirms it from outside.
 */
export async function measureRuleChecks(zone: string): Promise<Row> {
  for (const rrule of ALL_WORST_RULES) checkPlannableRule({ rrule, dtstart: '2026-01-05T07:30:00', tzid: zone }) // compile first
  const delay = monitorEventLoopDelay({ resolution: 1 })
  delay.enable()
  const samples: Array<{ rrule: string; ms: number; cpuMs: number; steps: number; placed: number }> = []
  let day = 0
  for (const rrule of ALL_WORST_RULES) {
    for (let i = 0; i < STARTS; i++) {
      const dtstart = `${new Date(Date.UTC(2031, 0, 1 + day++ * 3)).toISOString().slice(0, 10)}T07:30:00`
      const [started, cpu] = [performance.now(), process.cpuUsage()]
      const { work } = checkPlannableRule({ rrule, dtstart, tzid: zone })
      const used = process.cpuUsage(cpu)
      samples.push({ rrule, ms: performance.now() - started, cpuMs: (used.user + used.system) / 1000, ...work })
      await new Promise<void>((resolve) => setImmediate(resolve))
    }
  }
  delay.disable()
  const longest = samples.reduce((a, b) => (b.ms > a.ms ? b : a))
  // On a shared machine the wall time includes waiting for a core; the CPU time is the work itself.
  const mostCpu = samples.reduce((a, b) => (b.cpuMs > a.cpuMs ? b : a))
  const medians = ALL_WORST_RULES.map((rrule) => ({
    rrule,
    ms: percentile(
      samples.filter((s) => s.rrule === rrule).map((s) => s.ms),
      50,
    ),
  }))
  const worstMedian = medians.reduce((a, b) => (b.ms > a.ms ? b : a))
  log(`rule checks: longest ${ms(longest.ms)} (${longest.rrule}), monitor max ${ms(delay.max / 1e6)}`)
  return {
    measurement: '9 rule checks',
    result: `${ms(longest.ms)} longest block`,
    detail:
      `goal ≤ ${GOAL_MS} ms; ${samples.length} checks of ${ALL_WORST_RULES.length} worst rules (dense, never matching, BYSETPOS oddities, late first date); ` +
      `longest ${longest.rrule.slice(0, 40)} (${longest.steps} steps, ${longest.placed} dates placed); ` +
      `most CPU ${ms(mostCpu.cpuMs)} (${mostCpu.rrule.slice(0, 40)}); worst median ${ms(worstMedian.ms)} (${worstMedian.rrule.slice(0, 40)}); event-loop monitor max ${ms(delay.max / 1e6)}; load average ${os.loadavg()[0].toFixed(2)}` +
      (longest.ms > GOAL_MS ? '; OVER GOAL' : ''),
  }
}
