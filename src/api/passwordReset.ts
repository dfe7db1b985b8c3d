import { request } from './http'

/** Always 202, whether or not an account uses the address (no account probing). */
export function requestPasswordReset(email: string): Promise<unknown> {
  return request<unknown>('POST', '/auth/password-reset', { email })
}

/** 204 on success; 410 'reset-used' / 'reset-expired'. */
export function resetPassword(token: string, password: string): Promise<void> {
  return request<void>('POST', `/auth/password-reset/${encodeURIComponent(token)}`, { password })
}
