import { Room, User } from '../models'
import { HttpError } from '../errors'
import { compareSurveys } from './comparisonService'
import { createShareLink, viewSharedComparison } from './shareLinksService'
import { recordActivity } from './activityService'
import { reportReadyMail } from '../mail/messages'
import { renderComparisonPdf } from '../reports/renderComparisonPdf'
import type { MailContext } from './invitationsService'
import type { BandResolution } from '../../shared/types/analysis'
import type { ShareLinkDto } from '../../shared/api/invitations'

export async function comparisonReportPdf(userId: number, roomId: number, surveyIds: number[], bands: BandResolution): Promise<{ pdf: Buffer; roomName: string }> {
  const comparison = await compareSurveys(userId, roomId, surveyIds, bands)
  const user = await User.findByPk(userId, { attributes: ['name'] })
  return { pdf: await renderComparisonPdf(comparison, { generatedAt: new Date(), preparedBy: user?.name ?? null }), roomName: comparison.roomName }
}

export async function sharedReportPdf(token: string): Promise<{ pdf: Buffer; roomName: string }> {
  const comparison = await viewSharedComparison(token)
  return { pdf: await renderComparisonPdf(comparison, { generatedAt: new Date(), preparedBy: null }), roomName: comparison.roomName }
}

/** Creates a read-only link to the comparison and e-mails it ("your report is ready"). */
export async function sendReport(
  userId: number,
  roomId: number,
  input: { surveyIds: number[]; bands: BandResolution; recipientEmail: string; expiresInDays: number | null },
  context: MailContext,
): Promise<ShareLinkDto> {
  const link = await createShareLink(userId, roomId, { surveyIds: input.surveyIds, bands: input.bands, label: `Report for ${input.recipientEmail}`, expiresInDays: input.expiresInDays }, context.publicUrl)
  const [sender, comparison] = await Promise.all([User.findByPk(userId), compareSurveys(userId, roomId, input.surveyIds, input.bands)])
  try {
    await context.mailer.send(reportReadyMail({ to: input.recipientEmail, roomName: comparison.roomName, link: link.url!, senderName: sender!.name }))
  } catch (error) {
    throw new HttpError(502, 'mail-failed', `The report link was created but the e-mail could not be sent (${(error as Error).message}). Copy the link instead: ${link.url}`)
  }
  const room = await Room.findByPk(roomId, { attributes: ['workspaceId'] })
  await recordActivity({ workspaceId: room!.workspaceId, roomId, userId, action: 'report.sent', summary: `sent the report to ${input.recipientEmail}` })
  return link
}
