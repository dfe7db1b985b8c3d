import { createSosCascade, type SosCascade } from './sosCascade'

export interface ButterworthBandPassOptions {
  /** −3 dB edges of the pass band, Hz (0 < lower < upper < fs/2). */
  lowerEdgeHz: number
  upperEdgeHz: number
  sampleRateHz: number
  /** Order of the low-pass prototype; the band-pass has 2·order poles. Default 3 (6-pole). */
  prototypeOrder?: number
}

interface Complex {
  re: number
  im: number
}

/** Roots of s² − sum·s + product = 0 for complex sum and real product: s = sum/2 ± √((sum/2)² − product). */
function quadraticRoots(sum: Complex, product: number): [Complex, Complex] {
  const halfRe = sum.re / 2
  const halfIm = sum.im / 2
  const discRe = halfRe * halfRe - halfIm * halfIm - product
  const discIm = 2 * halfRe * halfIm
  const modulus = Math.hypot(discRe, discIm)
  const rootRe = Math.sqrt((modulus + discRe) / 2)
  const rootIm = Math.sign(discIm || 1) * Math.sqrt((modulus - discRe) / 2)
  return [
    { re: halfRe + rootRe, im: halfIm + rootIm },
    { re: halfRe - rootRe, im: halfIm - rootIm },
  ]
}

/** Bilinear map z = (2fs + s) / (2fs − s). */
function bilinear(pole: Complex, sampleRateHz: number): Complex {
  const k = 2 * sampleRateHz
  const denRe = k - pole.re
  const denIm = -pole.im
  const numRe = k + pole.re
  const numIm = pole.im
  const den = denRe * denRe + denIm * denIm
  return { re: (numRe * denRe + numIm * denIm) / den, im: (numIm * denRe - numRe * denIm) / den }
}

/**
 * Butterworth band-pass as cascaded biquads, designed pole by pole (never through a polynomial, which
 * loses precision for narrow low bands at high fs, e.g. 50 Hz third-octave at 192 kHz).
 *
 * 1. Pre-warp the edges: Ω = 2fs·tan(π f/fs), so the digital −3 dB points fall exactly on f1, f2.
 * 2. Low-pass prototype poles p_k = e^{jπ(2k+N−1)/(2N)}; LP→BP s² − p·B·s + ω0² = 0 per pole,
 *    ω0² = Ω1Ω2, B = Ω2 − Ω1; zeros: N at s = 0, N at s = ∞.
 * 3. Bilinear transform each pole; one conjugate pole pair per section, zeros z = ±1 give the
 *    numerator g·(1 − z⁻²); each section is scaled to unit gain at the centre ω_c = 2·atan(ω0/2fs),
 *    where the analog Butterworth band-pass has |H| = 1 exactly.
 *
 * @returns a cascade of `prototypeOrder` sections
 * @see Oppenheim & Schafer, Discrete-Time Signal Processing, 7.1 (bilinear, pre-warping);
 *   facts §3: 3rd-order Butterworth meets IEC 61260-1 class 1.
 */
export function designButterworthBandPass(options: ButterworthBandPassOptions): SosCascade {
  const { lowerEdgeHz, upperEdgeHz, sampleRateHz, prototypeOrder = 3 } = options
  const warp = (frequencyHz: number) => 2 * sampleRateHz * Math.tan((Math.PI * frequencyHz) / sampleRateHz)
  const lowerRad = warp(lowerEdgeHz)
  const upperRad = warp(upperEdgeHz)
  const centreSquared = lowerRad * upperRad
  const bandwidthRad = upperRad - lowerRad
  const centreDigital = 2 * Math.atan(Math.sqrt(centreSquared) / (2 * sampleRateHz))
  const analogPoles: Complex[] = []
  // Upper-half-plane prototype poles (and the real one for odd N); conjugates give the other half.
  for (let k = 1; k <= Math.ceil(prototypeOrder / 2); k++) {
    const angle = (Math.PI * (2 * k + prototypeOrder - 1)) / (2 * prototypeOrder)
    const prototype = { re: Math.cos(angle), im: Math.sin(angle) }
    const sum = { re: prototype.re * bandwidthRad, im: prototype.im * bandwidthRad }
    const [first, second] = quadraticRoots(sum, centreSquared)
    if (Math.abs(prototype.im) < 1e-12) analogPoles.push(first.im >= 0 ? first : second)
    else analogPoles.push(first, second)
  }
  const rows = analogPoles.map((pole) => {
    const z = bilinear(pole, sampleRateHz)
    const a1 = -2 * z.re
    const a2 = z.re * z.re + z.im * z.im
    return [1, 0, -1, a1, a2] as [number, number, number, number, number]
  })
  for (const row of rows) row.splice(0, 3, ...scaleToUnitGain(row, centreDigital))
  return createSosCascade(rows)
}

/** Numerator g·(1, 0, −1) with g so that |H_section(e^{jω_c})| = 1. */
function scaleToUnitGain(row: number[], omega: number): [number, number, number] {
  const a1 = row[3] as number
  const a2 = row[4] as number
  const numRe = 1 - Math.cos(2 * omega)
  const numIm = Math.sin(2 * omega)
  const denRe = 1 + a1 * Math.cos(omega) + a2 * Math.cos(2 * omega)
  const denIm = -(a1 * Math.sin(omega) + a2 * Math.sin(2 * omega))
  const gain = Math.sqrt((denRe * denRe + denIm * denIm) / (numRe * numRe + numIm * numIm))
  return [gain, 0, -gain]
}
