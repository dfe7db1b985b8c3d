import type { RouteLocationNormalized, RouteLocationRaw } from 'vue-router'
import { useAuthStore } from '@/stores/auth'

/** Only paths inside the app may be a redirect target (no "//elsewhere.example"). */
export function safeRedirect(value: unknown): string {
  return typeof value === 'string' && value.startsWith('/') && !value.startsWith('//') ? value : '/rooms'
}

/**
 * Signed-out visitors of member pages go to /sign-in and come back afterwards; signed-in users
 * skip the guest pages; pages for some roles send everyone else to the rooms list.
 */
export async function authGuard(to: RouteLocationNormalized): Promise<true | RouteLocationRaw> {
  const auth = useAuthStore()
  // When the server cannot be reached the visitor is treated as signed out; the sign-in
  // form then says what is wrong, and the next navigation asks again.
  await auth.ensureLoaded().catch(() => undefined)
  const access = to.meta.access ?? 'member'
  if (access === 'guest' && auth.isSignedIn) return safeRedirect(to.query.redirect)
  if (access === 'member' && !auth.isSignedIn) return { name: 'sign-in', query: { redirect: to.fullPath } }
  const roles = to.meta.roles
  if (roles && (!auth.currentRole || !roles.includes(auth.currentRole))) return { name: 'rooms' }
  return true
}
