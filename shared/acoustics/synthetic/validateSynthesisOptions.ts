import { DspInputError } from '../errors'
import type { SynthesizeRoomImpulseOptions } from './synthesizeRoomImpulse'

function fail(message: string): never {
  throw new DspInputError('bad-synthesis-options', message)
}

/**
 * Boundary checks for synthesizeRoomImpulse.
 * @throws DspInputError 'bad-synthesis-options' with a sentence naming the bad value
 */
export function validateSynthesisOptions(options: SynthesizeRoomImpulseOptions): void {
  const { sampleRateHz, durationS, bandDecays, noiseFloorDb, seed, directDelayMs = 0, reflections = [] } = options
  if (!(Number.isFinite(sampleRateHz) && sampleRateHz > 0)) fail(`The sample rate must be positive (got ${sampleRateHz}).`)
  if (!(Number.isFinite(durationS) && durationS * sampleRateHz >= 16)) fail(`The duration must be at least 16 samples (got ${durationS} s).`)
  if (bandDecays.length === 0) fail('Give at least one band decay.')
  let previousHz = 0
  for (const band of bandDecays) {
    if (!(band.centreHz > previousHz && band.centreHz < sampleRateHz / 2)) {
      fail(`Band centres must rise and stay below fs/2 (got ${band.centreHz} Hz).`)
    }
    if (!(Number.isFinite(band.T60S) && band.T60S > 0)) fail(`T60 must be positive (got ${band.T60S} s at ${band.centreHz} Hz).`)
    if (band.levelDb !== undefined && !Number.isFinite(band.levelDb)) fail(`Band level must be finite (got ${band.levelDb} dB).`)
    previousHz = band.centreHz
  }
  if (Number.isNaN(noiseFloorDb) || noiseFloorDb > 0 || noiseFloorDb === Infinity) fail(`The noise floor must be ≤ 0 dB re peak (got ${noiseFloorDb}).`)
  if (!Number.isFinite(seed)) fail(`The seed must be a finite number (got ${seed}).`)
  if (!(Number.isFinite(directDelayMs) && directDelayMs >= 0 && directDelayMs / 1000 < durationS)) {
    fail(`The direct delay must lie inside the response (got ${directDelayMs} ms).`)
  }
  for (const reflection of reflections) {
    if (!(reflection.delayMs >= 0 && Number.isFinite(reflection.gainDb))) {
      fail(`A reflection needs a delay ≥ 0 ms and a finite gain (got ${reflection.delayMs} ms, ${reflection.gainDb} dB).`)
    }
  }
  if (options.reverberantLevelDb !== undefined && !Number.isFinite(options.reverberantLevelDb)) {
    fail(`The reverberant level must be finite (got ${options.reverberantLevelDb} dB).`)
  }
}
