import { Router, type RequestHandler } from 'express'
import { rm } from 'node:fs/promises'
import { z } from 'zod'
import * as captures from '../controllers/capturesController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { captureUpload } from '../middleware/upload'
import { idParam } from '../../shared/api/common'
import { createCaptureFieldsSchema, listCapturesQuerySchema } from '../../shared/api/captures'
import type { AnalysisQueue } from '../queue/analysisQueue'

const surveyParams = z.object({ surveyId: idParam })
const captureParams = z.object({ captureId: idParam })

/** Removes the uploaded temporary files when the form fields fail validation. */
const validateFieldsOrDiscard: RequestHandler = (req, res, next) => {
  try {
    validate({ body: createCaptureFieldsSchema })(req, res, next)
  } catch (error) {
    const files = Object.values((req.files ?? {}) as Record<string, Express.Multer.File[]>).flat()
    void Promise.all(files.map((file) => rm(file.path, { force: true }))).finally(() => next(error))
  }
}

export function capturesRouter(context: { storageDir: string; uploadLimitMb: number; queue: AnalysisQueue }) {
  const router = Router()
  router.get('/surveys/:surveyId/captures', requireAuth, validate({ params: surveyParams, query: listCapturesQuerySchema }), captures.list)
  router.post(
    '/surveys/:surveyId/captures',
    requireAuth,
    validate({ params: surveyParams }),
    captures.authoriseUpload,
    captureUpload(context.storageDir, context.uploadLimitMb),
    validateFieldsOrDiscard,
    captures.create(context),
  )
  router.get('/captures/:captureId', requireAuth, validate({ params: captureParams }), captures.show)
  router.get('/captures/:captureId/analysis', requireAuth, validate({ params: captureParams, query: z.object({ analysisId: idParam.optional() }) }), captures.latestAnalysis)
  router.delete('/captures/:captureId', requireAuth, validate({ params: captureParams }), captures.remove(context.storageDir))
  return router
}
