import { describe, expect, it } from 'vitest'
import { isLinkToken, parseAppLink } from '@/utils/linkToken'

const TOKEN = 'a1B2c3D4e5F6g7H8i9J0_-kLmN'

describe('isLinkToken', () => {
  it('returns true for 20–100 URL-safe base64 characters', () => {
    expect(isLinkToken(TOKEN)).toBe(true)
    expect(isLinkToken('x'.repeat(100))).toBe(true)
  })

  it('returns false when the token is cut short, too long or has other characters', () => {
    expect(isLinkToken('x'.repeat(19))).toBe(false)
    expect(isLinkToken('x'.repeat(101))).toBe(false)
    expect(isLinkToken(`${TOKEN}=`)).toBe(false)
    expect(isLinkToken(undefined)).toBe(false)
  })
})

describe('parseAppLink', () => {
  it('returns the kind, token and in-app path of a full invitation URL', () => {
    expect(parseAppLink(`http://127.0.0.1:3000/invitations/${TOKEN}`)).toEqual({ kind: 'invitation', token: TOKEN, path: `/invitations/${TOKEN}` })
  })

  it('returns share and reset links from paths, with a trailing slash or a query', () => {
    expect(parseAppLink(`/shared/${TOKEN}/`)?.kind).toBe('shared')
    expect(parseAppLink(`https://ringdown.example/reset-password/${TOKEN}?from=mail`)).toEqual({ kind: 'reset', token: TOKEN, path: `/reset-password/${TOKEN}` })
  })

  it('returns null for other pages, PDF links and malformed tokens', () => {
    expect(parseAppLink('https://ringdown.example/rooms/3')).toBeNull()
    expect(parseAppLink(`https://ringdown.example/api/shared/${TOKEN}/report.pdf`)).toBeNull()
    expect(parseAppLink('https://ringdown.example/invitations/short')).toBeNull()
  })
})
