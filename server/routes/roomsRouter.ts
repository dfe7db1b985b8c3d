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
