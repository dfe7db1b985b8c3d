import { Membership } from '../models'
import { NotFoundError } from '../errors'
import type { Role } from '../../shared/api/common'

/** The caller's role in a workspace; a workspace they do not belong to is a 404. */
export async function requireMembershipRole(userId: number, workspaceId: number): Promise<Role> {
  const membership = await Membership.findOne({ where: { userId, workspaceId } })
  if (!membership) throw new NotFoundError('That workspace')
  return membership.role
}
