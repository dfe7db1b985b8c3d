import { describe, expect, it } from 'vitest'
import { classifyInputLevel, CLIPPING_PEAK_DBFS, TOO_QUIET_PEAK_DBFS } from '@/capture/classifyInputLevel'

describe('classifyInputLevel', () => {
  it('returns clipping when the peak is at or above −0.5 dBFS', () => {
    expect(CLIPPING_PEAK_DBFS).toBe(-0.5)
    expect(classifyInputLevel(0)).toBe('clipping')
    expect(classifyInputLevel(-0.5)).toBe('clipping')
  })

  it('returns good when the peak lies between −40 and −0.5 dBFS', () => {
    expect(classifyInputLevel(-0.51)).toBe('good')
    expect(classifyInputLevel(-12)).toBe('good')
    expect(classifyInputLevel(TOO_QUIET_PEAK_DBFS)).toBe('good')
  })

  it('returns too-quiet when the peak is below −40 dBFS, silent or not a number', () => {
    expect(classifyInputLevel(-40.01)).toBe('too-quiet')
    expect(classifyInputLevel(-Infinity)).toBe('too-quiet')
    expect(classifyInputLevel(Number.NaN)).toBe('too-quiet')
  })
})
