import type { SosCascade } from './sosCascade'

/**
 * Magnitude of a biquad cascade at one frequency: |H(e^{jω})| = Π |B_i(e^{jω})| / |A_i(e^{jω})|,
 * ω = 2π·f/fs, evaluated directly from the coefficients (no FFT, any frequency).
 * @returns linear magnitude (1 = 0 dB)
 */
export function sosMagnitudeAt(filter: SosCascade, frequencyHz: number, sampleRateHz: number): number {
  const omega = (2 * Math.PI * frequencyHz) / sampleRateHz
  const cos1 = Math.cos(omega)
  const sin1 = Math.sin(omega)
  const cos2 = Math.cos(2 * omega)
  const sin2 = Math.sin(2 * omega)
  const c = filter.coefficients
  let magnitude = 1
  for (let s = 0; s < filter.sectionCount; s++) {
    const o = s * 5
    const b0 = c[o] as number
    const b1 = c[o + 1] as number
    const b2 = c[o + 2] as number
    const a1 = c[o + 3] as number
    const a2 = c[o + 4] as number
    // e^{−jω} = cos ω − j sin ω
    const numRe = b0 + b1 * cos1 + b2 * cos2
    const numIm = -(b1 * sin1 + b2 * sin2)
    const denRe = 1 + a1 * cos1 + a2 * cos2
    const denIm = -(a1 * sin1 + a2 * sin2)
    magnitude *= Math.sqrt((numRe * numRe + numIm * numIm) / (denRe * denRe + denIm * denIm))
  }
  return magnitude
}

/** {@link sosMagnitudeAt} in decibels: 20·lg|H|. */
export function sosMagnitudeDbAt(filter: SosCascade, frequencyHz: number, sampleRateHz: number): number {
  return 20 * Math.log10(sosMagnitudeAt(filter, frequencyHz, sampleRateHz))
}
