import type { Role } from '../../shared/api/common'

/**
 * The one place that answers "may this role do this". Rules (DESIGN.md):
 * owner — everything in the workspace, and only owners manage members;
 * engineer — create and edit rooms, surveys and captures, share rooms;
 * client — only rooms shared with them; may add captures there; deletes nothing of others';
 * viewer — read-only on rooms shared with them.
 */
export type WorkspaceAction = 'room:create' | 'room:list-all' | 'members:read' | 'members:manage' | 'targets:manage' | 'profile:read' | 'profile:manage'
export type RoomAction =
  | 'room:read'
  | 'room:update'
  | 'room:delete'
  | 'room:share'
  | 'survey:create'
  | 'survey:update'
  | 'survey:delete'
  | 'capture:create'
  | 'capture:delete-any'
  /** Start analyses, re-pin the analysis that counts, include or exclude a capture from the average. */
  | 'capture:judge'

const WORKSPACE_RULES: Record<WorkspaceAction, readonly Role[]> = {
  'room:create': ['owner', 'engineer'],
  'room:list-all': ['owner', 'engineer'],
  'members:read': ['owner', 'engineer'],
  'members:manage': ['owner'],
  'targets:manage': ['owner', 'engineer'],
  'profile:read': ['owner', 'engineer'],
  'profile:manage': ['owner'],
}

const ROOM_RULES: Record<RoomAction, readonly Role[]> = {
  'room:read': ['owner', 'engineer', 'client', 'viewer'],
  'room:update': ['owner', 'engineer'],
  'room:delete': ['owner', 'engineer'],
  'room:share': ['owner', 'engineer'],
  'survey:create': ['owner', 'engineer'],
  'survey:update': ['owner', 'engineer'],
  'survey:delete': ['owner', 'engineer'],
  'capture:create': ['owner', 'engineer', 'client'],
  'capture:delete-any': ['owner', 'engineer'],
  'capture:judge': ['owner', 'engineer'],
}

export function mayInWorkspace(role: Role, action: WorkspaceAction): boolean {
  return WORKSPACE_RULES[action].includes(role)
}

/** Whether a member with `role` can see a room at all: clients and viewers only shared ones. */
export function maySeeRoom(role: Role, isSharedWithUser: boolean): boolean {
  return role === 'owner' || role === 'engineer' || isSharedWithUser
}

export function mayOnRoom(role: Role, isSharedWithUser: boolean, action: RoomAction): boolean {
  return maySeeRoom(role, isSharedWithUser) && ROOM_RULES[action].includes(role)
}
