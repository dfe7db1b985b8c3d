import { Router } from 'express'
import { z } from 'zod'
import * as surveys from '../controllers/surveysController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { updateSurveyBodySchema } from '../../shared/api/surveys'
import type { ObjectStore } from '../storage/createObjectStore'
import { documentRoutes } from '../openapi/routeDocs'
import { surveyResponseSchema } from '../openapi/responseSchemas'

const surveyParams = z.object({ surveyId: idParam })

export function surveysRouter(context: { store: ObjectStore }) {
  const router = Router()
  router.use(requireAuth)
  router.get('/:surveyId', validate({ params: surveyParams }), surveys.show)
  router.patch('/:surveyId', validate({ params: surveyParams, body: updateSurveyBodySchema }), surveys.update)
  router.delete('/:surveyId', validate({ params: surveyParams }), surveys.remove(context.store))
  return router
}

documentRoutes('Surveys', {
  'GET /api/surveys/{surveyId}': { summary: 'One survey', response: surveyResponseSchema },
  'PATCH /api/surveys/{surveyId}': { summary: 'Change a survey', response: surveyResponseSchema },
  'DELETE /api/surveys/{surveyId}': { summary: 'Delete a survey and its captures', status: 204, responseDescription: 'Deleted.' },
})
