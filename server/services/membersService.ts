import { Membership, User } from '../models'
import { ConflictError, NotFoundError, ValidationError } from '../errors'
import { requireWorkspaceRole } from '../policy/roomAccess'
import type { AddMemberBody, MemberDto, UpdateMemberBody } from '../../shared/api/members'
import { limitMemberTokens, revokeMemberTokens } from './apiTokensService'

function toMemberDto(membership: Membership): MemberDto {
  const user = membership.user!
  return { userId: user.id, name: user.name, email: user.email, role: membership.role }
}

export async function listMembers(userId: number, workspaceId: number): Promise<MemberDto[]> {
  await requireWorkspaceRole(userId, workspaceId, 'members:read')
  const memberships = await Membership.findAll({
    where: { workspaceId },
    include: [{ model: User, as: 'user' }],
    order: [['id', 'ASC']],
  })
  return memberships.map(toMemberDto)
}

/** Adds an already registered user (invitations by e-mail arrive with the invitation flow). */
export async function addMember(userId: number, workspaceId: number, body: AddMemberBody): Promise<MemberDto> {
  await requireWorkspaceRole(userId, workspaceId, 'members:manage')
  const user = await User.findOne({ where: { email: body.email } })
  if (!user) throw new NotFoundError('A registered user with that e-mail', 'user-not-found')
  const existing = await Membership.findOne({ where: { workspaceId, userId: user.id } })
  if (existing) throw new ConflictError('already-member', 'That person is already a member of this workspace.')
  const membership = await Membership.create({ workspaceId, userId: user.id, role: body.role })
  membership.user = user
  return toMemberDto(membership)
}

async function findTarget(workspaceId: number, targetUserId: number): Promise<Membership> {
  const membership = await Membership.findOne({ where: { workspaceId, userId: targetUserId }, include: [{ model: User, as: 'user' }] })
  if (!membership) throw new NotFoundError('That member')
  return membership
}

/** A workspace always keeps at least one owner. */
async function assertNotLastOwner(workspaceId: number, membership: Membership): Promise<void> {
  if (membership.role !== 'owner') return
  const owners = await Membership.count({ where: { workspaceId, role: 'owner' } })
  if (owners <= 1) throw new ValidationError('A workspace needs at least one owner. Make someone else owner first.')
}

export async function updateMember(userId: number, workspaceId: number, targetUserId: number, body: UpdateMemberBody): Promise<MemberDto> {
  await requireWorkspaceRole(userId, workspaceId, 'members:manage')
  const membership = await findTarget(workspaceId, targetUserId)
  if (body.role !== 'owner') await assertNotLastOwner(workspaceId, membership)
  await membership.update({ role: body.role })
  await limitMemberTokens(workspaceId, targetUserId, body.role, userId)
  return toMemberDto(membership)
}

export async function removeMember(userId: number, workspaceId: number, targetUserId: number): Promise<void> {
  await requireWorkspaceRole(userId, workspaceId, 'members:manage')
  const membership = await findTarget(workspaceId, targetUserId)
  await assertNotLastOwner(workspaceId, membership)
  await membership.destroy()
  await revokeMemberTokens(workspaceId, targetUserId, userId)
}
