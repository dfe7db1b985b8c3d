import { Activity, User } from '../models'
import { requireRoomAccess } from '../policy/roomAccess'
import type { ActivityDto } from '../../shared/api/invitations'

export interface ActivityEntry {
  workspaceId: number
  roomId: number | null
  userId: number | null
  action: string
  summary: string
}

/** Appends one line to the trail. A failure to record never fails the action it describes. */
export async function recordActivity(entry: ActivityEntry): Promise<void> {
  await Activity.create(entry).catch(() => undefined)
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
