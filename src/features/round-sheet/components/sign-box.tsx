/** A labelled blank to write in by hand. */
export function SignBox({ label, className }: { label: string; className: string }) {
  return (
    <div className={`flex items-end gap-1.5 text-xs font-semibold text-tide-900 ${className}`}>
      <span>{label}</span>
      <span aria-hidden className="h-7 flex-1 border-b border-tide-900 print:border-black" />
    </div>
  )
}
