import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as surveys from '../services/surveysService'
import type { CreateSurveyBody, UpdateSurveyBody } from '../../shared/api/surveys'
import type { ObjectStore } from '../storage/createObjectStore'

export async function list(req: Request, res: Response) {
  const { roomId } = req.params as unknown as { roomId: number }
  res.json(await surveys.listSurveys(currentUserId(req), roomId))
}

export async function create(req: Request, res: Response) {
  const { roomId } = req.params as unknown as { roomId: number }
  res.status(201).json(await surveys.createSurvey(currentUserId(req), roomId, req.body as CreateSurveyBody))
}

export async function show(req: Request, res: Response) {
  const { surveyId } = req.params as unknown as { surveyId: number }
  res.json(await surveys.getSurvey(currentUserId(req), surveyId))
}

export async function update(req: Request, res: Response) {
  const { surveyId } = req.params as unknown as { surveyId: number }
  res.json(await surveys.updateSurvey(currentUserId(req), surveyId, req.body as UpdateSurveyBody))
}

export function remove(store: ObjectStore) {
  return async (req: Request, res: Response) => {
    const { surveyId } = req.params as unknown as { surveyId: number }
    await surveys.deleteSurvey(currentUserId(req), surveyId, store)
    res.status(204).end()
  }
}
