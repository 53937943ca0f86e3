import { Camera, CircleCheck } from 'lucide-react'
import { useRef, useState } from 'react'
import { PHOTO_MAX_BYTES, PHOTO_TYPES, useUploadPhoto } from '../api/use-upload-photo'

/** Optional photo for a task, sent straight away (photos need a connection; readings do not). */
export function PhotoPicker({ taskId, online }: { taskId: number; online: boolean }) {
  const input = useRef<HTMLInputElement>(null)
  const upload = useUploadPhoto()
  const [sent, setSent] = useState(0)
  const [problem, setProblem] = useState<string | null>(null)

  const pick = (file: File | undefined) => {
    if (!file) return
    if (!PHOTO_TYPES.includes(file.type)) return setProblem('Photos must be JPEG, PNG or WebP.')
    if (file.size > PHOTO_MAX_BYTES) return setProblem('That photo is over 8 MB. Take it again at a smaller size.')
    setProblem(null)
    upload.mutate({ taskId, file }, { onSuccess: () => setSent((n) => n + 1) })
  }

  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
      <input
        ref={input}
        type="file"
        accept={PHOTO_TYPES.join(',')}
        capture="environment"
        className="sr-only"
        tabIndex={-1}
        aria-hidden
        onChange={(e) => {
          pick(e.target.files?.[0])
          e.target.value = ''
        }}
      />
      <button
        type="button"
        disabled={!online || upload.isPending}
        onClick={() => input.current?.click()}
        className="inline-flex min-h-12 items-center gap-2 rounded-xl px-3 font-semibold text-tide-700 ring-1 ring-tide-200 hover:bg-tide-50 disabled:text-tide-400"
      >
        <Camera aria-hidden className="size-5" /> {upload.isPending ? 'Sending photo…' : 'Add photo'}
      </button>
      {!online && <span className="text-sm text-tide-600">Photos need a connection</span>}
      {sent > 0 && (
        <span className="inline-flex items-center gap-1 text-sm font-semibold text-kelp-700">
          <CircleCheck aria-hidden className="size-4" /> {sent === 1 ? 'Photo added' : `${sent} photos added`}
        </span>
      )}
      {problem && (
        <span role="alert" className="text-sm font-semibold text-alarm-700">
          {problem}
        </span>
      )}
    </div>
  )
}
