import { DspInputError } from '../errors'

/** What the check needs of a WAV: its rate and its length in sample frames. */
export interface SignalLength {
  sampleRateHz: number
  frameCount: number
}

/**
 * Checks, before any work, that a reference sweep fits the sweep recording it is to be
 * deconvolved from (ISO 18233:2006 Annex B: the response is the recording divided by the played
 * signal, bin by bin, which assumes both are sampled alike):
 * - the same sample rate: a reference at another rate is a sweep of other frequencies and gives
 *   meaningless decay times;
 * - a recording at least as long as the reference: it must hold the whole sweep (the decay
 *   follows it), as the sweep-parameter path requires too.
 * @throws DspInputError 'reference-rate-mismatch' | 'recording-shorter-than-reference'
 */
export function checkReferenceSweep(recording: SignalLength, reference: SignalLength): void {
  if (recording.sampleRateHz !== reference.sampleRateHz) {
    throw new DspInputError(
      'reference-rate-mismatch',
      `The reference sweep is at ${reference.sampleRateHz} Hz but the recording at ${recording.sampleRateHz} Hz; use the sweep file that was played, at the recording's sample rate.`,
    )
  }
  if (recording.frameCount < reference.frameCount) {
    const seconds = (frames: number) => (frames / recording.sampleRateHz).toFixed(2)
    throw new DspInputError(
      'recording-shorter-than-reference',
      `The recording (${seconds(recording.frameCount)} s) is shorter than the reference sweep (${seconds(reference.frameCount)} s); record the whole sweep and the decay after it.`,
    )
  }
}
