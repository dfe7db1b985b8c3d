import { DspInputError } from './errors'

export interface ValidateSignalOptions {
  sampleRateHz: number
  /** Minimum length the caller's analysis needs, s. */
  minDurationS?: number
  /** Name used in messages, e.g. 'impulse response'. */
  label?: string
}

/**
 * Boundary check for a public DSP entry: a positive finite sample rate, a non-empty, finite,
 * not all-zero signal, long enough for the analysis. Helpers behind the entry trust their input.
 * @throws DspInputError with code 'bad-sample-rate' | 'no-samples' | 'non-finite' | 'all-zero' | 'too-short'
 */
export function validateSignal(samples: Float64Array, options: ValidateSignalOptions): void {
  const { sampleRateHz, minDurationS = 0, label = 'signal' } = options
  if (!Number.isFinite(sampleRateHz) || sampleRateHz <= 0) {
    throw new DspInputError('bad-sample-rate', `The sample rate must be a positive number of hertz (got ${sampleRateHz}).`)
  }
  if (samples.length === 0) throw new DspInputError('no-samples', `The ${label} has no samples.`)
  let isAllZero = true
  for (let i = 0; i < samples.length; i++) {
    const value = samples[i] as number
    if (!Number.isFinite(value)) {
      throw new DspInputError('non-finite', `The ${label} contains a non-finite sample (NaN or infinity) at index ${i}.`)
    }
    if (value !== 0) isAllZero = false
  }
  if (isAllZero) throw new DspInputError('all-zero', `The ${label} is silent (every sample is zero).`)
  const durationS = samples.length / sampleRateHz
  if (durationS < minDurationS) {
    throw new DspInputError(
      'too-short',
      `The ${label} lasts ${durationS.toFixed(3)} s; this analysis needs at least ${minDurationS} s.`,
    )
  }
}
