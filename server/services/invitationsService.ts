import { Op } from 'sequelize'
import { Invitation, Membership, Room, RoomShare, User, Workspace } from '../models'
import { ForbiddenError, HttpError, NotFoundError, ValidationError } from '../errors'
import { requireWorkspaceRole } from '../policy/roomAccess'
import { createSingleUseToken, hashToken } from '../auth/singleUseToken'
import { invitationMail } from '../mail/messages'
import type { Mailer } from '../mail/mailer'
import { recordActivity } from './activityService'
import type { AcceptedInvitationDto, CreateInvitationBody, InvitationDto, InvitationPreviewDto } from '../../shared/api/invitations'

const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000

export interface MailContext {
  mailer: Mailer
  publicUrl: string
}

function toDto(invitation: Invitation): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    roomId: invitation.roomId,
    expiresAt: invitation.expiresAt.toISOString(),
    acceptedAt: invitation.acceptedAt?.toISOString() ?? null,
    createdAt: invitation.createdAt.toISOString(),
  }
}

/** Owners invite with any role; engineers invite clients and viewers only. */
export async function createInvitation(userId: number, workspaceId: number, body: CreateInvitationBody, context: MailContext): Promise<InvitationDto> {
  const role = await requireWorkspaceRole(userId, workspaceId, 'room:create')
  if (role !== 'owner' && (body.role === 'owner' || body.role === 'engineer')) {
    throw new ForbiddenError('Only owners invite owners and engineers.')
  }
  const room = body.roomId === null ? null : await Room.findOne({ where: { id: body.roomId, workspaceId } })
  if (body.roomId !== null && !room) throw new ValidationError('That room is not in this workspace.', { roomId: 'That room is not in this workspace.' })
  const { token, tokenHash } = createSingleUseToken()
  const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS)
  const invitation = await Invitation.create({ workspaceId, roomId: room?.id ?? null, email: body.email, role: body.role, tokenHash, expiresAt, acceptedAt: null, invitedById: userId })
  const [inviter, workspace] = await Promise.all([User.findByPk(userId), Workspace.findByPk(workspaceId)])
  try {
    await context.mailer.send(
      invitationMail({ to: body.email, inviterName: inviter!.name, workspaceName: workspace!.name, roomName: room?.name ?? null, role: body.role, link: `${context.publicUrl}/invitations/${token}`, expiresAt }),
    )
  } catch (error) {
    await invitation.destroy()
    throw new HttpError(502, 'mail-failed', `The invitation e-mail could not be sent (${(error as Error).message}). Check the mail settings and try again.`)
  }
  await recordActivity({ workspaceId, roomId: room?.id ?? null, userId, action: 'invitation.sent', summary: `invited ${body.email} as ${body.role}${room ? ` to ${room.name}` : ''}` })
  return toDto(invitation)
}

export async function listInvitations(userId: number, workspaceId: number): Promise<InvitationDto[]> {
  await requireWorkspaceRole(userId, workspaceId, 'members:read')
  const invitations = await Invitation.findAll({ where: { workspaceId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, order: [['createdAt', 'DESC']] })
  return invitations.map(toDto)
}

/** The invitation behind a token, refusing unknown (404), used or expired (410) ones. */
async function usableInvitation(token: string): Promise<Invitation> {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token) } })
  if (!invitation) throw new NotFoundError('That invitation')
  if (invitation.acceptedAt) throw new HttpError(410, 'invitation-used', 'This invitation has been used already. Sign in, or ask for a new invitation.')
  if (invitation.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'invitation-expired', 'This invitation has expired. Ask the sender for a new one.')
  return invitation
}

export async function previewInvitation(token: string): Promise<InvitationPreviewDto> {
  const invitation = await usableInvitation(token)
  const [workspace, room] = await Promise.all([Workspace.findByPk(invitation.workspaceId), invitation.roomId ? Room.findByPk(invitation.roomId) : null])
  return { workspaceName: workspace!.name, roomName: room?.name ?? null, role: invitation.role, email: invitation.email, expiresAt: invitation.expiresAt.toISOString() }
}

/**
 * Accepts an invitation for the signed-in user, once: adds the membership (an existing one keeps
 * its role) and, for a room invitation, shares the room. The e-mail must match the invitation's.
 */
export async function acceptInvitation(userId: number, token: string): Promise<AcceptedInvitationDto> {
  const invitation = await usableInvitation(token)
  const user = (await User.findByPk(userId))!
  if (user.email !== invitation.email) {
    throw new ForbiddenError(`This invitation is for ${invitation.email}. Sign in with that address.`, 'invitation-other-email')
  }
  const [claimed] = await Invitation.update({ acceptedAt: new Date() }, { where: { id: invitation.id, acceptedAt: null } })
  if (claimed === 0) throw new HttpError(410, 'invitation-used', 'This invitation has been used already.')
  await Membership.findOrCreate({ where: { workspaceId: invitation.workspaceId, userId }, defaults: { workspaceId: invitation.workspaceId, userId, role: invitation.role } })
  if (invitation.roomId) await RoomShare.findOrCreate({ where: { roomId: invitation.roomId, userId } })
  await recordActivity({ workspaceId: invitation.workspaceId, roomId: invitation.roomId, userId, action: 'invitation.accepted', summary: `${user.email} joined as ${invitation.role}` })
  return { workspaceId: invitation.workspaceId, roomId: invitation.roomId }
}
