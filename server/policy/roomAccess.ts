import { Membership, Room, RoomShare } from '../models'
import { ForbiddenError, NotFoundError } from '../errors'
import type { Role } from '../../shared/api/common'
import type { RoomPermissions } from '../../shared/api/rooms'
import { mayInWorkspace, mayOnRoom, maySeeRoom, type RoomAction, type WorkspaceAction } from './policy'

export interface RoomAccess {
  room: Room
  role: Role
  isShared: boolean
}

/** The caller's role in a workspace, or a 404 when they are not a member (existence stays hidden). */
export async function requireWorkspaceRole(userId: number, workspaceId: number, action: WorkspaceAction): Promise<Role> {
  const membership = await Membership.findOne({ where: { userId, workspaceId } })
  if (!membership) throw new NotFoundError('That workspace')
  if (!mayInWorkspace(membership.role, action)) throw new ForbiddenError()
  return membership.role
}

/**
 * Loads a room for an action. A room the caller cannot see (another workspace, or not shared with
 * a client/viewer) is a 404; a visible room the role may not change is a 403.
 */
export async function requireRoomAccess(userId: number, roomId: number, action: RoomAction): Promise<RoomAccess> {
  const room = await Room.findByPk(roomId)
  if (!room) throw new NotFoundError('That room')
  const membership = await Membership.findOne({ where: { userId, workspaceId: room.workspaceId } })
  if (!membership) throw new NotFoundError('That room')
  const isShared = (await RoomShare.count({ where: { roomId, userId } })) > 0
  if (!maySeeRoom(membership.role, isShared)) throw new NotFoundError('That room')
  if (!mayOnRoom(membership.role, isShared, action)) throw new ForbiddenError()
  return { room, role: membership.role, isShared }
}

export function roomPermissions(role: Role, isShared: boolean): RoomPermissions {
  return {
    role,
    canEdit: mayOnRoom(role, isShared, 'room:update'),
    canDelete: mayOnRoom(role, isShared, 'room:delete'),
    canShare: mayOnRoom(role, isShared, 'room:share'),
    canAddCaptures: mayOnRoom(role, isShared, 'capture:create'),
    canJudgeCaptures: mayOnRoom(role, isShared, 'capture:judge'),
  }
}
