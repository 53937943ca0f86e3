import { useMutation } from '@tanstack/react-query'
import { z } from 'zod'
import { text } from '#shared/schemas/text'
import { apiFetch } from '../../../lib/api-client'

// The photo route answers with this shape; shared/ has no schema for it yet.
const UploadedPhotoSchema = z.object({ id: text(), mimeType: text(), sizeBytes: z.number() })

export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp']
export const PHOTO_MAX_BYTES = 8 * 1024 * 1024

export function useUploadPhoto() {
  return useMutation({
    mutationFn: ({ taskId, file }: { taskId: number; file: File }) => {
      const body = new FormData()
      body.append('photo', file)
      return apiFetch(`/tasks/${taskId}/photos`, UploadedPhotoSchema, { method: 'POST', body })
    },
  })
}
