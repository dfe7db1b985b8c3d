import { AsyncLocalStorage } from 'node:async_hooks'
import { roleRank, type Role } from '../../shared/api/common'

/** What an API token allows: one user, one workspace, at most one role. */
export interface TokenScope {
  tokenId: number
  tokenName: string
  userId: number
  workspaceId: number
  role: Role
}

const scopeStorage = new AsyncLocalStorage<TokenScope | null>()

/**
 * Pins the scope of the request being served for everything the current code goes on to await
 * (services, policy, activity). `currentUserId(req)` calls this before every service call, so the
 * scope is set again after middleware such as multer that resumes in a stream's async context.
 */
export function pinActingScope(scope: TokenScope | null): void {
  scopeStorage.enterWith(scope)
}

/** The token scope of the request being served; null for browser sessions, workers and scripts. */
export function currentTokenScope(): TokenScope | null {
  return scopeStorage.getStore() ?? null
}

/**
 * The role a caller acts with in a workspace: their membership role, capped by the token's role,
 * or null when a token of another workspace is in use (the workspace is then hidden: 404).
 */
export function actingRole(userId: number, workspaceId: number, membershipRole: Role): Role | null {
  const scope = currentTokenScope()
  if (!scope || scope.userId !== userId) return membershipRole
  if (scope.workspaceId !== workspaceId) return null
  return roleRank(scope.role) < roleRank(membershipRole) ? scope.role : membershipRole
}
