import type { BoardCard } from '#shared/schemas/board'

/** The tank or target code alone ("NUR-T01"), which is how people say it aloud. */
export const targetCode = (task: BoardCard) => task.targetLabel.split(' · ')[0]

/** "Morning tank check, NUR-T01 at 07:30" — for labels and screen-reader announcements. */
export const taskPhrase = (task: BoardCard) => `${task.title}, ${targetCode(task)} at ${task.localTime}`

export const minutesText = (minutes: number) => (minutes < 60 ? `${minutes} min` : `${Math.floor(minutes / 60)} h${minutes % 60 ? ` ${minutes % 60} min` : ''}`)
