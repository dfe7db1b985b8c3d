import { documentRoutes } from '../openapi/routeDocs'
import { captureResponseSchema } from '../openapi/responseSchemas'
import express, { Router } from 'express'
import { z } from 'zod'
import * as inputs from '../controllers/reportInputsController'
import * as revisions from '../controllers/reportRevisionsController'
import * as settings from '../controllers/workspaceSettingsController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { captureInclusionBodySchema, pinAnalysisBodySchema } from '../../shared/api/captures'
import { surveyAnalysisSettingsSchema } from '../../shared/api/surveys'
import { customTargetBodySchema, setRoomTargetBodySchema } from '../../shared/api/targets'
import { LOGO_MAX_BYTES, workspaceProfileBodySchema } from '../../shared/api/workspaceProfile'
import type { AnalysisQueue } from '../queue/analysisQueue'

const captureParams = z.object({ captureId: idParam })
const surveyParams = z.object({ surveyId: idParam })
const roomParams = z.object({ roomId: idParam })
const revisionParams = z.object({ roomId: idParam, revisionId: idParam })
const workspaceParams = z.object({ workspaceId: idParam })
const targetParams = z.object({ workspaceId: idParam, targetId: idParam })
// One byte over the limit is enough for the service to say "at most 1 MB" instead of a bare 413.
const logoBody = express.raw({ type: ['image/png', 'image/jpeg', 'application/octet-stream'], limit: LOGO_MAX_BYTES + 1 })

/**
 * What a report rests on and its revisions: positions in or out of the average, the analysis
 * that counts, whole-survey analysis, the room's target, custom targets, the consultancy profile
 * and the frozen report revisions.
 */
export function reportInputsRouter(context: { queue: AnalysisQueue }) {
  const router = Router()
  router.put('/captures/:captureId/inclusion', requireAuth, validate({ params: captureParams, body: captureInclusionBodySchema }), inputs.setInclusion)
  router.put('/captures/:captureId/pinned-analysis', requireAuth, validate({ params: captureParams, body: pinAnalysisBodySchema }), inputs.pin)
  router.post('/surveys/:surveyId/analyses', requireAuth, validate({ params: surveyParams, body: surveyAnalysisSettingsSchema }), inputs.analyseSurvey(context.queue))
  router.get('/surveys/:surveyId/analysis-progress', requireAuth, validate({ params: surveyParams }), inputs.analysisProgress)
  router.put('/rooms/:roomId/target', requireAuth, validate({ params: roomParams, body: setRoomTargetBodySchema }), inputs.setTarget)
  router.get('/rooms/:roomId/report-revisions', requireAuth, validate({ params: roomParams }), revisions.list)
  router.get('/rooms/:roomId/report-revisions/:revisionId', requireAuth, validate({ params: revisionParams }), revisions.show)
  router.get('/rooms/:roomId/report-revisions/:revisionId/report.pdf', requireAuth, validate({ params: revisionParams }), revisions.pdf)
  router.get('/workspaces/:workspaceId/custom-targets', requireAuth, validate({ params: workspaceParams }), settings.listTargets)
  router.post('/workspaces/:workspaceId/custom-targets', requireAuth, validate({ params: workspaceParams, body: customTargetBodySchema }), settings.createTarget)
  router.put('/workspaces/:workspaceId/custom-targets/:targetId', requireAuth, validate({ params: targetParams, body: customTargetBodySchema }), settings.updateTarget)
  router.delete('/workspaces/:workspaceId/custom-targets/:targetId', requireAuth, validate({ params: targetParams }), settings.deleteTarget)
  router.get('/workspaces/:workspaceId/target-options', requireAuth, validate({ params: workspaceParams }), settings.targetOptions)
  router.get('/workspaces/:workspaceId/profile', requireAuth, validate({ params: workspaceParams }), settings.showProfile)
  router.put('/workspaces/:workspaceId/profile', requireAuth, validate({ params: workspaceParams, body: workspaceProfileBodySchema }), settings.updateProfile)
  router.get('/workspaces/:workspaceId/profile/logo', requireAuth, validate({ params: workspaceParams }), settings.showLogo)
  router.put('/workspaces/:workspaceId/profile/logo', requireAuth, logoBody, validate({ params: workspaceParams }), settings.setLogo)
  router.delete('/workspaces/:workspaceId/profile/logo', requireAuth, validate({ params: workspaceParams }), settings.removeLogo)
  return router
}

documentRoutes('Reports', {
  'PUT /api/captures/{captureId}/inclusion': { summary: 'Include a capture in its survey average, or leave it out with a reason (owners, engineers)', response: captureResponseSchema },
  'PUT /api/captures/{captureId}/pinned-analysis': { summary: 'Pin the analysis used for reporting; null goes back to the default rule (owners, engineers)', response: captureResponseSchema },
  'POST /api/surveys/{surveyId}/analyses': { summary: 'Analyse the whole survey with these settings (they become the survey’s)', status: 202 },
  'GET /api/surveys/{surveyId}/analysis-progress': { summary: 'How many captures of the survey are analysed with its settings, pending or failed' },
  'PUT /api/rooms/{roomId}/target': { summary: 'Choose the room’s target (a published one or a custom target of the workspace)' },
  'GET /api/rooms/{roomId}/report-revisions': { summary: 'The room’s report revisions: sent ones with their dates, and the draft' },
  'GET /api/rooms/{roomId}/report-revisions/{revisionId}': { summary: 'One report revision with its frozen snapshot' },
  'GET /api/rooms/{roomId}/report-revisions/{revisionId}/report.pdf': { summary: 'The PDF of a report revision, as it was sent', contentType: 'application/pdf' },
  'GET /api/workspaces/{workspaceId}/custom-targets': { summary: 'The workspace’s custom targets' },
  'POST /api/workspaces/{workspaceId}/custom-targets': { summary: 'Define a custom target (name, limits per band, source note)', status: 201 },
  'PUT /api/workspaces/{workspaceId}/custom-targets/{targetId}': { summary: 'Change a custom target' },
  'DELETE /api/workspaces/{workspaceId}/custom-targets/{targetId}': { summary: 'Delete a custom target no room uses', status: 204, responseDescription: 'Deleted.' },
  'GET /api/workspaces/{workspaceId}/target-options': { summary: 'Every target a room of the workspace may choose, published and custom' },
  'GET /api/workspaces/{workspaceId}/profile': { summary: 'The consultancy profile printed on reports' },
  'PUT /api/workspaces/{workspaceId}/profile': { summary: 'Change the consultancy profile (owners)' },
  'GET /api/workspaces/{workspaceId}/profile/logo': { summary: 'The profile’s logo image', contentType: 'image/png' },
  'PUT /api/workspaces/{workspaceId}/profile/logo': { summary: 'Upload the profile’s logo (the request body is the PNG or JPEG image)' },
  'DELETE /api/workspaces/{workspaceId}/profile/logo': { summary: 'Remove the profile’s logo', status: 204, responseDescription: 'Removed.' },
})
