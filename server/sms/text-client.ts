import twilio from 'twilio'
import type RequestClient from 'twilio/lib/base/RequestClient'
import type { AppConfig } from '../lib/config'

/**
 * The provider SDK's own HTTP client with one change: requests go to `baseUrl` (the local
 * stand-in, or any provider-compatible server) instead of the provider's host. Paths, auth,
 * form bodies and response parsing stay the SDK's.
 */
class RedirectingRequestClient extends twilio.RequestClient {
  private readonly baseUrl: string
  constructor(baseUrl: string) {
    super({ timeout: 10_000 })
    this.baseUrl = baseUrl
  }

  override request<TData>(opts: RequestClient.RequestOptions<TData>) {
    const target = new URL(opts.uri)
    const base = new URL(this.baseUrl)
    target.protocol = base.protocol
    target.host = base.host
    return super.request<TData>({ ...opts, uri: target.href })
  }
}

export interface TextSender {
  from: string
  /** Sends one text; resolves with the provider's message id and first status. */
  send(to: string, body: string): Promise<{ sid: string; status: string }>
}

/** A sender over the official SDK, or null when texts are off. */
export function createTextSender(config: AppConfig): TextSender | null {
  if (config.sms.mode === 'off') return null
  const client = twilio(
    config.sms.accountSid,
    config.sms.authToken,
    config.sms.apiBaseUrl ? { httpClient: new RedirectingRequestClient(config.sms.apiBaseUrl) } : {},
  )
  const statusCallback = `${config.publicUrl}/hooks/sms/status`
  return {
    from: config.sms.from,
    async send(to, body) {
      const message = await client.messages.create({ to, from: config.sms.from, body, statusCallback })
      return { sid: message.sid, status: message.status }
    },
  }
}

/** Whether a provider error is final (the number or the request is wrong) rather than worth retrying. */
export function isPermanentTextError(err: unknown): boolean {
  const status = (err as { status?: number }).status
  return typeof status === 'number' && status >= 400 && status < 500 && status !== 429
}

/** Posts a form-encoded webhook signed the provider's way (X-Twilio-Signature over URL + sorted params). */
export async function postSignedWebhook(url: string, params: Record<string, string>, authToken: string) {
  const signature = twilio.getExpectedTwilioSignature(authToken, url, params)
  return fetch(url, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-twilio-signature': signature },
    body: new URLSearchParams(params),
    signal: AbortSignal.timeout(10_000),
  })
}
