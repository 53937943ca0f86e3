import type { Playbook, ParsedPlaybookInput } from '#shared/schemas/playbook'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { PlaybookEntity } from './playbook.entities'

const repo = () => db().getRepository(PlaybookEntity)

export const listPlaybooks = (): Promise<Playbook[]> => repo().find({ order: { name: 'ASC' } })

export async function getPlaybook(id: number): Promise<Playbook> {
  const row = await repo().findOneBy({ id })
  if (!row) throw notFound('That playbook')
  return row
}

export async function createPlaybook(data: ParsedPlaybookInput): Promise<Playbook> {
  const saved = await repo().save(data)
  await audit('playbook', saved.id, 'create', null, saved)
  return saved
}

export async function updatePlaybook(id: number, data: ParsedPlaybookInput): Promise<Playbook> {
  const current = await getPlaybook(id)
  const saved = await repo().save({ ...current, ...data })
  await audit('playbook', id, 'update', current, saved)
  return saved
}
