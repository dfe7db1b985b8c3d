import { Room, ShareLink } from '../models'
import { HttpError, NotFoundError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { createSingleUseToken, hashToken } from '../auth/singleUseToken'
import { compareSurveysOfRoom } from './comparisonService'
import { recordActivity } from './activityService'
import { freezeRevision, revisionForLink } from './reportRevisionsService'
import type { CreateShareLinkBody, ShareLinkDto } from '../../shared/api/invitations'
import type { ComparisonDto } from '../../shared/api/results'
import type { ReportRevision } from '../models'

function toDto(link: ShareLink, revisionNumber: number | null): ShareLinkDto {
  return {
    id: link.id,
    label: link.label,
    surveyIds: link.surveyIds,
    bands: link.bands,
    reportRevisionId: link.reportRevisionId ?? null,
    revisionNumber,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    createdAt: link.createdAt.toISOString(),
  }
}

/**
 * Creates a read-only link to a comparison. Sharing freezes the report: the link shows that
 * revision forever, whatever is uploaded or re-analysed later. The URL (with its token) is
 * returned only here.
 */
export async function createShareLink(userId: number, roomId: number, body: CreateShareLinkBody, publicUrl: string): Promise<{ link: ShareLinkDto; revision: ReportRevision }> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const revision = await freezeRevision(userId, room, body.surveyIds, body.bands)
  const { token, tokenHash } = createSingleUseToken()
  const expiresAt = body.expiresInDays === null ? null : new Date(Date.now() + body.expiresInDays * 24 * 3600 * 1000)
  const link = await ShareLink.create({ roomId, createdById: userId, tokenHash, surveyIds: body.surveyIds, bands: body.bands, label: body.label, expiresAt, revokedAt: null, reportRevisionId: revision.id })
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'share-link.created', summary: `created a read-only link to report revision ${revision.number}${body.label ? ` "${body.label}"` : ''}` })
  return { link: { ...toDto(link, revision.number), url: `${publicUrl}/shared/${token}` }, revision }
}

export async function listShareLinks(userId: number, roomId: number): Promise<ShareLinkDto[]> {
  await requireRoomAccess(userId, roomId, 'room:share')
  const links = await ShareLink.findAll({ where: { roomId }, include: [{ association: 'reportRevision', attributes: ['number'] }], order: [['createdAt', 'DESC']] })
  return links.map((link) => toDto(link, (link as ShareLink & { reportRevision?: { number: number } }).reportRevision?.number ?? null))
}

export async function revokeShareLink(userId: number, roomId: number, linkId: number): Promise<void> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const [changed] = await ShareLink.update({ revokedAt: new Date() }, { where: { id: linkId, roomId, revokedAt: null } })
  if (changed === 0) throw new NotFoundError('That share link')
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'share-link.revoked', summary: 'revoked a read-only link' })
}

/** A share link that is still valid, or the 404/410 that says why not. */
async function requireValidLink(token: string): Promise<ShareLink> {
  const link = await ShareLink.findOne({ where: { tokenHash: hashToken(token) } })
  if (!link) throw new NotFoundError('That shared report')
  if (link.revokedAt) throw new HttpError(410, 'share-revoked', 'This link has been withdrawn by its owner. Ask them for a new one.')
  if (link.expiresAt && link.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'share-expired', 'This link has expired. Ask its owner for a new one.')
  return link
}

/**
 * What a share link shows, for anyone holding the token while it is valid: its frozen revision
 * (links made before revisions existed show the live comparison).
 */
export async function viewSharedComparison(token: string): Promise<ComparisonDto> {
  const link = await requireValidLink(token)
  if (link.reportRevisionId) {
    const revision = await revisionForLink(link.reportRevisionId)
    const snapshot = revision.snapshot!
    return { ...snapshot.comparison, revision: { number: revision.number, frozenAt: snapshot.frozenAt, preparedBy: snapshot.preparedBy, consultancyName: snapshot.profile.consultancyName } }
  }
  const room = (await Room.findByPk(link.roomId))!
  return compareSurveysOfRoom(room, link.surveyIds, link.bands)
}

/** The stored PDF of a link's revision, or null for a link made before revisions existed. */
export async function sharedRevisionPdf(token: string): Promise<{ pdf: Buffer; roomName: string } | null> {
  const link = await requireValidLink(token)
  if (!link.reportRevisionId) return null
  const revision = await revisionForLink(link.reportRevisionId)
  return { pdf: revision.pdf!, roomName: revision.snapshot!.comparison.roomName }
}
