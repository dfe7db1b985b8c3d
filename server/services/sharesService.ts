import { Membership, RoomShare, User } from '../models'
import { ConflictError, NotFoundError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import type { RoomShareDto, ShareRoomBody } from '../../shared/api/rooms'
import { recordActivity } from './activityService'

export async function listShares(userId: number, roomId: number): Promise<RoomShareDto[]> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const shares = await RoomShare.findAll({ where: { roomId }, include: [{ model: User, as: 'user' }], order: [['id', 'ASC']] })
  const memberships = await Membership.findAll({ where: { workspaceId: room.workspaceId, userId: shares.map((s) => s.userId) } })
  const roleOf = new Map(memberships.map((m) => [m.userId, m.role]))
  return shares.map((share) => ({
    userId: share.userId,
    name: share.user!.name,
    email: share.user!.email,
    role: roleOf.get(share.userId) ?? 'viewer',
  }))
}

/** Shares a room with a client or viewer who is already a member of the room's workspace. */
export async function shareRoom(userId: number, roomId: number, body: ShareRoomBody): Promise<RoomShareDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const user = await User.findOne({ where: { email: body.email } })
  const membership = user && (await Membership.findOne({ where: { workspaceId: room.workspaceId, userId: user.id } }))
  if (!user || !membership) throw new NotFoundError('A member of this workspace with that e-mail', 'member-not-found')
  if (membership.role === 'owner' || membership.role === 'engineer') {
    throw new ConflictError('already-visible', 'Owners and engineers already see every room of the workspace.')
  }
  const [, created] = await RoomShare.findOrCreate({ where: { roomId, userId: user.id } })
  if (!created) throw new ConflictError('already-shared', 'The room is already shared with that person.')
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'room.shared', summary: `shared the room with ${user.email} (${membership.role})` })
  return { userId: user.id, name: user.name, email: user.email, role: membership.role }
}

export async function unshareRoom(userId: number, roomId: number, targetUserId: number): Promise<void> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:share')
  const removed = await RoomShare.destroy({ where: { roomId, userId: targetUserId } })
  if (removed === 0) throw new NotFoundError('That share')
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'room.unshared', summary: 'stopped sharing the room with a member' })
}
