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
