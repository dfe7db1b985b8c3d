import bcrypt from 'bcryptjs'
import type { Sequelize } from 'sequelize'
import { Membership, User, Workspace } from '../models'
import { ConflictError } from '../errors'
import type { MeResponse, RegisterBody, UserDto } from '../../shared/api/auth'
import { actingRole } from '../auth/actingScope'

/** bcrypt cost 12 ≈ 0.25 s per hash here: slow enough for stored passwords, fast enough to sign in. */
const BCRYPT_COST = process.env.NODE_ENV === 'test' ? 4 : 12

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST)
}

export function toUserDto(user: User): UserDto {
  return { id: user.id, name: user.name, email: user.email }
}

/** The signed-in user and their workspaces with roles (with an API token: its workspace and role only). */
export async function describeUser(userId: number): Promise<MeResponse | null> {
  const user = await User.findByPk(userId)
  if (!user) return null
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: 'workspace' }],
    order: [['id', 'ASC']],
  })
  return {
    user: toUserDto(user),
    memberships: memberships.flatMap((m) => {
      const role = actingRole(userId, m.workspaceId, m.role)
      return role ? [{ workspaceId: m.workspaceId, workspaceName: m.workspace?.name ?? '', role }] : []
    }),
  }
}

/** Returns the user when the e-mail and password match, else null (same answer for both misses). */
export async function verifyCredentials(email: string, password: string): Promise<User | null> {
  const user = await User.findOne({ where: { email: email.toLowerCase() } })
  if (!user) {
    await bcrypt.compare(password, '$2b$04$invalidinvalidinvalidinvuIh9L3rZ2Yf8sJm1rA5oTbTqGm2')
    return null
  }
  return (await bcrypt.compare(password, user.passwordHash)) ? user : null
}

/**
 * Creates a user and a workspace they own, in one transaction. With an invitation token the user
 * is created without a workspace of their own; the caller then accepts the invitation.
 */
export async function registerUser(sequelize: Sequelize, body: RegisterBody): Promise<User> {
  const existing = await User.findOne({ where: { email: body.email } })
  if (existing) throw new ConflictError('email-taken', 'An account with this e-mail already exists. Sign in instead.')
  const passwordHash = await hashPassword(body.password)
  return sequelize.transaction(async (transaction) => {
    const user = await User.create({ name: body.name, email: body.email, passwordHash }, { transaction })
    if (body.invitationToken) return user
    const workspace = await Workspace.create({ name: body.workspaceName }, { transaction })
    await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' }, { transaction })
    return user
  })
}
