import { useQuery } from '@tanstack/react-query'
import { useController } from 'react-hook-form'
import { ROLES, ROLE_LABELS, type Role } from '#shared/schemas/person'
import type { AssigneeRule, RoutineInput } from '#shared/schemas/routine'
import { staffQueries } from '../../../api/staff'
import { SelectField } from '../../../components/ui/select-field'
import { FormSection } from './form-section'

type Kind = AssigneeRule['kind']

export function AssigneePicker({ canPickPerson }: { canPickPerson: boolean }) {
  const { field, fieldState } = useController<RoutineInput, 'assigneeRule'>({ name: 'assigneeRule' })
  const rule: AssigneeRule = field.value ?? { kind: 'none' }
  const people = useQuery({ ...staffQueries.people(), enabled: canPickPerson })
  const active = (people.data ?? []).filter((p) => p.active && p.role !== 'observer')
  // A supervisor cannot list people, but must not silently lose a manager's named choice.
  const offerPerson = canPickPerson || rule.kind === 'person'

  function changeKind(kind: Kind) {
    if (kind === 'person') field.onChange({ kind, personId: rule.kind === 'person' ? rule.personId : (active[0]?.id ?? 0) })
    else if (kind === 'role_on_shift') field.onChange({ kind, role: 'technician' })
    else field.onChange({ kind })
  }

  const personError = (fieldState.error as { personId?: { message?: string } } | undefined)?.personId?.message
  return (
    <FormSection title="Who" description="Who a new task goes to before anyone assigns it." className="sm:grid-cols-2">
      <SelectField label="Default assignee" value={rule.kind} onChange={(e) => changeKind(e.target.value as Kind)}>
        <option value="none">Nobody (assign on the board)</option>
        {offerPerson && <option value="person">A named person</option>}
        <option value="role_on_shift">Whoever of a role is on shift</option>
        <option value="on_call">The on-call person</option>
      </SelectField>
      {rule.kind === 'person' && canPickPerson && (
        <SelectField
          label="Person"
          value={rule.personId}
          onChange={(e) => field.onChange({ kind: 'person', personId: Number(e.target.value) })}
          error={personError}
          hint={people.isPending ? 'Loading people…' : people.isError ? `Could not load people: ${people.error.message}` : undefined}
        >
          {!active.some((p) => p.id === rule.personId) && <option value={rule.personId}>Choose a person</option>}
          {active.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({ROLE_LABELS[p.role]})
            </option>
          ))}
        </SelectField>
      )}
      {rule.kind === 'person' && !canPickPerson && (
        <p className="self-end text-sm text-tide-700">A manager chose a named person; only a manager can change who.</p>
      )}
      {rule.kind === 'role_on_shift' && (
        <SelectField label="Role" value={rule.role} onChange={(e) => field.onChange({ kind: 'role_on_shift', role: e.target.value as Role })}>
          {ROLES.filter((r) => r !== 'observer').map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
      )}
    </FormSection>
  )
}
