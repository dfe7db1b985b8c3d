import { describe, expect, it } from 'vitest'
import { splitTextLinks } from '@/utils/splitTextLinks'

describe('splitTextLinks', () => {
  it('returns text and link parts in order when the mail holds a link', () => {
    const parts = splitTextLinks('Open http://127.0.0.1:3000/invitations/abc to join.\nThanks')

    expect(parts).toEqual([
      { kind: 'text', text: 'Open ' },
      { kind: 'link', text: 'http://127.0.0.1:3000/invitations/abc', href: 'http://127.0.0.1:3000/invitations/abc' },
      { kind: 'text', text: ' to join.\nThanks' },
    ])
  })

  it('returns the sentence’s full stop outside the link when a link ends a sentence', () => {
    const parts = splitTextLinks('Report: https://example.test/shared/xyz.')

    expect(parts[1]).toEqual({ kind: 'link', text: 'https://example.test/shared/xyz', href: 'https://example.test/shared/xyz' })
    expect(parts[2]).toEqual({ kind: 'text', text: '.' })
  })

  it('returns one text part when there is no link', () => {
    expect(splitTextLinks('No links here.')).toEqual([{ kind: 'text', text: 'No links here.' }])
    expect(splitTextLinks('')).toEqual([])
  })
})
