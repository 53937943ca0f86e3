import type { StaffMember } from '#shared/schemas/person'

/** The options of a person select; a person on a saved row who has since left stays choosable. */
export function PersonOptions({ staff, extra }: { staff: StaffMember[]; extra?: { id: number; name: string } }) {
  const missing = extra && !staff.some((p) => p.id === extra.id)
  return (
    <>
      <option value="">Choose a person…</option>
      {staff.map((p) => (
        <option key={p.id} value={p.id}>
          {p.name}
        </option>
      ))}
      {missing && <option value={extra.id}>{extra.name} (inactive)</option>}
    </>
  )
}
