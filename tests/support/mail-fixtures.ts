import { db } from '#server/db/data-source'
import type { AppConfig } from '#server/lib/config'
import { startLocalSmtp } from '#server/mail/local-smtp'
import { createTransport } from '#server/modules/escalation/deliver'
import { OutboxEntity } from '#server/modules/escalation/escalation.entities'

/** A real local SMTP server on a free port and a transport that sends to it. */
export async function startMailCatcher(config: AppConfig) {
  const smtp = await startLocalSmtp(0)
  const mailConfig: AppConfig = { ...config, mail: { ...config.mail, port: smtp.port, mode: 'local' } }
  const transport = createTransport(mailConfig)
  return {
    config: mailConfig,
    transport,
    port: smtp.port,
    async close() {
      transport.close()
      await smtp.close()
    },
  }
}

export const messagesTo = async (email: string) =>
  (
    await db()
      .getRepository(OutboxEntity)
      .find({ order: { id: 'ASC' } })
  ).filter((m) => m.to.includes(email))
