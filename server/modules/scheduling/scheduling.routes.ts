import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { BulkMoveInputSchema, MoveTaskInputSchema } from '#shared/schemas/task'
import { AppError } from '../../lib/errors'
import { db } from '../../db/data-source'
import { requireRole } from '../../lib/require-role'
import { moveTask } from './move-task.service'

/** Board moves, mounted under /api/tasks beside the tasks router: the move rules read the roster. */
export const taskMovesRouter = Router()

taskMovesRouter.post('/bulk-move', requireRole('manager', 'supervisor'), async (req, res) => {
  const { tasks, ...move } = BulkMoveInputSchema.parse(req.body)
  const moved = []
  const refused = []
  // One at a time, each in a savepoint, so each card gets its own verdict (a stale one does not
  // block the rest). Only a refusal is a verdict: a database error fails the whole request.
  for (const t of tasks) {
    try {
      moved.push(await db().transaction(() => moveTask(t.id, req.user!, { ...move, version: t.version })))
    } catch (err) {
      if (!(err instanceof AppError)) throw err
      refused.push({ id: t.id, message: err.message })
    }
  }
  res.json({ moved, refused })
})
taskMovesRouter.patch('/:id', requireRole('manager', 'supervisor'), async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  res.json(await moveTask(id, req.user!, MoveTaskInputSchema.parse(req.body)))
})
