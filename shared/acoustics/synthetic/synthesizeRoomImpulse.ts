import { forwardRealFft } from '../fft/forwardRealFft'
import { inverseRealFft } from '../fft/inverseRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'
import { createRealSpectrum } from '../fft/realSpectrum'
import { bandSplitGains } from './bandSplitGains'
import { createSeededRandom } from './seededRandom'
import { validateSynthesisOptions } from './validateSynthesisOptions'

export interface BandDecay {
  /** Band centre, Hz (octave bands, ascending). */
  centreHz: number
  /** Reverberation time of the band: its energy falls 60 dB in this time, s. */
  T60S: number
  /** Level of the band's reverberant carrier re the others, dB. Default 0. */
  levelDb?: number
}

export interface SynthesizeRoomImpulseOptions {
  sampleRateHz: number
  durationS: number
  bandDecays: BandDecay[]
  /** Background noise power per sample re the peak², dB (e.g. −80); −Infinity for none. */
  noiseFloorDb: number
  /** Seed of the deterministic noise carrier and background noise. */
  seed: number
  /** Arrival of the direct sound (and start of the decay), ms. Default 0. */
  directDelayMs?: number
  /** Include a unit direct-sound impulse. Default true. */
  hasDirectSound?: boolean
  /** Discrete reflections: delay after the direct sound, ms; level re the direct sound, dB. */
  reflections?: { delayMs: number; gainDb: number }[]
  /** Power per sample of the reverberant tail at its start, re the direct sound², dB. Default −30. */
  reverberantLevelDb?: number
}

const DEFAULT_REVERBERANT_LEVEL_DB = -30
/** Energy decay constant: 60 dB in T60 → amplitude e^(−3·ln10·t/T60). */
const AMPLITUDE_DECAY_PER_T60 = 3 * Math.LN10

/**
 * A deterministic synthetic room impulse response: a seeded Gaussian noise carrier split into
 * bands by FFT (power-complementary gains, see bandSplitGains), each band multiplied by its own
 * exponential envelope e^(−3·ln10·(t − t_d)/T60) from the direct-sound time t_d, plus a direct
 * impulse and optional reflections (rounded to whole samples). Scaled so the peak |h| is 1, then
 * background noise of the given level is added.
 *
 * Exponentially decaying noise is the classic stochastic model of a diffuse decay
 * (Schroeder 1965; its Schroeder curve is the same exponential, acoustics-facts §11), so the
 * band's T20/T30/EDT should come out ≈ T60 when the analysis bands match these bands.
 * @returns durationS·fs samples
 * @throws DspInputError on invalid options
 */
export function synthesizeRoomImpulse(options: SynthesizeRoomImpulseOptions): Float64Array {
  validateSynthesisOptions(options)
  const { sampleRateHz, durationS, bandDecays, noiseFloorDb, seed } = options
  const { directDelayMs = 0, hasDirectSound = true, reflections = [] } = options
  const reverberantLevelDb = options.reverberantLevelDb ?? DEFAULT_REVERBERANT_LEVEL_DB
  const sampleCount = Math.round(durationS * sampleRateHz)
  const directSample = Math.round((directDelayMs * sampleRateHz) / 1000)
  const random = createSeededRandom(seed)
  const size = Math.max(4, nextPowerOfTwo(sampleCount))
  const carrier = new Float64Array(size)
  for (let i = 0; i < size; i++) carrier[i] = random.gaussian()
  const carrierSpectrum = forwardRealFft(carrier, { size })
  const bandSpectrum = createRealSpectrum(size)
  const bandSignal = new Float64Array(size)
  const response = new Float64Array(sampleCount)
  const binCount = bandSpectrum.re.length
  const gainTable = bandSplitGains(bandDecays.map((band) => band.centreHz), sampleRateHz / size, binCount)
  bandDecays.forEach((band, b) => {
    const gains = gainTable[b] as Float64Array
    for (let k = 0; k < binCount; k++) {
      const gain = gains[k] as number
      bandSpectrum.re[k] = gain * (carrierSpectrum.re[k] as number)
      bandSpectrum.im[k] = gain * (carrierSpectrum.im[k] as number)
    }
    inverseRealFft(bandSpectrum, { output: bandSignal })
    const amplitude = Math.pow(10, (reverberantLevelDb + (band.levelDb ?? 0)) / 20)
    const decayPerSample = Math.exp(-AMPLITUDE_DECAY_PER_T60 / (band.T60S * sampleRateHz))
    let envelope = amplitude
    for (let i = directSample; i < sampleCount; i++) {
      response[i] = (response[i] as number) + envelope * (bandSignal[i] as number)
      envelope *= decayPerSample
    }
  })
  if (hasDirectSound && directSample < sampleCount) response[directSample] = (response[directSample] as number) + 1
  for (const reflection of reflections) {
    const index = directSample + Math.round((reflection.delayMs * sampleRateHz) / 1000)
    if (index < sampleCount) response[index] = (response[index] as number) + Math.pow(10, reflection.gainDb / 20)
  }
  let peak = 0
  for (const value of response) peak = Math.max(peak, Math.abs(value))
  const noiseAmplitude = Number.isFinite(noiseFloorDb) ? Math.pow(10, noiseFloorDb / 20) : 0
  for (let i = 0; i < sampleCount; i++) {
    response[i] = (response[i] as number) / peak + noiseAmplitude * random.gaussian()
  }
  return response
}
