import { ReportSelect } from './report-select'

// The audited kinds as the server names them (server/modules/audit/audit.entity.ts).
const KINDS = [
  ['', 'Every kind'],
  ['routine', 'Routines'],
  ['playbook', 'Playbooks'],
  ['limit', 'Limits'],
  ['ladder', 'Ladders'],
  ['shift', 'Shifts'],
  ['on_call', 'On-call duty'],
  ['assignment', 'Assignments'],
  ['person', 'People'],
  ['completion', 'Completions and corrections'],
  ['event', 'Events'],
  ['facility', 'Facility'],
  ['incident', 'Incidents filed by hand'],
] as const

export function AuditKindSelect({ value, onChange }: { value: string; onChange: (entity: string) => void }) {
  const options = KINDS.map(([v, label]) => ({ value: v as string, label }))
  return <ReportSelect label="Kind of record" value={value} options={options} onChange={onChange} />
}
