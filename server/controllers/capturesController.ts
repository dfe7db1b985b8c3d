import type { Request, Response, NextFunction } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as captures from '../services/capturesService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { ObjectStore } from '../storage/createObjectStore'
import type { IncomingUpload } from '../storage/incomingUploadStorage'
import type { CreateCaptureFields, ListCapturesQuery } from '../../shared/api/captures'

type SurveyParams = { surveyId: number }
type CaptureParams = { captureId: number }
type UploadedFiles = Record<string, IncomingUpload[] | undefined>

/** Runs before multer: a caller who may not add to the survey is refused before the upload starts. */
export async function authoriseUpload(req: Request, _res: Response, next: NextFunction) {
  await captures.assertMayAddCapture(currentUserId(req), (req.params as unknown as SurveyParams).surveyId)
  next()
}

export function create(context: { store: ObjectStore; queue: AnalysisQueue }) {
  return async (req: Request, res: Response) => {
    const files = (req.files ?? {}) as unknown as UploadedFiles
    const { surveyId } = req.params as unknown as SurveyParams
    const capture = await captures.createCapture(
      currentUserId(req),
      surveyId,
      req.body as CreateCaptureFields,
      { file: files.file?.[0], reference: files.reference?.[0] },
      context,
    )
    res.status(202).json(capture)
  }
}

export async function list(req: Request, res: Response) {
  const { surveyId } = req.params as unknown as SurveyParams
  res.json(await captures.listCaptures(currentUserId(req), surveyId, req.query as unknown as ListCapturesQuery))
}

export async function show(req: Request, res: Response) {
  res.json(await captures.getCapture(currentUserId(req), (req.params as unknown as CaptureParams).captureId))
}

export async function latestAnalysis(req: Request, res: Response) {
  const { analysisId } = req.query as { analysisId?: number }
  res.json(await captures.getLatestAnalysis(currentUserId(req), (req.params as unknown as CaptureParams).captureId, analysisId))
}

export function remove(store: ObjectStore) {
  return async (req: Request, res: Response) => {
    await captures.deleteCapture(currentUserId(req), (req.params as unknown as CaptureParams).captureId, store)
    res.status(204).end()
  }
}
