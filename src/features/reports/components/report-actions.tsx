import { Download, Printer } from 'lucide-react'
import { Button } from '../../../components/ui/button'

/** Download the same rows as CSV (a plain link: same origin, the session cookie goes along) or print the page. */
export function ReportActions({ csvHref, label }: { csvHref: string; label: string }) {
  return (
    <div className="flex flex-wrap gap-2 print:hidden">
      <a
        href={csvHref}
        download
        aria-label={`Download CSV: ${label}`}
        className="inline-flex min-h-11 items-center gap-2 rounded-lg bg-white px-4 font-semibold text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50"
      >
        <Download aria-hidden className="size-4" /> Download CSV
      </a>
      <Button type="button" variant="secondary" onClick={() => window.print()}>
        <Printer aria-hidden className="size-4" /> Print
      </Button>
    </div>
  )
}
