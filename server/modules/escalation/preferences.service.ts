import { PreferencesInputSchema, type Preferences } from '#shared/schemas/preferences'
import type { AppConfig } from '../../lib/config'
import { notFound } from '../../lib/errors'
import { findContact, updateContact, type Contact } from '../people/contact.service'
import { acceptedChannels } from './channels'

const toPreferences = (config: AppConfig, p: Contact): Preferences => ({
  email: p.email,
  phone: p.phone,
  channels: acceptedChannels(p),
  quietStart: p.quietStart,
  quietEnd: p.quietEnd,
  available: { sms: config.sms.mode !== 'off', push: config.push.enabled && config.push.vapid !== null },
})

export async function myPreferences(config: AppConfig, personId: number): Promise<Preferences> {
  const contact = await findContact(personId)
  if (!contact) throw notFound('That person')
  return toPreferences(config, contact)
}

/** My addresses, accepted channels and quiet hours; texts need a mobile number on file. */
export async function updateMyPreferences(config: AppConfig, personId: number, body: unknown): Promise<Preferences> {
  const input = PreferencesInputSchema.parse(body)
  const current = await findContact(personId)
  if (!current) throw notFound('That person')
  const phone = input.phone === undefined ? current.phone : input.phone
  const channels = input.channels ?? acceptedChannels(current)
  // Taking the number away also takes texts away, rather than leaving a channel that cannot work.
  await updateContact(personId, { ...input, channels: phone ? channels : channels.filter((c) => c !== 'sms').concat(channels.length === 1 && channels[0] === 'sms' ? ['email'] : []) })
  return myPreferences(config, personId)
}
