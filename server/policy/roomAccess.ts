import { Room, RoomShare } from '../models'
import { ForbiddenError, NotFoundError } from '../errors'
import type { Role } from '../../shared/api/common'
import type { RoomPermissions } from '../../shared/api/rooms'
import { mayInWorkspace, mayOnRoom, maySeeRoom, type RoomAction, type WorkspaceAction } from './policy'
import { findActingRole } from './actingMembership'

export interface RoomAccess {
  room: Room
  role: Role
  isShared: boolean
}

/** The caller's role in a workspace, or a 404 when they are not a member (existence stays hidden). */
export async function requireWorkspaceRole(userId: number, workspaceId: number, action: WorkspaceAction): Promise<Role> {
  const role = await findActingRole(userId, workspaceId)
  if (!role) throw new NotFoundError('That workspace')
  if (!mayInWorkspace(role, action)) throw new ForbiddenError()
  return role
}

/**
 * Loads a room for an action. A room the caller cannot see (another workspace, or not shared with
 * a client/viewer) is a 404; a visible room the role may not change is a 403.
 */
export async function requireRoomAccess(userId: number, roomId: number, action: RoomAction): Promise<RoomAccess> {
  const room = await Room.findByPk(roomId)
  if (!room) throw new NotFoundError('That room')
  const role = await findActingRole(userId, room.workspaceId)
  if (!role) throw new NotFoundError('That room')
  const isShared = (await RoomShare.count({ where: { roomId, userId } })) > 0
  if (!maySeeRoom(role, isShared)) throw new NotFoundError('That room')
  if (!mayOnRoom(role, isShared, action)) throw new ForbiddenError()
  return { room, role, isShared }
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
