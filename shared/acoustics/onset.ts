export interface ImpulseOnset {
  /** First sample within `thresholdDb` of the peak (t = 0 for the ISO 3382 parameters). */
  onsetSample: number
  /** Sample of the largest |h|. */
  peakSample: number
}

/**
 * Impulse onset per ISO 3382-1:2009 Annex A: the point where the response first rises to within
 * 20 dB of its maximum, found as the first sample with 10·lg(h²/max h²) ≥ −20 dB, searched from the
 * start up to the peak (errs early, never late: a late onset cuts the direct sound out of C50/C80).
 * @param impulse broadband impulse response, non-empty
 * @param thresholdDb level re peak that marks the onset; default −20 dB
 */
export function findImpulseOnset(impulse: Float64Array, thresholdDb = -20): ImpulseOnset {
  let peakSample = 0
  let peakSquared = 0
  for (let i = 0; i < impulse.length; i++) {
    const squared = (impulse[i] as number) ** 2
    if (squared > peakSquared) {
      peakSquared = squared
      peakSample = i
    }
  }
  const thresholdSquared = peakSquared * Math.pow(10, thresholdDb / 10)
  let onsetSample = peakSample
  for (let i = 0; i <= peakSample; i++) {
    if ((impulse[i] as number) ** 2 >= thresholdSquared) {
      onsetSample = i
      break
    }
  }
  return { onsetSample, peakSample }
}
