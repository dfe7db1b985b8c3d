import { documentRoutes } from '../openapi/routeDocs'
import { Router } from 'express'
import { z } from 'zod'
import * as surveyEvents from '../controllers/surveyEventsController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import type { SurveyEventHub } from '../events/surveyEventHub'

const surveyParams = z.object({ surveyId: idParam })

/** Live status streams (server-sent events). */
export function surveyEventsRouter(hub: SurveyEventHub) {
  const router = Router()
  router.get('/surveys/:surveyId/events', requireAuth, validate({ params: surveyParams }), surveyEvents.stream(hub))
  return router
}

documentRoutes('Surveys', {
  'GET /api/surveys/{surveyId}/events': {
    summary: 'Live status of the survey’s captures (server-sent events: ready, capture, capture-deleted, resync)',
    contentType: 'text/event-stream',
  },
})
