import { Router } from 'express'
import { z } from 'zod'
import * as results from '../controllers/resultsController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { bandResolutionQuerySchema, comparisonQuerySchema, reanalyseBodySchema, sweepQuerySchema } from '../../shared/api/results'
import type { AnalysisQueue } from '../queue/analysisQueue'
import { documentRoutes } from '../openapi/routeDocs'

const surveyParams = z.object({ surveyId: idParam })
const roomParams = z.object({ roomId: idParam })
const captureParams = z.object({ captureId: idParam })
const formatQuery = z.object({ format: z.enum(['csv', 'json'], { error: 'Choose format=csv or format=json.' }).default('csv') })

/** Survey averages, comparisons, re-analysis, exports and the test sweep. */
export function resultsRouter(context: { queue: AnalysisQueue }) {
  const router = Router()
  router.get('/surveys/:surveyId/summary', requireAuth, validate({ params: surveyParams, query: bandResolutionQuerySchema }), results.surveySummary)
  router.get('/surveys/:surveyId/export', requireAuth, validate({ params: surveyParams, query: bandResolutionQuerySchema.extend(formatQuery.shape) }), results.exportSurvey)
  router.get('/rooms/:roomId/comparison', requireAuth, validate({ params: roomParams, query: comparisonQuerySchema }), results.comparison)
  router.get('/rooms/:roomId/comparison/export', requireAuth, validate({ params: roomParams, query: comparisonQuerySchema.extend(formatQuery.shape) }), results.exportComparison)
  router.get('/captures/:captureId/export', requireAuth, validate({ params: captureParams, query: formatQuery.extend({ analysisId: idParam.optional() }) }), results.exportCapture)
  router.get('/captures/:captureId/analyses', requireAuth, validate({ params: captureParams }), results.analyses)
  router.post('/captures/:captureId/analyses', requireAuth, validate({ params: captureParams, body: reanalyseBodySchema }), results.reanalyse(context.queue))
  router.get('/test-signal/sweep.wav', validate({ query: sweepQuerySchema }), results.sweepWav)
  return router
}

documentRoutes('Results', {
  'GET /api/surveys/{surveyId}/summary': { summary: 'Spatial averages of a survey’s positions per band, judged for reliability' },
  'GET /api/surveys/{surveyId}/export': { summary: 'A survey’s band values as CSV or JSON', contentType: 'text/csv' },
  'GET /api/rooms/{roomId}/comparison': { summary: 'Two or more surveys compared per band against the room’s target' },
  'GET /api/rooms/{roomId}/comparison/export': { summary: 'A comparison as CSV or JSON', contentType: 'text/csv' },
  'GET /api/captures/{captureId}/export': { summary: 'A capture’s band values as CSV or JSON', contentType: 'text/csv' },
  'GET /api/captures/{captureId}/analyses': { summary: 'Every analysis of a capture with its settings' },
  'POST /api/captures/{captureId}/analyses': { summary: 'Analyse a capture again with other settings', status: 202, responseDescription: 'Queued (202), or the existing analysis with these settings (200).' },
  'GET /api/test-signal/sweep.wav': { summary: 'A test sweep as WAV (play it quietly first: test signals can be loud)', contentType: 'audio/wav' },
})
