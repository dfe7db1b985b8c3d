import { Router } from 'express'
import { z } from 'zod'
import * as invitations from '../controllers/invitationsController'
import * as reports from '../controllers/reportsController'
import { comparisonQuerySchema } from '../../shared/api/results'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { createInvitationBodySchema, createShareLinkBodySchema, linkTokenParamsSchema, sendReportBodySchema } from '../../shared/api/invitations'
import type { MailContext } from '../services/invitationsService'

const workspaceParams = z.object({ workspaceId: idParam })
const roomParams = z.object({ roomId: idParam })
const linkParams = z.object({ roomId: idParam, linkId: idParam })
const tokenParams = linkTokenParamsSchema('That link is not valid: copy the whole link from the e-mail.')

/** Invitations, read-only share links, PDF reports and the activity trail. */
export function invitationsRouter(context: MailContext) {
  const router = Router()
  router.post('/workspaces/:workspaceId/invitations', requireAuth, validate({ params: workspaceParams, body: createInvitationBodySchema }), invitations.create(context))
  router.get('/workspaces/:workspaceId/invitations', requireAuth, validate({ params: workspaceParams }), invitations.list)
  router.get('/invitations/:token', validate({ params: tokenParams }), invitations.preview)
  router.post('/invitations/:token/accept', requireAuth, validate({ params: tokenParams }), invitations.accept)
  router.post('/rooms/:roomId/share-links', requireAuth, validate({ params: roomParams, body: createShareLinkBodySchema }), invitations.createShareLink(context.publicUrl))
  router.get('/rooms/:roomId/share-links', requireAuth, validate({ params: roomParams }), invitations.listShareLinks)
  router.delete('/rooms/:roomId/share-links/:linkId', requireAuth, validate({ params: linkParams }), invitations.revokeShareLink)
  router.get('/shared/:token', validate({ params: tokenParams }), invitations.viewShared)
  router.get('/rooms/:roomId/report.pdf', requireAuth, validate({ params: roomParams, query: comparisonQuerySchema }), reports.roomReport)
  router.post('/rooms/:roomId/reports', requireAuth, validate({ params: roomParams, body: sendReportBodySchema }), reports.send(context))
  router.get('/shared/:token/report.pdf', validate({ params: tokenParams }), reports.sharedReport)
  router.get('/rooms/:roomId/activity', requireAuth, validate({ params: roomParams }), invitations.activity)
  return router
}
