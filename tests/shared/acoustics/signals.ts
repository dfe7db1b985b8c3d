import { createSeededRandom } from '../../../shared/acoustics/synthetic/seededRandom'

/** Energy decay constant for reverberation time T: k = 6·ln10/T (facts §11). */
export const decayConstant = (reverberationTimeS: number) => (6 * Math.LN10) / reverberationTimeS

/** Amplitude envelope e^(−k·t/2) from t = 0 (its energy decays as e^(−kt)). */
export function exponentialEnvelope(reverberationTimeS: number, sampleRateHz: number, durationS: number): Float64Array {
  const k = decayConstant(reverberationTimeS)
  return new Float64Array(Math.round(durationS * sampleRateHz)).map((_, n) => Math.exp((-k * n) / sampleRateHz / 2))
}

/** A tone at frequencyHz under the exponential envelope (a clean decay inside one band). */
export function decayingTone(options: { reverberationTimeS: number; sampleRateHz: number; durationS: number; frequencyHz: number }): Float64Array {
  const { reverberationTimeS, sampleRateHz, durationS, frequencyHz } = options
  const envelope = exponentialEnvelope(reverberationTimeS, sampleRateHz, durationS)
  return envelope.map((value, n) => value * Math.cos((2 * Math.PI * frequencyHz * n) / sampleRateHz))
}

/** Seeded Gaussian noise carrier under the envelope, plus an optional stationary noise floor. */
export function noiseDecay(options: { reverberationTimeS: number; sampleRateHz: number; durationS: number; seed: number; floorDb?: number }): Float64Array {
  const random = createSeededRandom(options.seed)
  const floor = options.floorDb === undefined ? 0 : Math.pow(10, options.floorDb / 20)
  return exponentialEnvelope(options.reverberationTimeS, options.sampleRateHz, options.durationS).map((value) => value * random.gaussian() + floor * random.gaussian())
}

/** Adds seeded Gaussian noise of the given level (dB re unit power) to a copy of a signal. */
export function withNoiseFloor(signal: Float64Array, floorDb: number, seed: number): Float64Array {
  const random = createSeededRandom(seed)
  const amplitude = Math.pow(10, floorDb / 20)
  return signal.map((value) => value + amplitude * random.gaussian())
}

/** Closed forms for a pure exponential decay, onset at t = 0 (facts §11). */
export function closedForm(reverberationTimeS: number) {
  const k = decayConstant(reverberationTimeS)
  return {
    C50: 10 * Math.log10(Math.exp(0.05 * k) - 1),
    C80: 10 * Math.log10(Math.exp(0.08 * k) - 1),
    D50: 1 - Math.exp(-0.05 * k),
    Ts: 1 / k,
  }
}
