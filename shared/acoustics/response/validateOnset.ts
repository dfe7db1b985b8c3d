import { DspInputError } from '../errors'

/**
 * Checks that `onsetSample` is a whole sample index inside a signal of `sampleCount` samples.
 * @throws DspInputError 'bad-onset'
 */
export function validateOnset(onsetSample: number, sampleCount: number): void {
  if (!Number.isInteger(onsetSample) || onsetSample < 0 || onsetSample >= sampleCount) {
    throw new DspInputError(
      'bad-onset',
      `The onset must be a whole sample index from 0 to ${sampleCount - 1} (got ${onsetSample}).`,
    )
  }
}
