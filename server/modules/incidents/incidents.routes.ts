import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { DecideIncidentInputSchema, FileIncidentInputSchema, IncidentNoteInputSchema, UpdateIncidentInputSchema } from '#shared/schemas/incident'
import { requireRole, signedIn } from '../../lib/require-role'
import { addIncidentNote, decideIncident, fileIncident, getIncident, listIncidents, updateIncident } from './incidents.service'

export const incidentsRouter = Router()

const id = (params: unknown) => IdParamSchema.parse(params).id

incidentsRouter.get('/incidents', signedIn, async (_req, res) => {
  res.json(await listIncidents())
})
// A technician may file too (often first at the tank); theirs waits for a supervisor's decision (record 14e).
incidentsRouter.post('/incidents', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.status(201).json(await fileIncident(FileIncidentInputSchema.parse(req.body), req.user!))
})
incidentsRouter.get('/incidents/:id', signedIn, async (req, res) => {
  res.json(await getIncident(id(req.params)))
})
incidentsRouter.post('/incidents/:id/confirm', requireRole('manager', 'supervisor'), async (req, res) => {
  res.json(await decideIncident(id(req.params), 'confirm', DecideIncidentInputSchema.parse(req.body), req.user!))
})
incidentsRouter.post('/incidents/:id/dismiss', requireRole('manager', 'supervisor'), async (req, res) => {
  res.json(await decideIncident(id(req.params), 'dismiss', DecideIncidentInputSchema.parse(req.body), req.user!))
})
incidentsRouter.patch('/incidents/:id', requireRole('manager', 'supervisor'), async (req, res) => {
  res.json(await updateIncident(id(req.params), UpdateIncidentInputSchema.parse(req.body)))
})
incidentsRouter.post('/incidents/:id/notes', requireRole('manager', 'supervisor', 'observer'), async (req, res) => {
  res.status(201).json(await addIncidentNote(id(req.params), IncidentNoteInputSchema.parse(req.body), req.user!))
})
