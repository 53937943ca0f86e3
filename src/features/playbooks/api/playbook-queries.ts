import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { EventSchema, PlaybookSchema, type FacilityEvent, type Playbook } from '#shared/schemas/playbook'
import { TaskSchema } from '#shared/schemas/task'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'
import { belongsToEvent, eventTaskWindows } from '../utils/event-tasks'

export const playbookKeys = {
  all: ['playbooks'] as const,
  lists: () => [...playbookKeys.all, 'list'] as const,
  detail: (id: number) => [...playbookKeys.all, 'detail', id] as const,
}

export const eventKeys = {
  all: ['events'] as const,
  lists: () => [...eventKeys.all, 'list'] as const,
  list: (from: string, to: string) => [...eventKeys.lists(), { from, to }] as const,
  detail: (id: number) => [...eventKeys.all, 'detail', id] as const,
}

async function fetchEventTasks(event: FacilityEvent, playbook: Playbook, zone: string) {
  const windows = eventTaskWindows(event, playbook, zone)
  const pages = await Promise.all(windows.map((w) => apiFetch(`/tasks?${new URLSearchParams(w)}`, z.array(TaskSchema))))
  return pages.flat().filter((t) => belongsToEvent(t, event, playbook))
}

export const playbookQueries = {
  list: () => queryOptions({ queryKey: playbookKeys.lists(), queryFn: () => apiFetch('/playbooks', z.array(PlaybookSchema)) }),
  detail: (id: number) => queryOptions({ queryKey: playbookKeys.detail(id), queryFn: () => apiFetch(`/playbooks/${id}`, PlaybookSchema) }),
  events: (from: string, to: string) =>
    queryOptions({ queryKey: eventKeys.list(from, to), queryFn: () => apiFetch(`/events?${new URLSearchParams({ from, to })}`, z.array(EventSchema)) }),
  event: (id: number) => queryOptions({ queryKey: eventKeys.detail(id), queryFn: () => apiFetch(`/events/${id}`, EventSchema) }),
  eventTasks: (event: FacilityEvent, playbook: Playbook, zone: string) =>
    queryOptions({
      queryKey: taskKeys.list({ eventId: event.id, version: `${event.localStart}|${event.status}|${event.taskCount}` }),
      queryFn: () => fetchEventTasks(event, playbook, zone),
    }),
}
