/** The shape of the single-use tokens in invitation, reset and share links (server tokenParams). */
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{20,100}$/

export type LinkKind = 'invitation' | 'shared' | 'reset'

const PATH_KINDS: Record<string, LinkKind> = { invitations: 'invitation', shared: 'shared', 'reset-password': 'reset' }

export function isLinkToken(value: unknown): value is string {
  return typeof value === 'string' && TOKEN_PATTERN.test(value)
}

/**
 * Reads a Ringdown link ("https://host/invitations/<token>", a path, or with a query or a
 * trailing slash) into its kind, token and the in-app path; null for anything else.
 */
export function parseAppLink(link: string): { kind: LinkKind; token: string; path: string } | null {
  let pathname: string
  try {
    pathname = new URL(link, 'http://ringdown.invalid').pathname
  } catch {
    return null
  }
  const match = /^\/(invitations|shared|reset-password)\/([^/]+)\/?$/.exec(pathname)
  if (!match) return null
  const [, segment = '', token = ''] = match
  const kind = PATH_KINDS[segment]
  if (!kind || !isLinkToken(token)) return null
  return { kind, token, path: `/${segment}/${token}` }
}
