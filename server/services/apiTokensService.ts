import { Op } from 'sequelize'
import { Activity, ApiToken, Workspace } from '../models'
import { ConflictError, ForbiddenError, NotFoundError } from '../errors'
import { createApiTokenSecret } from '../auth/apiTokenSecret'
import { requireMembershipRole } from './membershipLookup'
import { recordActivity } from './activityService'
import { roleRank, type Role } from '../../shared/api/common'
import type { ApiTokenActivityDto, ApiTokenDto, ApiTokenStatus, CreateApiTokenBody, CreatedApiTokenDto } from '../../shared/api/apiTokens'

const DAY_MS = 24 * 3600 * 1000
/** Enough for every rig and script a person runs; a cap keeps a leaked session from minting thousands. */
const MAX_ACTIVE_TOKENS_PER_USER = 50

function statusOf(token: ApiToken, now: Date): ApiTokenStatus {
  if (token.revokedAt) return 'revoked'
  return token.expiresAt.getTime() <= now.getTime() ? 'expired' : 'active'
}

function toDto(token: ApiToken, now = new Date()): ApiTokenDto {
  return {
    id: token.id,
    name: token.name,
    workspaceId: token.workspaceId,
    workspaceName: token.workspace?.name ?? '',
    role: token.role,
    prefix: token.tokenPrefix,
    status: statusOf(token, now),
    createdAt: token.createdAt.toISOString(),
    expiresAt: token.expiresAt.toISOString(),
    lastUsedAt: token.lastUsedAt?.toISOString() ?? null,
    revokedAt: token.revokedAt?.toISOString() ?? null,
    revokedReason: token.revokedReason ?? null,
  }
}

/** Creates a token of the caller in one of their workspaces; the secret is returned this once only. */
export async function createApiToken(userId: number, body: CreateApiTokenBody): Promise<CreatedApiTokenDto> {
  const memberRole = await requireMembershipRole(userId, body.workspaceId)
  if (roleRank(body.role) > roleRank(memberRole)) {
    throw new ForbiddenError(`A token cannot have more rights than you: your role in this workspace is ${memberRole}.`, 'token-role-too-high')
  }
  const active = await ApiToken.count({ where: { userId, revokedAt: null, expiresAt: { [Op.gt]: new Date() } } })
  if (active >= MAX_ACTIVE_TOKENS_PER_USER) {
    throw new ConflictError('too-many-tokens', `You have ${active} active tokens, the most allowed. Revoke the ones you no longer use first.`)
  }
  const { secret, tokenHash, tokenPrefix } = createApiTokenSecret()
  const expiresAt = new Date(Date.now() + body.expiresInDays * DAY_MS)
  const token = await ApiToken.create({ userId, workspaceId: body.workspaceId, name: body.name, role: body.role, tokenHash, tokenPrefix, expiresAt })
  token.workspace = (await Workspace.findByPk(body.workspaceId)) ?? undefined
  await recordActivity({
    workspaceId: body.workspaceId, roomId: null, userId, apiTokenId: token.id, action: 'api-token.created',
    summary: `created the API token "${token.name}" (${token.role}, expires ${expiresAt.toISOString().slice(0, 10)})`,
  })
  return { token: toDto(token), secret }
}

/** The caller's tokens in every workspace, newest first (revoked and expired ones too, for the record). */
export async function listApiTokens(userId: number): Promise<ApiTokenDto[]> {
  const tokens = await ApiToken.findAll({ where: { userId }, include: [{ model: Workspace, as: 'workspace' }], order: [['createdAt', 'DESC'], ['id', 'DESC']] })
  const now = new Date()
  return tokens.map((token) => toDto(token, now))
}

async function findOwnToken(userId: number, tokenId: number): Promise<ApiToken> {
  const token = await ApiToken.findOne({ where: { id: tokenId, userId }, include: [{ model: Workspace, as: 'workspace' }] })
  if (!token) throw new NotFoundError('That API token')
  return token
}

/** Revokes one of the caller's tokens at once; revoking it again changes nothing. */
export async function revokeApiToken(userId: number, tokenId: number): Promise<ApiTokenDto> {
  const token = await findOwnToken(userId, tokenId)
  if (!token.revokedAt) {
    await token.update({ revokedAt: new Date(), revokedReason: 'revoked by its owner' })
    await recordActivity({ workspaceId: token.workspaceId, roomId: null, userId, apiTokenId: token.id, action: 'api-token.revoked', summary: `revoked the API token "${token.name}"` })
  }
  return toDto(token)
}

/** What was done with one of the caller's tokens, newest first (the last 200 lines). */
export async function listApiTokenActivity(userId: number, tokenId: number): Promise<ApiTokenActivityDto[]> {
  const token = await findOwnToken(userId, tokenId)
  const rows = await Activity.findAll({ where: { apiTokenId: token.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 })
  return rows.map((row) => ({ id: row.id, action: row.action, summary: row.summary, createdAt: row.createdAt.toISOString() }))
}

/** After a member's role changes: tokens above the new role are lowered to it (never raised). */
export async function limitMemberTokens(workspaceId: number, userId: number, role: Role, changedById: number): Promise<void> {
  const tokens = await ApiToken.findAll({ where: { workspaceId, userId, revokedAt: null } })
  for (const token of tokens.filter((t) => roleRank(t.role) > roleRank(role))) {
    const previous = token.role
    await token.update({ role })
    await recordActivity({ workspaceId, roomId: null, userId: changedById, apiTokenId: token.id, action: 'api-token.limited', summary: `lowered the API token "${token.name}" from ${previous} to ${role} with its owner's new role` })
  }
}

/** After a member leaves a workspace: their tokens for it stop working for good. */
export async function revokeMemberTokens(workspaceId: number, userId: number, removedById: number): Promise<void> {
  const tokens = await ApiToken.findAll({ where: { workspaceId, userId, revokedAt: null } })
  for (const token of tokens) {
    await token.update({ revokedAt: new Date(), revokedReason: 'its owner left the workspace' })
    await recordActivity({ workspaceId, roomId: null, userId: removedById, apiTokenId: token.id, action: 'api-token.revoked', summary: `revoked the API token "${token.name}": its owner left the workspace` })
  }
}
