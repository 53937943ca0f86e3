import { spawn } from 'node:child_process'

export class CommandError extends Error {
  readonly output: string
  constructor(message: string, output: string) {
    super(message)
    this.output = output
  }
}

/**
 * Runs a command, passing its output on to our stderr (stdout stays for the table);
 * rejects with the tail of that output on a non-zero exit or after `timeoutMs`.
 */
export function runCommand(command: string, args: string[], opts: { env?: NodeJS.ProcessEnv; timeoutMs: number }): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'pipe'], env: opts.env ?? process.env })
    let tail = ''
    const keep = (chunk: Buffer) => {
      process.stderr.write(chunk)
      tail = (tail + chunk.toString()).slice(-4000)
    }
    child.stdout.on('data', keep)
    child.stderr.on('data', keep)
    const timer = setTimeout(() => {
      child.kill('SIGTERM')
      reject(new CommandError(`${command} ${args[0]} took over ${opts.timeoutMs / 1000} s`, tail))
    }, opts.timeoutMs)
    child.once('error', (err) => {
      clearTimeout(timer)
      reject(err)
    })
    child.once('close', (code) => {
      clearTimeout(timer)
      if (code === 0) resolve()
      else reject(new CommandError(`${command} ${args.slice(0, 2).join(' ')} exited with ${code}`, tail))
    })
  })
}
