import { randomUUID } from 'node:crypto'
import { mkdir, writeFile } from 'node:fs/promises'
import path from 'node:path'
import type { Person } from '#shared/schemas/person'
import { db } from '../../db/data-source'
import { AppError, notFound } from '../../lib/errors'
import { getTaskRow } from '../tasks/tasks.service'
import { PhotoEntity } from './completion.entities'
import { assertMayAddPhoto } from './who-may-complete'

export const PHOTO_MAX_BYTES = 8 * 1024 * 1024
const EXTENSIONS: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' }

/** Checks the bytes, not the name: a file is kept only if it really starts like a JPEG, PNG or WebP. */
function sniff(buffer: Buffer): string | null {
  if (buffer.subarray(0, 3).equals(Buffer.from([0xff, 0xd8, 0xff]))) return 'image/jpeg'
  if (buffer.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png'
  if (buffer.subarray(0, 4).toString('ascii') === 'RIFF' && buffer.subarray(8, 12).toString('ascii') === 'WEBP') return 'image/webp'
  return null
}

export async function savePhoto(uploadDir: string, taskId: number, person: Person, file: { buffer: Buffer; mimetype: string }) {
  assertMayAddPhoto(await getTaskRow(taskId), person)
  const mimeType = sniff(file.buffer)
  if (!mimeType) throw new AppError(415, 'unsupported_media_type', 'Photos must be JPEG, PNG or WebP images.')
  const id = randomUUID()
  // The stored name is ours alone, so nothing in the uploaded name can reach the file system.
  const fileName = `${id}.${EXTENSIONS[mimeType]}`
  await mkdir(path.resolve(uploadDir), { recursive: true })
  await writeFile(path.resolve(uploadDir, fileName), file.buffer)
  return db().getRepository(PhotoEntity).save({ id, taskId, personId: person.id, fileName, mimeType, sizeBytes: file.buffer.length })
}

export async function photoFile(uploadDir: string, id: string) {
  const row = await db().getRepository(PhotoEntity).findOneBy({ id })
  if (!row) throw notFound('That photo')
  return { path: path.resolve(uploadDir, row.fileName), mimeType: row.mimeType }
}

export const listPhotos = (taskId: number) =>
  db()
    .getRepository(PhotoEntity)
    .find({ where: { taskId }, order: { createdAt: 'ASC' } })
