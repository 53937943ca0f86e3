import { Router } from 'express'
import { DateTime } from 'luxon'
import { IdParamSchema } from '#shared/schemas/facility'
import {
  HandoverNoteInputSchema,
  OnCallInputSchema,
  RosterRangeQuerySchema,
  RotationInputSchema,
  ShiftInputSchema,
  ShiftPatchSchema,
  ShiftPatternInputSchema,
} from '#shared/schemas/roster'
import { recordChange } from '../../realtime/change-outbox'
import { requireRole, signedIn } from '../../lib/require-role'
import { applyAssigneeRules } from './assignee-rules.service'
import { getCalendar } from './calendar.service'
import { rosterCoverage } from './coverage.service'
import { addHandoverNote, getOnCallSummary } from './on-call.service'
import { applyShiftPattern, createOnCall, createShift, deleteOnCall, deleteShift, listOnCall, listShifts, updateShift } from './roster.service'
import { generateRotation } from './rotation.service'

export const rosterRouter = Router()
const planners = requireRole('manager', 'supervisor')

/** A roster change may change who a rule assigns; re-apply the rules over the next weeks (in the request's commit). */
async function afterRosterChange() {
  const today = DateTime.utc().minus({ days: 1 }).toISODate()!
  await applyAssigneeRules(today, DateTime.utc().plus({ days: 43 }).toISODate()!)
  await recordChange('roster')
}

rosterRouter.get('/shifts', signedIn, async (req, res) => {
  const { from, to } = RosterRangeQuerySchema.parse(req.query)
  res.json(await listShifts(from, to))
})
rosterRouter.post('/shifts', planners, async (req, res) => {
  const shift = await createShift(ShiftInputSchema.parse(req.body))
  await afterRosterChange()
  res.status(201).json(shift)
})
rosterRouter.post('/shifts/pattern', planners, async (req, res) => {
  const result = await applyShiftPattern(ShiftPatternInputSchema.parse(req.body))
  await afterRosterChange()
  res.status(201).json(result)
})
rosterRouter.patch('/shifts/:id', planners, async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  const shift = await updateShift(id, ShiftPatchSchema.parse(req.body))
  await afterRosterChange()
  res.json(shift)
})
rosterRouter.delete('/shifts/:id', planners, async (req, res) => {
  await deleteShift(IdParamSchema.parse(req.params).id)
  await afterRosterChange()
  res.status(204).end()
})

rosterRouter.get('/on-call-duties', signedIn, async (req, res) => {
  const { from, to } = RosterRangeQuerySchema.parse(req.query)
  res.json(await listOnCall(from, to))
})
rosterRouter.post('/on-call-duties', planners, async (req, res) => {
  const duty = await createOnCall(OnCallInputSchema.parse(req.body))
  await afterRosterChange()
  res.status(201).json(duty)
})
rosterRouter.post('/on-call-duties/rotation', planners, async (req, res) => {
  const result = await generateRotation(RotationInputSchema.parse(req.body))
  await afterRosterChange()
  res.status(201).json(result)
})
rosterRouter.delete('/on-call-duties/:id', planners, async (req, res) => {
  await deleteOnCall(IdParamSchema.parse(req.params).id)
  await afterRosterChange()
  res.status(204).end()
})

rosterRouter.get('/roster/coverage', planners, async (req, res) => {
  const { from, to } = RosterRangeQuerySchema.parse(req.query)
  res.json(await rosterCoverage(from, to))
})
rosterRouter.get('/calendar', signedIn, async (req, res) => {
  const { from, to } = RosterRangeQuerySchema.parse(req.query)
  res.json(await getCalendar(from, to))
})
rosterRouter.get('/on-call', signedIn, async (_req, res) => {
  res.json(await getOnCallSummary())
})
rosterRouter.post('/on-call/notes', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.status(201).json(await addHandoverNote(req.user!, HandoverNoteInputSchema.parse(req.body)))
})
