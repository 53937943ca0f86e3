import { execFile } from 'node:child_process'
import { fileURLToPath } from 'node:url'
import { promisify } from 'node:util'
import { describe, expect, it } from 'vitest'
import { expandAllCases } from './support/process-tz-cases'

const run = promisify(execFile)
const projectRoot = fileURLToPath(new URL('../../../', import.meta.url))
const script = fileURLToPath(new URL('./support/print-process-tz-cases.ts', import.meta.url))

// The server runs with TZ=UTC, browsers run in the user's zone; rrule reads the process zone
// if given the chance, so the same cases are expanded in child processes with different TZ.
const processZones = [
  { tz: 'UTC', offsetMinutes: 0 },
  { tz: 'America/New_York', offsetMinutes: 300 },
  { tz: 'Asia/Kolkata', offsetMinutes: -330 },
]

async function expandInChildProcess(tz: string) {
  const { stdout } = await run(process.execPath, ['--import', 'tsx', script], {
    cwd: projectRoot,
    env: { ...process.env, TZ: tz },
  })
  return JSON.parse(stdout) as { processOffsetMinutes: number; cases: ReturnType<typeof expandAllCases> }
}

describe('expandRule under different process time zones', () => {
  it('when the same rules are expanded in processes set to UTC, New York and Kolkata, then every result is identical', { timeout: 30_000 }, async () => {
    const inProcess = expandAllCases()
    const children = await Promise.all(processZones.map(({ tz }) => expandInChildProcess(tz)))
    children.forEach((child, index) => {
      // proves TZ really took effect in the child (offsets on 15 January 2025)
      expect(child.processOffsetMinutes).toBe(processZones[index].offsetMinutes)
      expect(child.cases).toEqual(inProcess)
    })
    expect(Object.keys(inProcess).length).toBeGreaterThan(30)
  })
})
