import { describe, expect, it } from 'vitest'
import { bandWarningText, type BandWarningCode } from '@/components/bandWarningText'

const CODES: BandWarningCode[] = ['decay-range-t20', 'decay-range-t30', 'decay-range-edt', 'bandwidth-time-product', 'curvature', 'poor-fit', 'no-decay', 'clipping', 'dc-offset', 'low-snr']

describe('bandWarningText', () => {
  it('returns a label and an explanation when given any warning code', () => {
    for (const code of CODES) {
      const text = bandWarningText(code)
      expect(text.label.length, code).toBeGreaterThan(0)
      expect(text.explanation.length, code).toBeGreaterThan(40)
    }
  })

  // Decay ranges needed: EDT 25 dB, T20 35 dB, T30 45 dB (ISO 3382-1:2009 5.3.3, acoustics-facts §1.5).
  it('returns the ISO 3382-1 decay range when the code is a decay-range flag', () => {
    expect(bandWarningText('decay-range-edt').explanation).toContain('25 dB')
    expect(bandWarningText('decay-range-t20').explanation).toContain('35 dB')
    expect(bandWarningText('decay-range-t30').explanation).toContain('45 dB')
  })

  // Curvature limit of 10 % from ISO 3382-2:2008 Annex B.3.
  it('returns the 10 % curvature limit when the code is curvature', () => {
    expect(bandWarningText('curvature').explanation).toContain('10 %')
  })
})
