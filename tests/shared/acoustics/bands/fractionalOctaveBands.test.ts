import { describe, expect, it } from 'vitest'
import { fractionalOctaveBands, OCTAVE_RATIO } from '../../../../shared/acoustics/bands/fractionalOctaveBands'
import { expectWithin } from '../../../helpers/tolerance'

// IEC 61260-1:2014 Eqs. (1)–(5) and Annex E nominal series; check values from acoustics-facts §3.
describe('fractionalOctaveBands', () => {
  it('uses the base-10 octave ratio G = 1.99526231 (IEC 61260-1 Eq. 1)', () => {
    expectWithin(OCTAVE_RATIO, 1.99526231, 1e-8)
  })

  it('returns the Annex E nominal third-octave series 25 Hz–20 kHz with exact base-10 centres', () => {
    const bands = fractionalOctaveBands({ bandsPerOctave: 3, minNominalHz: 25, maxNominalHz: 20000 })
    expect(bands.map((band) => band.nominalHz)).toEqual([
      25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000,
      6300, 8000, 10000, 12500, 16000, 20000,
    ])
    const exact = Object.fromEntries(bands.map((band) => [band.nominalHz, band.exactCentreHz]))
    const expected: Record<number, number> = { 25: 25.119, 31.5: 31.623, 63: 63.096, 125: 125.893, 250: 251.189, 500: 501.187, 2000: 1995.262, 4000: 3981.072, 8000: 7943.282, 16000: 15848.93, 20000: 19952.62 }
    for (const [nominal, value] of Object.entries(expected)) expectWithin(exact[Number(nominal)] as number, value, 1e-2)
    expectWithin(bands[0]?.exactCentreHz as number, 25.1189, 1e-3)
  })

  it('returns the 125 Hz third-octave edges 112.202 / 141.254 Hz and the 1 kHz octave edges 707.946 / 1412.538 Hz', () => {
    const third = fractionalOctaveBands({ bandsPerOctave: 3, minNominalHz: 125, maxNominalHz: 125 })[0]
    expectWithin(third?.lowerEdgeHz as number, 112.202, 1e-3)
    expectWithin(third?.upperEdgeHz as number, 141.254, 1e-3)
    const octave = fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 1000, maxNominalHz: 1000 })[0]
    expectWithin(octave?.lowerEdgeHz as number, 707.946, 1e-3)
    expectWithin(octave?.upperEdgeHz as number, 1412.538, 1e-3)
    const octave125 = fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 125, maxNominalHz: 125 })[0]
    expectWithin(octave125?.lowerEdgeHz as number, 89.125, 1e-3)
    expectWithin(octave125?.upperEdgeHz as number, 177.828, 1e-3)
  })

  it('returns octave 63 Hz–8 kHz and third-octave 50 Hz–10 kHz by default', () => {
    expect(fractionalOctaveBands({ bandsPerOctave: 1 }).map((band) => band.nominalHz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000])
    const thirds = fractionalOctaveBands({ bandsPerOctave: 3 })
    expect([thirds[0]?.nominalHz, thirds.at(-1)?.nominalHz, thirds.length]).toEqual([50, 10000, 24])
  })

  it('widens the top while the upper edge stays below 0.45·fs when the sample rate is given', () => {
    expect(fractionalOctaveBands({ bandsPerOctave: 3, sampleRateHz: 44100 }).at(-1)?.nominalHz).toBe(16000)
    expect(fractionalOctaveBands({ bandsPerOctave: 3, sampleRateHz: 96000 }).at(-1)?.nominalHz).toBe(20000)
    expect(fractionalOctaveBands({ bandsPerOctave: 1, sampleRateHz: 96000 }).at(-1)?.nominalHz).toBe(16000)
    expect(fractionalOctaveBands({ bandsPerOctave: 1, sampleRateHz: 22050 }).at(-1)?.nominalHz).toBe(4000)
    for (const fs of [22050, 44100, 48000, 96000, 192000]) {
      for (const band of fractionalOctaveBands({ bandsPerOctave: 3, sampleRateHz: fs })) expect(band.upperEdgeHz).toBeLessThan(0.45 * fs)
    }
  })
})
