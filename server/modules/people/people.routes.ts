import { Router } from 'express'
import { CreatePersonInputSchema, PersonIdParamSchema, ResetPasswordInputSchema, UpdatePersonInputSchema } from '#shared/schemas/person'
import { requireRole } from '../../lib/require-role'
import { createPerson, listPeople, listStaff, resetPassword, updatePerson } from './people.service'
import { forbidden } from '../../lib/errors'

export const peopleRouter = Router()

// Planners need names to roster and assign; this short list leaves out e-mail and account state.
export const staffRouter = Router()
staffRouter.get('/', requireRole('manager', 'supervisor'), async (_req, res) => {
  res.json(await listStaff())
})

peopleRouter.use(requireRole('manager'))

peopleRouter.get('/', async (_req, res) => {
  res.json(await listPeople())
})

peopleRouter.post('/', async (req, res) => {
  res.status(201).json(await createPerson(CreatePersonInputSchema.parse(req.body)))
})

peopleRouter.patch('/:id', async (req, res) => {
  const { id } = PersonIdParamSchema.parse(req.params)
  const input = UpdatePersonInputSchema.parse(req.body)
  if (id === req.user!.id && (input.active === false || (input.role && input.role !== 'manager'))) {
    throw forbidden('You cannot deactivate yourself or remove your own manager role; ask another manager.')
  }
  res.json(await updatePerson(id, input))
})

peopleRouter.post('/:id/password', async (req, res) => {
  const { id } = PersonIdParamSchema.parse(req.params)
  const { password } = ResetPasswordInputSchema.parse(req.body)
  res.json(await resetPassword(id, password))
})
