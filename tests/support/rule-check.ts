import { spawn } from 'node:child_process'
import path from 'node:path'

export type RuleCheck = { rrule: string; ms: number; problem: string | null; plannable: boolean | null }

/**
 * Checks rules in a child process with a deadline. Resolves with every answer, or rejects naming
 * the rule the child was still on when the deadline passed (a rule whose expansion never ends).
 */
export function checkRulesInChild(
  rules: string[],
  deadlineMs: number,
  where: { dtstart: string; tzid: string } = { dtstart: '2026-01-05T07:30:00', tzid: 'Europe/Oslo' },
): Promise<RuleCheck[]> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.resolve(import.meta.dirname, 'rule-check-child.ts'), where.dtstart, where.tzid], {
    stdio: ['pipe', 'pipe', 'inherit'],
  })
  const answers: RuleCheck[] = []
  let current = ''
  let buffered = ''
  child.stdout.on('data', (chunk: Buffer) => {
    buffered += chunk.toString()
    const lines = buffered.split('\n')
    buffered = lines.pop() ?? ''
    for (const line of lines) {
      const message = JSON.parse(line) as RuleCheck | { started: string }
      if ('started' in message) current = message.started
      else answers.push(message)
    }
  })
  child.stdin.end(rules.map((r) => JSON.stringify(r)).join('\n') + '\n')
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL')
      reject(new Error(`The rule check did not finish within ${deadlineMs} ms; it was still on ${current}`))
    }, deadlineMs)
    child.on('exit', (code) => {
      clearTimeout(timer)
      if (code === 0 && answers.length === rules.length) resolve(answers)
      else reject(new Error(`The rule check stopped (exit ${code}) after ${answers.length} of ${rules.length} rules, on ${current}`))
    })
  })
}
