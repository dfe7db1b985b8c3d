import { describe, expect, it } from 'vitest'
import type { WaterfallData } from '@shared/types/analysis'
import { longestRinging, readBass } from '@/readings/readBass'
import { readDecay } from '@/readings/readDecay'
import { readEarlyArrivals } from '@/readings/readEarlyArrivals'
import { readFrequencyResponse } from '@/readings/readFrequencyResponse'
import { midBandMean } from '@/readings/midBandMean'
import { bandResultFixture } from './bandResultFixture'
import { expectWithin } from '../helpers/tolerance'

// Invented band values chosen so the expected sentences can be worked out by hand.
const bands = [
  bandResultFixture({ centreHz: 63, T30: 0.8, T20: 0.75 }),
  bandResultFixture({ centreHz: 125, T30: 0.72, T20: 0.7, EDT: 0.69, decayRangeDb: 52.4 }),
  bandResultFixture({ centreHz: 250, T30: 0.43 }),
  bandResultFixture({ centreHz: 500, T30: 0.44, C80: 2, C50: 0 }),
  bandResultFixture({ centreHz: 1000, T30: 0.4, C80: 4, C50: 1 }),
  bandResultFixture({ centreHz: 2000, T30: 0.3 }),
]

describe('midBandMean', () => {
  // Mid-band = mean of the 500 Hz and 1 kHz octaves (ISO 3382-1:2009 Annex A, from memory — verify).
  it('returns the mean of the 500 Hz and 1 kHz octave bands', () => {
    expectWithin(midBandMean(bands, 'T30') as number, 0.42, 1e-12)
  })

  it('returns the mean of the six third-octave bands 400 Hz – 1.25 kHz for a third-octave analysis', () => {
    const thirds = [315, 400, 500, 630, 800, 1000, 1250, 1600].map((centreHz, i) => bandResultFixture({ centreHz, T30: i / 10 }))
    expectWithin(midBandMean(thirds, 'T30') as number, (0.1 + 0.2 + 0.3 + 0.4 + 0.5 + 0.6) / 6, 1e-12)
  })

  it('returns null when no mid band has a value', () => {
    expect(midBandMean([bandResultFixture({ centreHz: 500, T30: null })], 'T30')).toBeNull()
  })
})

describe('readDecay', () => {
  it('returns how much longer a low band rings than the mids', () => {
    const [first] = readDecay(bands, 125)
    expect(first).toBe('Mid-band T30 is 0.42 s; the 125 Hz band rings 0.30 s longer than the mids (T30 0.72 s).')
  })

  it('returns "about as fast" when the difference is under the 5 % just-noticeable difference', () => {
    // ISO 3382-1:2009 Table A.1: JND of T is 5 % (via acoustics-facts §1.4). 0.43 vs 0.42 s is 2.4 %.
    const [first] = readDecay(bands, 250)
    expect(first).toContain('the 250 Hz band decays about as fast as the mids')
  })

  it('returns the decay range, EDT and "no validity flags" on the second line for a clean band', () => {
    const [, second] = readDecay(bands, 125)
    expect(second).toBe('52 dB of usable decay, EDT 0.69 s; no validity flags.')
  })

  it('names the first validity flag when the band has one', () => {
    const flagged = [bandResultFixture({ centreHz: 63, T30: 0.9, warnings: [{ code: 'decay-range-t30', parameters: ['T30'], message: 'Less than 45 dB of decay for T30' }] })]
    const [, second] = readDecay(flagged, 63)
    expect(second).toContain('1 validity flag: Less than 45 dB of decay for T30.')
  })

  it('falls back to T20 when a band has no T30', () => {
    const [first] = readDecay([...bands.slice(3, 5), bandResultFixture({ centreHz: 4000, T30: null, T20: 0.2 })], 4000)
    expect(first).toBe('Mid-band T30 is 0.42 s; the 4 kHz band rings 0.22 s shorter than the mids (T20 0.20 s).')
  })
})

