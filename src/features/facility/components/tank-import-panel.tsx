import { CircleCheck, Download, FileUp, Loader2, TriangleAlert } from 'lucide-react'
import { useId, useState, type FormEvent } from 'react'
import type { TankImportResult } from '#shared/schemas/facility'
import { Button } from '../../../components/ui/button'
import { ApiError } from '../../../lib/api-client'
import { useImportTanks } from '../api/use-import-tanks'

const HEADER = 'code,name,area,system,volume_l,kind,in_use'
const EXAMPLE = `${HEADER}\nN-01,Nursery 1,NUR,RAS-1,800,tank,yes\nQ-03,Quarantine bin 3,QUA,,120,bin,no`
const TEMPLATE_HREF = `data:text/csv;charset=utf-8,${encodeURIComponent(`${HEADER}\n`)}`

export function TankImportPanel() {
  const importTanks = useImportTanks()
  const inputId = useId()
  const [file, setFile] = useState<File | null>(null)
  const [inputKey, setInputKey] = useState(0)
  const [done, setDone] = useState<{ fileName: string; counts: TankImportResult } | null>(null)
  const error = importTanks.error
  const lines = error instanceof ApiError ? error.fieldErrors?.file : undefined

  const submit = (e: FormEvent) => {
    e.preventDefault()
    if (!file) return
    setDone(null)
    importTanks.mutate(file, {
      onSuccess: (counts) => {
        setDone({ fileName: file.name, counts })
        setFile(null)
        setInputKey((k) => k + 1)
      },
    })
  }

  return (
    <section aria-labelledby={`${inputId}-title`} className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4">
      <h3 id={`${inputId}-title`} className="flex items-center gap-2 text-lg font-bold text-tide-900">
        <FileUp aria-hidden className="size-5" /> Import tanks from a CSV file
      </h3>
      <div className="flex flex-col gap-2 text-sm text-tide-700">
        <p>
          One tank per line, with this header. Give area and system by their code (leave system empty for a standalone tank), and in_use as yes or no. A line
          whose code already exists updates that tank. If any line has a problem, nothing is imported.
        </p>
        <pre className="overflow-x-auto rounded-lg bg-tide-50 p-3 font-mono text-xs text-tide-900">{EXAMPLE}</pre>
        <a href={TEMPLATE_HREF} download="roundtide-tanks.csv" className="inline-flex min-h-11 w-fit items-center gap-1 font-semibold text-tide-700 underline">
          <Download aria-hidden className="size-4" /> Download an empty template
        </a>
      </div>
      <form onSubmit={submit} className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <label htmlFor={inputId} className="text-sm font-semibold text-tide-800">
            CSV file
          </label>
          <input
            key={inputKey}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null)
              importTanks.reset()
            }}
            className="min-h-11 w-full rounded-lg border border-tide-200 p-1 text-sm file:mr-3 file:min-h-9 file:rounded-md file:border-0 file:bg-tide-100 file:px-3 file:font-semibold file:text-tide-800"
          />
        </div>
        <Button type="submit" disabled={!file || importTanks.isPending}>
          {importTanks.isPending ? 'Importing…' : 'Import tanks'}
        </Button>
      </form>
      {importTanks.isPending && (
        <div role="status" className="flex flex-col gap-2 text-sm text-tide-700">
          <span className="flex items-center gap-2">
            <Loader2 aria-hidden className="size-4 animate-spin" /> Uploading and checking {file?.name}…
          </span>
          <progress aria-label="Import progress" className="h-2 w-full accent-tide-600" />
        </div>
      )}
      {error && (
        <div role="alert" className="rounded-lg border border-alarm-100 bg-alarm-50 p-3 text-sm text-alarm-700">
          <p className="flex items-center gap-2 font-semibold">
            <TriangleAlert aria-hidden className="size-4 shrink-0" /> {error.message}
          </p>
          {lines && lines.length > 0 && (
            <ul className="mt-2 flex list-disc flex-col gap-1 pl-5">
              {lines.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          )}
        </div>
      )}
      {done && (
        <p role="status" className="flex items-center gap-2 rounded-lg bg-kelp-50 p-3 text-sm font-semibold text-kelp-700">
          <CircleCheck aria-hidden className="size-4 shrink-0" />
          Imported {done.fileName}: {done.counts.created} created, {done.counts.updated} updated, {done.counts.unchanged} unchanged.
        </p>
      )}
    </section>
  )
}
