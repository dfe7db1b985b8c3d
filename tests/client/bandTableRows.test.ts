import { describe, expect, it } from 'vitest'
import { bandTableRows } from '@/components/bandTableRows'
import { bandResultFixture } from './bandResultFixture'

describe('bandTableRows', () => {
  it('returns display units and fixed decimals when all values are present', () => {
    const [row] = bandTableRows([bandResultFixture()])
    expect(row?.bandLabel).toBe('1k')
    expect(row?.cells.T20.text).toBe('0.47')
    expect(row?.cells.T30.text).toBe('0.50')
    expect(row?.cells.EDT.text).toBe('0.51')
    expect(row?.cells.C50.text).toBe('5.4')
    expect(row?.cells.C80.text).toBe('−1.0')
    // D50 0.7812 → 78 %; Ts 0.03249 s → 32 ms.
    expect(row?.cells.D50.text).toBe('78')
    expect(row?.cells.Ts.text).toBe('32')
    expect(row?.cells.decayRangeDb.text).toBe('56.7')
    expect(row?.cells.uncertaintyT20.text).toBe('0.02')
  })

  it('returns null text when a value is not computable', () => {
    const [row] = bandTableRows([bandResultFixture({ T30: null, uncertaintyT30: null })])
    expect(row?.cells.T30.text).toBeNull()
    expect(row?.cells.uncertaintyT30.text).toBeNull()
    expect(row?.cells.T20.text).toBe('0.47')
  })

  it('flags only the parameters a warning names, and every parameter when it names none', () => {
    const curvature = { code: 'curvature' as const, parameters: ['T20', 'T30'], message: 'curved' }
    const [named] = bandTableRows([bandResultFixture({ warnings: [curvature] })])
    expect(named?.cells.T20.isFlagged).toBe(true)
    expect(named?.cells.T30.isFlagged).toBe(true)
    expect(named?.cells.EDT.isFlagged).toBe(false)
    const [whole] = bandTableRows([bandResultFixture({ warnings: [{ code: 'low-snr', parameters: [], message: 'noisy' }] })])
    expect(whole?.cells.C80.isFlagged).toBe(true)
  })
})
