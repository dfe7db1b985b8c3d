export interface UncertaintyInputs {
  /** Measured reverberation time, s. */
  reverberationTimeS: number
  /** Band centre frequency, Hz. */
  centreHz: number
  bandsPerOctave: 1 | 3
  /** N: independent source–microphone positions. Default 1 (one capture). */
  positionCount?: number
  /** n: decays averaged per position; 10 for the integrated impulse response method (from memory — verify). */
  decaysPerPosition?: number
}

/** Bandwidth B that Annex A prescribes: 0.71·fc (octave) or 0.23·fc (third-octave), Hz. */
export function uncertaintyBandwidthHz(centreHz: number, bandsPerOctave: 1 | 3): number {
  return (bandsPerOctave === 1 ? 0.71 : 0.23) * centreHz
}

function sigma(factor: number, nTerm: number, inputs: UncertaintyInputs): number {
  const { reverberationTimeS: t, centreHz, bandsPerOctave, positionCount = 1, decaysPerPosition = 10 } = inputs
  const bandwidthHz = uncertaintyBandwidthHz(centreHz, bandsPerOctave)
  return factor * t * Math.sqrt((1 + nTerm / decaysPerPosition) / (positionCount * bandwidthHz * t))
}

/**
 * Standard uncertainty of T20: σ(T20) = 0.88·T20·√((1 + 1.90/n) / (N·B·T20)), s.
 * @see ISO 3382-2:2008 Annex A (via transcription of the equations)
 */
export function uncertaintyT20(inputs: UncertaintyInputs): number {
  return sigma(0.88, 1.9, inputs)
}

/**
 * Standard uncertainty of T30: σ(T30) = 0.55·T30·√((1 + 1.52/n) / (N·B·T30)), s.
 * @see ISO 3382-2:2008 Annex A (via transcription of the equations)
 */
export function uncertaintyT30(inputs: UncertaintyInputs): number {
  return sigma(0.55, 1.52, inputs)
}
