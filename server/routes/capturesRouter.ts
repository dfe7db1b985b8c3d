import { Router, type RequestHandler } from 'express'
import { z } from 'zod'
import * as captures from '../controllers/capturesController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { captureUpload } from '../middleware/upload'
import { idParam } from '../../shared/api/common'
import { createCaptureFieldsSchema, listCapturesQuerySchema } from '../../shared/api/captures'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { ObjectStore } from '../storage/createObjectStore'
import type { IncomingUpload } from '../storage/incomingUploadStorage'
import { discardUploads } from '../storage/commitUploads'
import { documentRoutes } from '../openapi/routeDocs'
import { analysisResponseSchema, captureResponseSchema } from '../openapi/responseSchemas'

const surveyParams = z.object({ surveyId: idParam })
const captureParams = z.object({ captureId: idParam })

/** Removes the uploaded temporary objects when the form fields fail validation. */
function validateFieldsOrDiscard(store: ObjectStore): RequestHandler {
  return (req, res, next) => {
    try {
      validate({ body: createCaptureFieldsSchema })(req, res, next)
    } catch (error) {
      const files = Object.values((req.files ?? {}) as unknown as Record<string, IncomingUpload[]>).flat()
      void discardUploads(store, files).finally(() => next(error))
    }
  }
}

export function capturesRouter(context: { store: ObjectStore; uploadLimitMb: number; queue: AnalysisQueue }) {
  const router = Router()
  router.get('/surveys/:surveyId/captures', requireAuth, validate({ params: surveyParams, query: listCapturesQuerySchema }), captures.list)
  router.post(
    '/surveys/:surveyId/captures',
    requireAuth,
    validate({ params: surveyParams }),
    captures.authoriseUpload,
    captureUpload(context.store, context.uploadLimitMb),
    validateFieldsOrDiscard(context.store),
    captures.create(context),
  )
  router.get('/captures/:captureId', requireAuth, validate({ params: captureParams }), captures.show)
  router.get('/captures/:captureId/analysis', requireAuth, validate({ params: captureParams, query: z.object({ analysisId: idParam.optional() }) }), captures.latestAnalysis)
  router.delete('/captures/:captureId', requireAuth, validate({ params: captureParams }), captures.remove(context.store))
  return router
}

documentRoutes('Captures', {
  'GET /api/surveys/{surveyId}/captures': {
    summary: 'One page of a survey’s captures, with their status and headline values',
    response: z.object({ items: z.array(captureResponseSchema), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() }),
  },
  'POST /api/surveys/{surveyId}/captures': {
    summary: 'Upload a capture (WAV) and queue its analysis',
    description: 'Follow `GET /api/surveys/{surveyId}/events`, or poll `GET /api/captures/{captureId}`, until its status is `done` or `failed`, then read the analysis.',
    status: 202,
    response: captureResponseSchema,
    responseDescription: 'Stored and queued for analysis.',
    multipart: {
      fields: createCaptureFieldsSchema,
      files: {
        file: { description: 'The impulse response or sweep recording, WAV.', contentType: 'audio/wav', isRequired: true },
        reference: { description: 'The reference sweep a sweep recording was made with, WAV.', contentType: 'audio/wav', isRequired: false },
      },
    },
  },
  'GET /api/captures/{captureId}': { summary: 'One capture with its analysis status', response: captureResponseSchema },
  'GET /api/captures/{captureId}/analysis': { summary: 'The newest analysis of a capture (or the one asked for)', response: analysisResponseSchema },
  'DELETE /api/captures/{captureId}': { summary: 'Delete a capture and its analyses', status: 204, responseDescription: 'Deleted.' },
})
