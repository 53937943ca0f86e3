// Summarises a V8 CPU profile (`--cpu-prof`, e.g. from ROUNDTIDE_BENCH_CPU_PROF) by function and by package:
// `npx tsx scripts/bench/profile-summary.ts <file.cpuprofile> [--busy] [--top 40]`.
// --busy keeps only the seconds in which the process was less than 60 % idle; --from S keeps only samples from
// second S on (the bench's server spends its first seconds loading modules and signing in).
import { readFileSync } from 'node:fs'
import type { CpuProfile as Profile, ProfileNode } from './page-profile'

const [file, ...flags] = process.argv.slice(2)
if (!file) throw new Error('usage: profile-summary.ts <file.cpuprofile> [--busy] [--top N]')
const top = Number(flags[flags.indexOf('--top') + 1]) || 40
const profile = JSON.parse(readFileSync(file, 'utf8')) as Profile
const byId = new Map(profile.nodes.map((n) => [n.id, n]))
const parent = new Map<number, number>()
for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id)

/** Which package (or part of the app) a frame belongs to. */
function area(url: string, name: string): string {
  if (!url) return name.startsWith('(') ? name : '(native)'
  const nm = url.lastIndexOf('node_modules/')
  if (nm >= 0) {
    const rest = url.slice(nm + 'node_modules/'.length).split('/')
    return rest[0].startsWith('@') ? `${rest[0]}/${rest[1]}` : rest[0]
  }
  if (url.startsWith('node:')) return 'node internals'
  const app = url.match(/\/(server|shared|scripts)\/(?:modules\/)?([\w-]+)/)
  return app ? `app ${app[1]}/${app[2]}` : url
}
const label = (n: ProfileNode) =>
  `${n.callFrame.functionName || '(anonymous)'} ${area(n.callFrame.url, n.callFrame.functionName)}:${n.callFrame.lineNumber + 1}`

// Sample times, to keep only the busy seconds when asked.
const times: number[] = []
let t = 0
for (const d of profile.timeDeltas) times.push((t += d))
const idleId = profile.nodes.find((n) => n.callFrame.functionName === '(idle)')?.id
const perSecond = new Map<number, { all: number; idle: number }>()
profile.samples.forEach((id, i) => {
  const s = Math.floor(times[i] / 1e6)
  const bin = perSecond.get(s) ?? { all: 0, idle: 0 }
  bin.all++
  if (id === idleId) bin.idle++
  perSecond.set(s, bin)
})
const from = flags.includes('--from') ? Number(flags[flags.indexOf('--from') + 1]) * 1e6 : 0
const busy = (i: number) => {
  if (times[i] < from) return false
  if (!flags.includes('--busy')) return true
  const bin = perSecond.get(Math.floor(times[i] / 1e6))!
  return bin.idle / bin.all < 0.6
}

const self = new Map<string, number>()
const selfArea = new Map<string, number>()
const inclusiveArea = new Map<string, number>()
let total = 0
profile.samples.forEach((id, i) => {
  if (!busy(i)) return
  total++
  const node = byId.get(id)!
  self.set(label(node), (self.get(label(node)) ?? 0) + 1)
  const a = area(node.callFrame.url, node.callFrame.functionName)
  selfArea.set(a, (selfArea.get(a) ?? 0) + 1)
  const seen = new Set<string>()
  for (let cur: number | undefined = id; cur !== undefined; cur = parent.get(cur)) {
    const n = byId.get(cur)!
    seen.add(area(n.callFrame.url, n.callFrame.functionName))
  }
  for (const s of seen) inclusiveArea.set(s, (inclusiveArea.get(s) ?? 0) + 1)
})

const pct = (n: number) => `${((100 * n) / total).toFixed(1).padStart(5)} %`
const print = (title: string, m: Map<string, number>, n: number) => {
  console.log(`\n${title}`)
  for (const [k, v] of [...m].sort((a, b) => b[1] - a[1]).slice(0, n)) console.log(`${pct(v)}  ${k}`)
}
console.log(`${total} samples${flags.includes('--busy') ? ' in busy seconds' : ''}; idle share per second:`)
console.log([...perSecond].map(([s, b]) => `${s}:${Math.round((100 * b.idle) / b.all)}`).join(' '))
print('self time by area', selfArea, 25)
print('inclusive time by area (a sample counts once per area on its stack)', inclusiveArea, 30)
print('self time by function', self, top)
