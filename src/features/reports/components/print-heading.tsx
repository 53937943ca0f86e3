/** Only on paper: whose record this is, for which dates, and when it was printed. */
export function PrintHeading({ facility, title, range }: { facility: string; title: string; range: string }) {
  return (
    <p className="hidden text-sm text-tide-900 print:block">
      {facility} · {title} · {range} · printed {new Date().toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}
    </p>
  )
}
