import { simpleParser } from 'mailparser'
import { SMTPServer } from 'smtp-server'
import { db } from '../db/data-source'
import { logger } from '../lib/logger'
import { OutboxEntity } from '../modules/escalation/escalation.entities'

/**
 * A real SMTP server on loopback for local mode: the app sends to it like to any mail host,
 * and each message it receives is kept for the Outbox page.
 */
export async function startLocalSmtp(port: number, host = '127.0.0.1') {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const to = session.envelope.rcptTo.map((r) => r.address).join(', ')
          await db()
            .getRepository(OutboxEntity)
            .insert({
              to,
              subject: mail.subject ?? '(no subject)',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : '',
              receivedAt: new Date(),
            })
          callback()
        })
        .catch((err: Error) => {
          logger.error({ err }, 'local SMTP could not store a message')
          callback(err)
        })
    },
  })
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, host, () => resolve())
  })
  const address = server.server.address()
  return {
    port: typeof address === 'object' && address ? address.port : port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  }
}
