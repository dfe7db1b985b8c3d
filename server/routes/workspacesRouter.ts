import { Router } from 'express'
import { z } from 'zod'
import * as rooms from '../controllers/roomsController'
import * as members from '../controllers/membersController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { createRoomBodySchema, listRoomsQuerySchema } from '../../shared/api/rooms'
import { addMemberBodySchema, updateMemberBodySchema } from '../../shared/api/members'
import { documentRoutes } from '../openapi/routeDocs'

const workspaceParams = z.object({ workspaceId: idParam })
const memberParams = z.object({ workspaceId: idParam, userId: idParam })

export function workspacesRouter() {
  const router = Router()
  router.use(requireAuth)
  router.get('/:workspaceId/rooms', validate({ params: workspaceParams, query: listRoomsQuerySchema }), rooms.list)
  router.post('/:workspaceId/rooms', validate({ params: workspaceParams, body: createRoomBodySchema }), rooms.create)
  router.get('/:workspaceId/members', validate({ params: workspaceParams }), members.list)
  router.post('/:workspaceId/members', validate({ params: workspaceParams, body: addMemberBodySchema }), members.add)
  router.patch('/:workspaceId/members/:userId', validate({ params: memberParams, body: updateMemberBodySchema }), members.update)
  router.delete('/:workspaceId/members/:userId', validate({ params: memberParams }), members.remove)
  return router
}

documentRoutes('Workspaces', {
  'GET /api/workspaces/{workspaceId}/rooms': { summary: 'The rooms the caller may see in a workspace, with search' },
  'POST /api/workspaces/{workspaceId}/rooms': { summary: 'Create a room', status: 201 },
  'GET /api/workspaces/{workspaceId}/members': { summary: 'The workspace’s members and their roles' },
  'POST /api/workspaces/{workspaceId}/members': { summary: 'Add a registered person as a member', status: 201 },
  'PATCH /api/workspaces/{workspaceId}/members/{userId}': { summary: 'Change a member’s role (their API tokens are lowered to it)' },
  'DELETE /api/workspaces/{workspaceId}/members/{userId}': { summary: 'Remove a member (their API tokens for the workspace are revoked)', status: 204, responseDescription: 'Removed.' },
})
