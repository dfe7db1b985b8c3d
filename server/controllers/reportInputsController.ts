import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import { pinAnalysis, setCaptureInclusion } from '../services/captureJudgementService'
import { analyseWholeSurvey, surveyAnalysisProgress } from '../services/surveyAnalysisService'
import { updateRoom } from '../services/roomsService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { CaptureInclusionBody, PinAnalysisBody } from '../../shared/api/captures'
import type { SurveyAnalysisSettings } from '../../shared/api/surveys'

type CaptureParams = { captureId: number }
type SurveyParams = { surveyId: number }

export async function setInclusion(req: Request, res: Response) {
  res.json(await setCaptureInclusion(currentUserId(req), (req.params as unknown as CaptureParams).captureId, req.body as CaptureInclusionBody))
}

export async function pin(req: Request, res: Response) {
  res.json(await pinAnalysis(currentUserId(req), (req.params as unknown as CaptureParams).captureId, (req.body as PinAnalysisBody).analysisId))
}

export function analyseSurvey(queue: AnalysisQueue) {
  return async (req: Request, res: Response) => {
    const run = await analyseWholeSurvey(currentUserId(req), (req.params as unknown as SurveyParams).surveyId, req.body as SurveyAnalysisSettings, queue)
    res.status(run.queued > 0 ? 202 : 200).json(run)
  }
}

export async function analysisProgress(req: Request, res: Response) {
  res.json(await surveyAnalysisProgress(currentUserId(req), (req.params as unknown as SurveyParams).surveyId))
}

export async function setTarget(req: Request, res: Response) {
  res.json(await updateRoom(currentUserId(req), (req.params as unknown as { roomId: number }).roomId, { targetProfile: (req.body as { targetProfile: string }).targetProfile }))
}
