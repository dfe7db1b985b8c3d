import { describe, expect, it } from 'vitest'
import { formatFrequencyHz, formatFrequencyWithUnit, nearestFrequencyIndex, OCTAVE_TICKS_HZ } from '@/components/charts/frequencyTicks'

describe('formatFrequencyHz', () => {
  // Nominal octave mid-band labels as printed in IEC 61260-1:2014 Annex E (31.5 Hz … 16 kHz).
  it('returns the nominal octave labels for the octave ticks', () => {
    expect(OCTAVE_TICKS_HZ.map(formatFrequencyHz)).toEqual(['31.5', '63', '125', '250', '500', '1k', '2k', '4k', '8k', '16k'])
  })

  it('returns kilohertz with up to two decimals when the value is 1 kHz or more', () => {
    expect(formatFrequencyHz(1250)).toBe('1.25k')
    expect(formatFrequencyHz(12500)).toBe('12.5k')
    expect(formatFrequencyHz(20000)).toBe('20k')
  })

  it('returns one decimal below 100 Hz and none above', () => {
    expect(formatFrequencyHz(20.29)).toBe('20.3')
    expect(formatFrequencyHz(99.2)).toBe('99.2')
    expect(formatFrequencyHz(160.4)).toBe('160')
  })

  it('returns a dash when the value is not finite', () => {
    expect(formatFrequencyHz(Number.NaN)).toBe('—')
  })
})

describe('formatFrequencyWithUnit', () => {
  it('returns Hz below 1 kHz and kHz from 1 kHz', () => {
    expect(formatFrequencyWithUnit(31.5)).toBe('31.5 Hz')
    expect(formatFrequencyWithUnit(125)).toBe('125 Hz')
    expect(formatFrequencyWithUnit(1000)).toBe('1 kHz')
    expect(formatFrequencyWithUnit(2500)).toBe('2.5 kHz')
  })
})

describe('nearestFrequencyIndex', () => {
  it('returns the bin nearest in log frequency when the target lies between bins', () => {
    // |ln(50/40)| = 0.22 < |ln(30/40)| = 0.29, so 50 Hz is the nearer bin on a log axis.
    expect(nearestFrequencyIndex([20, 30, 50, 80], 40)).toBe(2)
  })

  it('returns −1 when there are no bins', () => {
    expect(nearestFrequencyIndex([], 40)).toBe(-1)
  })
})
