import type { MeResponse, RegisterBody, SignInBody } from '@shared/api'
import { forgetCsrfToken, request } from './http'

export function getMe(): Promise<MeResponse> {
  return request<MeResponse>('GET', '/auth/me')
}

// Sign-in, registration and sign-out regenerate the session, so the old CSRF token is dead.
export async function signIn(body: SignInBody): Promise<MeResponse> {
  const me = await request<MeResponse>('POST', '/auth/sign-in', body)
  forgetCsrfToken()
  return me
}

export async function register(body: RegisterBody): Promise<MeResponse> {
  const me = await request<MeResponse>('POST', '/auth/register', body)
  forgetCsrfToken()
  return me
}

export async function signOut(): Promise<void> {
  try {
    await request<void>('POST', '/auth/sign-out')
  } finally {
    forgetCsrfToken()
  }
}
