import { describe, expect, it } from 'vitest'
import { formatPosition } from '@/utils/formatPosition'

describe('formatPosition', () => {
  it('returns the coordinates in metres when x or y is known', () => {
    expect(formatPosition(1.75, 1.7, 1.2)).toBe('(1.75, 1.7, 1.2) m')
    expect(formatPosition(2, null, null)).toBe('(2, –, –) m')
  })

  it('returns the height alone when only z is known, and null when nothing is', () => {
    expect(formatPosition(null, null, 1.2)).toBe('height 1.2 m')
    expect(formatPosition(null, null, null)).toBeNull()
  })
})
