import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import { requireSurveyAccess } from '../services/surveysService'
import type { SurveyEventHub } from '../events/surveyEventHub'

/** Whether the session the stream was opened with still exists for the same user (not signed out). */
function isSessionStillSignedIn(req: Request, userId: number): Promise<boolean> {
  return new Promise((resolve, reject) => {
    req.sessionStore.get(req.sessionID, (error, stored) => {
      if (error) reject(error as Error)
      else resolve((stored as { passport?: { user?: unknown } } | null | undefined)?.passport?.user === userId)
    })
  })
}

/** `GET /api/surveys/:surveyId/events`: the survey's live capture status as server-sent events. */
export function stream(hub: SurveyEventHub) {
  return async (req: Request, res: Response) => {
    const userId = currentUserId(req)
    const { surveyId } = req.params as unknown as { surveyId: number }
    await requireSurveyAccess(userId, surveyId, 'room:read')
    const isStillAllowed = async () =>
      (await isSessionStillSignedIn(req, userId)) && (await requireSurveyAccess(userId, surveyId, 'room:read').then(() => true, () => false))
    await hub.attach(req, res, surveyId, isStillAllowed)
  }
}
