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
import { documentRoutes } from '../openapi/routeDocs'

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

documentRoutes('Sharing', {
  'POST /api/workspaces/{workspaceId}/invitations': { summary: 'Invite someone to the workspace by e-mail', status: 201 },
  'GET /api/workspaces/{workspaceId}/invitations': { summary: 'The workspace’s open invitations' },
  'GET /api/invitations/{token}': { summary: 'What an invitation link offers (no account needed)' },
  'POST /api/invitations/{token}/accept': { summary: 'Accept an invitation as the signed-in person' },
  'POST /api/rooms/{roomId}/share-links': { summary: 'Create a read-only link to a comparison', status: 201 },
  'GET /api/rooms/{roomId}/share-links': { summary: 'The room’s read-only links' },
  'DELETE /api/rooms/{roomId}/share-links/{linkId}': { summary: 'Revoke a read-only link', status: 204, responseDescription: 'Revoked.' },
  'GET /api/shared/{token}': { summary: 'The comparison behind a read-only link (no account needed)' },
  'GET /api/rooms/{roomId}/report.pdf': { summary: 'The PDF report of a comparison', contentType: 'application/pdf' },
  'POST /api/rooms/{roomId}/reports': { summary: 'E-mail the report to the client as a read-only link', status: 201 },
  'GET /api/shared/{token}/report.pdf': { summary: 'The PDF report behind a read-only link', contentType: 'application/pdf' },
  'GET /api/rooms/{roomId}/activity': { summary: 'The room’s activity trail, newest first' },
})