describe('readFrequencyResponse', () => {
  it('returns the span between 100 Hz and 10 kHz and the peak and dip relative to the 500 Hz – 2 kHz average', () => {
    const response = {
      frequencyHz: [50, 100, 200, 500, 1000, 2000, 5000, 10_000, 15_000],
      magnitudeDb: [20, 6, 0, 0, 0, 0, -9, 0, 30],
    }

    const [first, second] = readFrequencyResponse(response, 6)

    expect(first).toBe('With 1/6-octave smoothing the level between 100 Hz and 10 kHz spans 15.0 dB around its 500 Hz – 2 kHz average.')
    expect(second).toBe('The largest peak is +6.0 dB at 100 Hz; the deepest dip is −9.0 dB at 5 kHz.')
  })

  it('says what to do when the response has no points in range', () => {
    const [first] = readFrequencyResponse({ frequencyHz: [20], magnitudeDb: [0] }, 3)
    expect(first).toContain('no usable response')
  })
})

describe('readEarlyArrivals', () => {
  it('returns the strongest early reflection after the direct sound and the mid-band clarity', () => {
    const curve = { timeMs: [-1, 0, 1, 2, 3, 4, 5, 6, 90], levelDb: [-40, 0, -10, -12, -20, -6, -15, -25, -1] }

    const [first, second] = readEarlyArrivals(curve, bands)

    expect(first).toBe('The strongest early reflection arrives 4.0 ms after the direct sound, −6.0 dB relative to it.')
    // C80 mid = (2 + 4) / 2 = 3 dB, C50 mid = (0 + 1) / 2 = 0.5 dB; C80 > 0 means early > late energy (ISO 3382-1 Eq. A.10).
    expect(second).toBe('Mid-band C80 is 3.0 dB and C50 0.5 dB: more sound energy arrives in the first 80 ms than after it.')
  })

  it('returns "no distinct reflection" when the curve only falls after the direct sound', () => {
    const curve = { timeMs: [0, 2, 4, 6], levelDb: [0, -5, -10, -15] }
    expect(readEarlyArrivals(curve, bands)[0]).toBe('No distinct reflection stands out in the first 80 ms.')
  })
})

describe('readBass', () => {
  // Invented waterfall: 40 Hz falls 20 dB by 40 ms, 60 Hz by 20 ms, 80 Hz starts 30 dB down (a null).
  const waterfall: WaterfallData = {
    frequencyHz: [40, 60, 80],
    timeMs: [0, 20, 40, 60],
    levelDb: [
      [0, -3, -30],
      [-10, -25, -40],
      [-22, -30, -50],
      [-30, -35, -60],
    ],
  }

  it('returns the frequency that takes longest to fall 20 dB, ignoring nulls', () => {
    expect(longestRinging(waterfall)).toEqual({ frequencyHz: 40, fallMs: 40 })
  })

  it('names a room mode within 6 % of the ringing frequency and the low bands against the mid-band', () => {
    const [first, second] = readBass(waterfall, bands, [{ frequencyHz: 41, label: '1,0,0 · 41 Hz' }, { frequencyHz: 70, label: '0,1,0 · 70 Hz' }])

    expect(first).toBe('The longest ringing is near 40 Hz, close to the room mode 1,0,0 · 41 Hz: it takes about 40 ms to fall 20 dB.')
    expect(second).toBe('T30 is 0.80 s at 63 Hz and 0.72 s at 125 Hz, against 0.42 s at mid-band.')
  })

  it('says the ringing outlasts the view when a frequency never falls 20 dB', () => {
    const still: WaterfallData = { frequencyHz: [50], timeMs: [0, 200, 400], levelDb: [[0], [-5], [-10]] }
    expect(readBass(still, bands)[0]).toBe('The longest ringing is near 50 Hz: it is still within 20 dB of its start after 400 ms.')
  })

  it('says the capture is too short when there is no waterfall', () => {
    expect(readBass(null, bands)[0]).toBe('This capture is too short for a low-frequency waterfall.')
  })
})

describe('longestRinging', () => {
  it('returns the frequency that falls least when several never fall 20 dB in the view', () => {
    const data: WaterfallData = { frequencyHz: [40, 50, 60], timeMs: [0, 200], levelDb: [[0, 0, 0], [-12, -4, -8]] }
    expect(longestRinging(data)).toEqual({ frequencyHz: 50, fallMs: null })
  })
})
