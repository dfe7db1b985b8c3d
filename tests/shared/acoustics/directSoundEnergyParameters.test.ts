import { describe, expect, it } from 'vitest'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../../../shared/acoustics/analyseCapture'
import { createSeededRandom } from '../../../shared/acoustics/synthetic/seededRandom'

const K = 6 * Math.LN10

/**
 * Direct impulse + diffuse exponential tail: energy envelope E(t) = D·δ(t) + A·e^(−kt), k = K/T,
 * reverberant energy R = A/k, D = R·10^(DRR/10). Closed form (computed from ISO 3382-1 Eqs. (A.10),
 * (A.11)): early(te) = D + R(1 − e^(−k te)), late(te) = R e^(−k te);
 * C_te = 10·lg(early/late), D50 = early(0.05)/(D + R). White carrier, so every band has the same ratio.
 */
function closedForm(T: number, drrDb: number) {
  const k = K / T
  const direct = Math.pow(10, drrDb / 10)
  const early = (te: number) => direct + 1 - Math.exp(-k * te)
  const late = (te: number) => Math.exp(-k * te)
  return { C50: 10 * Math.log10(early(0.05) / late(0.05)), C80: 10 * Math.log10(early(0.08) / late(0.08)), D50: early(0.05) / (direct + 1) }
}

function directPlusDiffuse(T: number, drrDb: number, sampleRateHz: number, seed: number): Float64Array {
  const random = createSeededRandom(seed)
  const length = Math.round(2.5 * T * sampleRateHz)
  const onset = Math.round(0.1 * sampleRateHz)
  const k = K / T
  const impulse = new Float64Array(length)
  let reverberant = 0
  for (let n = onset + 1; n < length; n++) {
    impulse[n] = random.gaussian() * Math.exp((-k * (n - onset)) / sampleRateHz / 2)
    reverberant += (impulse[n] as number) ** 2
  }
  impulse[onset] = Math.sqrt(reverberant * Math.pow(10, drrDb / 10))
  return impulse
}

describe('energy parameters keep the direct sound in every band (time-reversed filtering)', () => {
  it('has the closed form C50 5.73 dB, C80 8.43 dB, D50 0.79 at T = 0.8 s, DRR 0 dB (computed)', () => {
    const expected = closedForm(0.8, 0)
    expect(expected.C50).toBeCloseTo(5.73, 2)
    expect(expected.C80).toBeCloseTo(8.43, 2)
    expect(expected.D50).toBeCloseTo(0.789, 3)
  })

  // Known defect (issue 10, item 1): the band integration starts at the onset, so the direct sound
  // that time-reversed filtering moves before it is lost (1 kHz C50 ≈ 1 dB instead of 5.73 dB).
  // These reproduce it; turn `it.fails` into `it` with the fix.
  it.fails('matches the closed form at 1 kHz at T = 0.8 s, DRR 0 dB', () => {
    const expected = closedForm(0.8, 0)
    const result = analyseCapture(directPlusDiffuse(0.8, 0, 48000, 7), { sampleRateHz: 48000, kind: 'impulse', settings: DEFAULT_ANALYSIS_SETTINGS })
    const band = result.bands.find((b) => b.centreHz === 1000)!
    // 1 dB / 0.05: the ISO 3382-1:2009 Table A.1 just-noticeable differences (via transcription).
    expect(band.C50!).toBeGreaterThan(expected.C50 - 1)
    expect(band.C50!).toBeLessThan(expected.C50 + 1)
    expect(Math.abs(band.C80! - expected.C80)).toBeLessThan(1)
    expect(Math.abs(band.D50! - expected.D50)).toBeLessThan(0.05)
  })

  for (const [T, drrDb, sampleRateHz] of [[0.8, 10, 48000], [0.3, 0, 44100], [0.8, -5, 44100]] as const) {
    it.fails(`is within 1 dB / 0.05 of the closed form in the 1–4 kHz octaves (T ${T} s, DRR ${drrDb} dB, ${sampleRateHz} Hz)`, () => {
      const expected = closedForm(T, drrDb)
      const result = analyseCapture(directPlusDiffuse(T, drrDb, sampleRateHz, 11), { sampleRateHz, kind: 'impulse', settings: DEFAULT_ANALYSIS_SETTINGS })
      for (const band of result.bands.filter((b) => b.centreHz >= 1000 && b.centreHz <= 4000)) {
        expect(Math.abs(band.C50! - expected.C50), `C50 ${band.centreHz} Hz`).toBeLessThan(1)
        expect(Math.abs(band.C80! - expected.C80), `C80 ${band.centreHz} Hz`).toBeLessThan(1)
        expect(Math.abs(band.D50! - expected.D50), `D50 ${band.centreHz} Hz`).toBeLessThan(0.05)
      }
    })
  }
})
