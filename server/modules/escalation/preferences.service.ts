import bcrypt from 'bcryptjs'
import type { Preferences, PreferencesInput } from '#shared/schemas/preferences'
import type { AppConfig } from '../../lib/config'
import { notFound, validationError } from '../../lib/errors'
import { audit } from '../audit/audit.service'
import { findContact, updateContact, type Contact } from '../people/contact.service'
import { getPersonRow } from '../people/people.service'
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

/**
 * My addresses, accepted channels and quiet hours; texts need a mobile number on file. A new
 * sign-in address needs the current password, checked before anything else is said about the
 * address (so "already in use" is no free account probe); an address someone else has is refused
 * by the unique key as a 409.
 */
export async function updateMyPreferences(config: AppConfig, personId: number, changes: PreferencesInput): Promise<Preferences> {
  const { currentPassword, ...input } = changes
  const current = await getPersonRow(personId)
  if (input.email !== undefined && input.email !== current.email) {
    if (!currentPassword)
      throw validationError('Enter your current password to change the address you sign in with.', { currentPassword: ['Enter your current password'] })
    if (!(await bcrypt.compare(currentPassword, current.passwordHash))) {
      throw validationError('That is not your current password; nothing was saved.', { currentPassword: ['Not your current password'] })
    }
  }
  const phone = input.phone === undefined ? current.phone : input.phone
  const channels = input.channels ?? acceptedChannels(current)
  // Taking the number away also takes texts away, rather than leaving a channel that cannot work.
  await updateContact(personId, {
    ...input,
    channels: phone ? channels : channels.filter((c) => c !== 'sms').concat(channels.length === 1 && channels[0] === 'sms' ? ['email'] : []),
  })
  const saved = await myPreferences(config, personId)
  if (saved.email !== current.email) await audit('person', personId, 'update', { email: current.email }, { email: saved.email })
  return saved
}
