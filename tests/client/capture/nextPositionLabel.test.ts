import { describe, expect, it } from 'vitest'
import { nextPositionLabel } from '@/capture/nextPositionLabel'

describe('nextPositionLabel', () => {
  it('returns the next number when the label ends in one', () => {
    expect(nextPositionLabel('Position 3')).toBe('Position 4')
    expect(nextPositionLabel('Mic 9')).toBe('Mic 10')
  })

  it('returns the label with " 2" when it has no trailing number', () => {
    expect(nextPositionLabel('Sofa')).toBe('Sofa 2')
    expect(nextPositionLabel('')).toBe('Position 2')
  })
})
