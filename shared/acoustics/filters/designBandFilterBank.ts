import type { Band, BandsPerOctave } from '../bands/fractionalOctaveBands'
import { designBandFilter } from './designBandFilter'
import { designHalfBandLowPass, symmetricFirMagnitudeAt } from './designHalfBandLowPass'
import type { SosCascade } from './sosCascade'
import { sosMagnitudeAt } from './sosFrequencyResponse'

/** One band of the bank: its Butterworth band-pass, run at fs / decimationFactor. */
export interface BankBand {
  band: Band
  filter: SosCascade
  prototypeOrder: number
  /** Power of two; the input is decimated by it (half-band stages) before the band filter. */
  decimationFactor: number
  /** Rate the band filter runs at, Hz. */
  sampleRateHz: number
}

export interface BandFilterBank {
  bands: BankBand[]
  /** Half-band taps h[0 … M] used by every decimation stage. */
  halfBandTaps: Float64Array
  /** Largest decimation factor in the bank. */
  maxDecimationFactor: number
}

/** A band is moved down an octave while its upper edge stays below 0.2·(new fs) … */
const MAX_EDGE_FRACTION = 0.2
/** … and the new rate stays at or above 3 kHz (50 ms is then ≥ 150 samples). */
const MIN_DECIMATED_RATE_HZ = 3000

/**
 * Multirate bank of IEC 61260-1 band filters. A band whose upper edge lies below 0.2·fs/2 is
 * filtered after zero-phase half-band decimation by two (repeatedly, down to ≥ 3 kHz): the low
 * bands then run at a few kHz, where biquads are well conditioned (no poles crowding z = 1, as a
 * 50 Hz band at 192 kHz would have) and a 10 s response costs a fraction of the work. The
 * half-band stages are flat within 0.0001 dB below 0.2·fs and reject ≥ 100 dB above 0.3·fs,
 * so each band's magnitude response is that of its Butterworth filter (see bandMagnitudeAt).
 */
export function designBandFilterBank(bands: Band[], bandsPerOctave: BandsPerOctave, sampleRateHz: number): BandFilterBank {
  const bankBands = bands.map((band) => {
    let decimationFactor = 1
    while (
      band.upperEdgeHz < (MAX_EDGE_FRACTION * sampleRateHz) / (2 * decimationFactor) &&
      sampleRateHz / (2 * decimationFactor) >= MIN_DECIMATED_RATE_HZ
    ) {
      decimationFactor *= 2
    }
    const rateHz = sampleRateHz / decimationFactor
    const { filter, prototypeOrder } = designBandFilter(band, bandsPerOctave, rateHz)
    return { band, filter, prototypeOrder, decimationFactor, sampleRateHz: rateHz }
  })
  return {
    bands: bankBands,
    halfBandTaps: designHalfBandLowPass(),
    maxDecimationFactor: Math.max(1, ...bankBands.map((entry) => entry.decimationFactor)),
  }
}

/** Frequency after sampling at `rateHz`, folded into [0, rate/2]. */
function foldFrequency(frequencyHz: number, rateHz: number): number {
  const wrapped = frequencyHz % rateHz
  return wrapped > rateHz / 2 ? rateHz - wrapped : wrapped
}

/**
 * Gain from an input sinusoid at `frequencyHz` (at the bank's full rate) to the band output:
 * product of the half-band stages at each stage's rate and the band filter at the (folded)
 * frequency it lands on after decimation. Linear magnitude.
 */
export function bandMagnitudeAt(bank: BandFilterBank, entry: BankBand, frequencyHz: number): number {
  let magnitude = 1
  let rateHz = entry.sampleRateHz * entry.decimationFactor
  let at = foldFrequency(frequencyHz, rateHz)
  for (let factor = 1; factor < entry.decimationFactor; factor *= 2) {
    magnitude *= symmetricFirMagnitudeAt(bank.halfBandTaps, at, rateHz)
    rateHz /= 2
    at = foldFrequency(at, rateHz)
  }
  return magnitude * sosMagnitudeAt(entry.filter, at, rateHz)
}
