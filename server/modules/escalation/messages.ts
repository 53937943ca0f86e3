import type { AlertRow } from '../completions/alert-records'
import type { TaskRow } from '../tasks/task-queries'

export interface MessageInput {
  alert: AlertRow
  /** Null for an incident filed by hand (it has no task). */
  task: TaskRow | null
  targetLabel: string
  step: number
  /** The task's page, or the incident's when there is no task. */
  link: string
  ackUrl: string
  now: Date
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!)

/** Subject says what, where and how late; both parts carry the task (or incident) link and the acknowledge link. */
export function composeMessage(m: MessageInput) {
  if (!m.task) return composeIncidentMessage(m)
  const late = Math.max(0, Math.round((m.now.getTime() - m.task.dueAt.getTime()) / 60_000))
  const lateText = late >= 60 ? `${Math.floor(late / 60)} h${late % 60 ? ` ${late % 60} min` : ''} late` : `${late} min late`
  // An overdue incident deadline carries its own words in the detail; the task only says where it began.
  const incident = m.alert.kind.startsWith('incident_')
  const subject =
    m.alert.kind === 'critical_reading'
      ? `CRITICAL reading: ${m.alert.detail} at ${m.targetLabel} (${m.task.title})`
      : incident
        ? `INCIDENT deadline passed: ${m.alert.detail}`
        : `MISSED: ${m.task.title} at ${m.targetLabel}, ${lateText}`
  const lines = [
    m.alert.kind === 'critical_reading'
      ? `A critical reading was recorded: ${m.alert.detail}.`
      : incident
        ? `${m.alert.detail}. Open Incidents in Roundtide and record who was told and when.`
        : `This task was not done within its grace time. It was due at ${m.task.localStart.replace('T', ' ').slice(0, 16)} (facility time) and is ${lateText}.`,
    `Task: ${m.task.title}`,
    `Where: ${m.targetLabel}`,
    m.step > 0 ? `This is step ${m.step + 1} of the escalation: nobody has answered yet.` : '',
    '',
    `Open the task: ${m.link}`,
    `Acknowledge (stops further messages): ${m.ackUrl}`,
    '',
    'Roundtide is not an alarm system. If fish are at risk, act on site first.',
  ]
  return { subject, ...render(lines, m, 'Open the task') }
}

/** An incident filed by hand has no task: the message names the incident and opens it. */
function composeIncidentMessage(m: MessageInput) {
  const lines = [
    `${m.alert.detail}. Open the incident in Roundtide and record who was told and when.`,
    m.step > 0 ? `This is step ${m.step + 1} of the escalation: nobody has answered yet.` : '',
    '',
    `Open the incident: ${m.link}`,
    `Acknowledge (stops further messages): ${m.ackUrl}`,
  ]
  return { subject: `INCIDENT deadline passed: ${m.alert.detail}`, ...render(lines, m, 'Open the incident') }
}

function render(all: string[], m: Pick<MessageInput, 'link' | 'ackUrl'>, open: string) {
  const lines = all.filter((l, i) => l !== '' || all[i - 1] !== '')
  const text = lines.join('\n')
  const html = `<div style="font-family:sans-serif">${lines
    .map((l) =>
      l.startsWith(`${open}:`)
        ? `<p><a href="${escapeHtml(m.link)}">${open}</a></p>`
        : l.startsWith('Acknowledge')
          ? `<p><a href="${escapeHtml(m.ackUrl)}"><strong>Acknowledge</strong></a> (stops further messages)</p>`
          : l
            ? `<p>${escapeHtml(l)}</p>`
            : '',
    )
    .join('')}</div>`
  return { text, html }
}

/** A text is short: what and where, the reply code that acknowledges, and the task (or incident) link. */
export function composeText(m: Omit<MessageInput, 'ackUrl'> & { replyCode: string }) {
  const { subject } = composeMessage({ ...m, ackUrl: '' })
  return `Roundtide ${subject}. Reply ${m.replyCode} to acknowledge. ${m.link}`
}
