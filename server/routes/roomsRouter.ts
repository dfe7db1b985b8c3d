import { Router } from 'express'
import { z } from 'zod'
import * as rooms from '../controllers/roomsController'
import * as surveys from '../controllers/surveysController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { shareRoomBodySchema, updateRoomBodySchema } from '../../shared/api/rooms'
import { createSurveyBodySchema } from '../../shared/api/surveys'
import type { ObjectStore } from '../storage/createObjectStore'
import { documentRoutes } from '../openapi/routeDocs'
import { surveyResponseSchema } from '../openapi/responseSchemas'

const roomParams = z.object({ roomId: idParam })
const shareParams = z.object({ roomId: idParam, userId: idParam })

export function roomsRouter(context: { store: ObjectStore }) {
  const router = Router()
  router.use(requireAuth)
  router.get('/:roomId', validate({ params: roomParams }), rooms.show)
  router.patch('/:roomId', validate({ params: roomParams, body: updateRoomBodySchema }), rooms.update)
  router.delete('/:roomId', validate({ params: roomParams }), rooms.remove(context.store))
  router.get('/:roomId/shares', validate({ params: roomParams }), rooms.listShares)
  router.post('/:roomId/shares', validate({ params: roomParams, body: shareRoomBodySchema }), rooms.share)
  router.delete('/:roomId/shares/:userId', validate({ params: shareParams }), rooms.unshare)
  router.get('/:roomId/surveys', validate({ params: roomParams }), surveys.list)
  router.post('/:roomId/surveys', validate({ params: roomParams, body: createSurveyBodySchema }), surveys.create)
  return router
}

documentRoutes('Rooms', {
  'GET /api/rooms/{roomId}': { summary: 'One room with its key figures and the caller’s permissions' },
  'PATCH /api/rooms/{roomId}': { summary: 'Change a room' },
  'DELETE /api/rooms/{roomId}': { summary: 'Delete a room with its surveys and captures', status: 204, responseDescription: 'Deleted.' },
  'GET /api/rooms/{roomId}/shares': { summary: 'Members the room is shared with' },
  'POST /api/rooms/{roomId}/shares': { summary: 'Share the room with a client or viewer of the workspace', status: 201 },
  'DELETE /api/rooms/{roomId}/shares/{userId}': { summary: 'Stop sharing the room with a member', status: 204, responseDescription: 'No longer shared.' },
  'GET /api/rooms/{roomId}/surveys': { summary: 'The room’s surveys in date order', response: z.array(surveyResponseSchema) },
  'POST /api/rooms/{roomId}/surveys': { summary: 'Add a survey (one measured condition of the room)', status: 201, response: surveyResponseSchema },
})
