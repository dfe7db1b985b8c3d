import { Activity, User } from '../models'
import { requireRoomAccess } from '../policy/roomAccess'
import type { ActivityDto } from '../../shared/api/invitations'
import { currentTokenScope } from '../auth/actingScope'

export interface ActivityEntry {
  workspaceId: number
  roomId: number | null
  userId: number | null
  action: string
  summary: string
  /** Set by token management itself; otherwise taken from the request's API token, if any. */
  apiTokenId?: number | null
}

/**
 * Appends one line to the trail. An action taken with an API token names the token, so the trail
 * tells a person's own clicks from their scripts. A failure to record never fails the action.
 */
export async function recordActivity(entry: ActivityEntry): Promise<void> {
  const scope = currentTokenScope()
  const viaToken = scope !== null && scope.userId === entry.userId && entry.apiTokenId === undefined
  const summary = viaToken ? `${entry.summary} (with the API token "${scope.tokenName}")` : entry.summary
  const apiTokenId = viaToken ? scope.tokenId : (entry.apiTokenId ?? null)
  await Activity.create({ ...entry, summary: summary.slice(0, 500), apiTokenId }).catch(() => undefined)
}

/** A room's trail, newest first (the last 200 lines). */
export async function listRoomActivity(userId: number, roomId: number): Promise<ActivityDto[]> {
  await requireRoomAccess(userId, roomId, 'room:read')
  const rows = await Activity.findAll({ where: { roomId }, include: [{ model: User, as: 'user', attributes: ['name'] }], order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 })
  return rows.map((row) => ({
    id: row.id,
    action: row.action,
    summary: row.summary,
    userName: (row as Activity & { user?: { name: string } }).user?.name ?? null,
    createdAt: row.createdAt.toISOString(),
  }))
}
