import { ReportRevision, Room, User } from '../models'
import { HttpError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { createShareLink, sharedRevisionPdf, viewSharedComparison } from './shareLinksService'
import { recordActivity } from './activityService'
import { addRevisionRecipient } from './reportRevisionsService'
import { buildReportSnapshot, reportProfileOf } from './reportSnapshot'
import { reportReadyMail } from '../mail/messages'
import { renderReportPdf } from '../reports/renderReportPdf'
import type { MailContext } from './invitationsService'
import type { BandResolution } from '../../shared/types/analysis'
import type { ShareLinkDto } from '../../shared/api/invitations'

/** A draft preview of the report as it would be sent now (marked as a draft on every page). */
export async function comparisonReportPdf(userId: number, roomId: number, surveyIds: number[], bands: BandResolution): Promise<{ pdf: Buffer; roomName: string }> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:read')
  const latest = await ReportRevision.findOne({ where: { roomId }, order: [['number', 'DESC']], attributes: ['number', 'frozenAt'] })
  const number = latest ? (latest.frozenAt ? latest.number + 1 : latest.number) : 1
  const { snapshot, logo } = await buildReportSnapshot(room, surveyIds, bands, { userId, revisionNumber: number, frozenAt: new Date() })
  return { pdf: await renderReportPdf(snapshot, { logo, isDraft: true }), roomName: room.name }
}

/** The PDF behind a share link: its frozen revision's stored PDF (old links: rendered live). */
export async function sharedReportPdf(token: string): Promise<{ pdf: Buffer; roomName: string }> {
  const stored = await sharedRevisionPdf(token)
  if (stored) return stored
  const comparison = await viewSharedComparison(token)
  const room = (await Room.findByPk(comparison.roomId))!
  const { profile, logo } = await reportProfileOf(room.workspaceId)
  const snapshot = { revisionNumber: 0, frozenAt: new Date().toISOString(), preparedBy: null, profile, comparison, methods: [], engineVersions: [] }
  return { pdf: await renderReportPdf(snapshot, { logo, isDraft: false }), roomName: comparison.roomName }
}

/** Freezes the report as a revision, creates a read-only link to it and e-mails it ("your report is ready"). */
export async function sendReport(
  userId: number,
  roomId: number,
  input: { surveyIds: number[]; bands: BandResolution; recipientEmail: string; expiresInDays: number | null },
  context: MailContext,
): Promise<ShareLinkDto> {
  const { link, revision } = await createShareLink(userId, roomId, { surveyIds: input.surveyIds, bands: input.bands, label: `Report for ${input.recipientEmail}`, expiresInDays: input.expiresInDays }, context.publicUrl)
  const sender = await User.findByPk(userId)
  const snapshot = revision.snapshot!
  try {
    await context.mailer.send(
      reportReadyMail({ to: input.recipientEmail, roomName: snapshot.comparison.roomName, link: link.url!, senderName: sender!.name, revisionNumber: revision.number, frozenAt: new Date(snapshot.frozenAt), summaryLine: snapshot.comparison.summaryLine }),
    )
  } catch (error) {
    throw new HttpError(502, 'mail-failed', `The report link was created but the e-mail could not be sent (${(error as Error).message}). Copy the link instead: ${link.url}`)
  }
  await addRevisionRecipient(revision.id, input.recipientEmail)
  const room = await Room.findByPk(roomId, { attributes: ['workspaceId'] })
  await recordActivity({ workspaceId: room!.workspaceId, roomId, userId, action: 'report.sent', summary: `sent report revision ${revision.number} to ${input.recipientEmail}` })
  return link
}
