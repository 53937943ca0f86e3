// Run by expand-rule-process-tz.test.ts in a child process with a chosen TZ.
import { expandAllCases } from './process-tz-cases'

const processOffsetMinutes = new Date(Date.UTC(2025, 0, 15, 12)).getTimezoneOffset()
process.stdout.write(JSON.stringify({ processOffsetMinutes, cases: expandAllCases() }))
