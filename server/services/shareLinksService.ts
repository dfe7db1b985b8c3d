import { Room, ShareLink } from '../models'
import { HttpError, NotFoundError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { createSingleUseToken, hashToken } from '../auth/singleUseToken'
import { compareSurveys, compareSurveysOfRoom } from './comparisonService'
import { recordActivity } from './activityService'
import type { CreateShareLinkBody, ShareLinkDto } from '../../shared/api/invitations'
import type { ComparisonDto } from '../../shared/api/results'

function toDto(link: ShareLink): ShareLinkDto {
  return {
    id: link.id,
    label: link.label,
    surveyIds: link.surveyIds,
    bands: link.bands,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    createdAt: link.createdAt.toISOString(),
  }
}

/** Creates a read-only link to a comparison; the URL (with its token) is returned only here. */
export async function createShareLink(userId: number, roomId: number, body: CreateShareLinkBody, publicUrl: string): Promise<ShareLinkDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  await compareSurveys(userId, roomId, body.surveyIds, body.bands) // validates that the surveys belong to the room
  const { token, tokenHash } = createSingleUseToken()
  const expiresAt = body.expiresInDays === null ? null : new Date(Date.now() + body.expiresInDays * 24 * 3600 * 1000)
  const link = await ShareLink.create({ roomId, createdById: userId, tokenHash, surveyIds: body.surveyIds, bands: body.bands, label: body.label, expiresAt, revokedAt: null })
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'share-link.created', summary: `created a read-only link${body.label ? ` "${body.label}"` : ''}` })
  return { ...toDto(link), url: `${publicUrl}/shared/${token}` }
}

export async function listShareLinks(userId: number, roomId: number): Promise<ShareLinkDto[]> {
  await requireRoomAccess(userId, roomId, 'room:share')
  return (await ShareLink.findAll({ where: { roomId }, order: [['createdAt', 'DESC']] })).map(toDto)
}

export async function revokeShareLink(userId: number, roomId: number, linkId: number): Promise<void> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const [changed] = await ShareLink.update({ revokedAt: new Date() }, { where: { id: linkId, roomId, revokedAt: null } })
  if (changed === 0) throw new NotFoundError('That share link')
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'share-link.revoked', summary: 'revoked a read-only link' })
}

/** The comparison behind a share link, for anyone holding the token, while it is valid. */
export async function viewSharedComparison(token: string): Promise<ComparisonDto> {
  const link = await ShareLink.findOne({ where: { tokenHash: hashToken(token) } })
  if (!link) throw new NotFoundError('That shared report')
  if (link.revokedAt) throw new HttpError(410, 'share-revoked', 'This link has been withdrawn by its owner. Ask them for a new one.')
  if (link.expiresAt && link.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'share-expired', 'This link has expired. Ask its owner for a new one.')
  const room = (await Room.findByPk(link.roomId))!
  return compareSurveysOfRoom(room, link.surveyIds, link.bands)
}
