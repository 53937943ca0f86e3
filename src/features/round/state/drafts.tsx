import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react'
import type { SKIP_REASONS } from '#shared/schemas/completion'
import { UNKNOWN_CAUSE } from '#shared/schemas/stock'

export type SkipReason = (typeof SKIP_REASONS)[number]

/** What the person has typed for one task; kept while they move between tasks. */
export interface Draft {
  readings: Record<string, string>
  note: string
  noteOpen: boolean
  mode: 'done' | 'skip'
  skipReason: SkipReason | null
  /** What is known about the fish counted dead: the cause and whether one is kept for necropsy. */
  mortality: MortalityDraft
  /** Keyed like the server's fieldErrors ("readings.do_mgL", "note", "skipReason"); "form" for the task as a whole. */
  errors: Record<string, string>
}

export interface MortalityDraft {
  cause: string
  causeText: string
  necropsy: boolean
}

export const EMPTY_DRAFT: Draft = {
  readings: {},
  note: '',
  noteOpen: false,
  mode: 'done',
  skipReason: null,
  mortality: { cause: UNKNOWN_CAUSE, causeText: '', necropsy: false },
  errors: {},
}

interface DraftsValue {
  drafts: Record<number, Draft>
  update: (taskId: number, patch: Partial<Draft> | ((d: Draft) => Partial<Draft>)) => void
  clear: (taskId: number) => void
}

const DraftsContext = createContext<DraftsValue | null>(null)

export function DraftsProvider({ children }: { children: ReactNode }) {
  const [drafts, setDrafts] = useState<Record<number, Draft>>({})
  const update = useCallback<DraftsValue['update']>((taskId, patch) => {
    setDrafts((all) => {
      const current = all[taskId] ?? EMPTY_DRAFT
      return { ...all, [taskId]: { ...current, ...(typeof patch === 'function' ? patch(current) : patch) } }
    })
  }, [])
  const clear = useCallback((taskId: number) => {
    setDrafts(({ [taskId]: _gone, ...rest }) => rest)
  }, [])
  const value = useMemo(() => ({ drafts, update, clear }), [drafts, update, clear])
  return <DraftsContext.Provider value={value}>{children}</DraftsContext.Provider>
}

export function useDraft(taskId: number) {
  const ctx = useContext(DraftsContext)
  if (!ctx) throw new Error('useDraft needs a DraftsProvider')
  const { drafts, update, clear } = ctx
  return {
    draft: drafts[taskId] ?? EMPTY_DRAFT,
    update: (patch: Parameters<DraftsValue['update']>[1]) => update(taskId, patch),
    clear: () => clear(taskId),
  }
}

export function useDraftActions() {
  const ctx = useContext(DraftsContext)
  if (!ctx) throw new Error('useDraftActions needs a DraftsProvider')
  return ctx
}
