import { OCTAVE_RATIO, type BandsPerOctave } from './fractionalOctaveBands'

export type FilterClass = 1 | 2

/** Allowed relative attenuation ΔA at one normalised frequency, dB (min ≤ ΔA ≤ max). */
export interface AttenuationLimits {
  minDb: number
  maxDb: number
}

const G = OCTAVE_RATIO
/** Octave-band pass-band breakpoints Ω = 1 … G^(1/2) and their maximum ΔA, IEC 61260-1:2014 Table 1. */
const PASS_OMEGA = [1, G ** (1 / 8), G ** (1 / 4), G ** (3 / 8), G ** (1 / 2)]
const PASS_MAX_DB: Record<FilterClass, number[]> = { 1: [0.4, 0.5, 0.7, 1.4, 5.3], 2: [0.6, 0.7, 0.9, 1.7, 5.8] }
const PASS_MIN_DB: Record<FilterClass, number> = { 1: -0.4, 2: -0.6 }
/** Stop-band breakpoints just outside the edge, G, G², G³, G⁴ and their minimum ΔA (Table 1). */
const STOP_OMEGA = [G ** (1 / 2), G, G ** 2, G ** 3, G ** 4]
const STOP_MIN_DB: Record<FilterClass, number[]> = { 1: [1.2, 16.6, 40.5, 60, 70], 2: [0.8, 15.6, 39.5, 54, 60] }

/** IEC 61260-1 Formula (9): octave breakpoint Ω_oct → breakpoint of a 1/b-octave filter. */
function toFractionalBreakpoint(omegaOctave: number, bandsPerOctave: BandsPerOctave): number {
  return 1 + ((G ** (1 / (2 * bandsPerOctave)) - 1) / (G ** 0.5 - 1)) * (omegaOctave - 1)
}

/** Linear interpolation in lg Ω between breakpoints (Formula 11); constant beyond the last. */
function interpolateInLogOmega(omega: number, breakpoints: number[], values: number[]): number {
  for (let i = 1; i < breakpoints.length; i++) {
    const upper = breakpoints[i] as number
    if (omega <= upper) {
      const lower = breakpoints[i - 1] as number
      const fraction = Math.log10(omega / lower) / Math.log10(upper / lower)
      return (values[i - 1] as number) + fraction * ((values[i] as number) - (values[i - 1] as number))
    }
  }
  return values[values.length - 1] as number
}

/**
 * IEC 61260-1:2014 acceptance limits on relative attenuation for a band filter at normalised
 * frequency Ω = f/f_m (lower side mirrored as 1/Ω). Pass band (Ω ≤ edge): min −0.4 dB (class 1),
 * max from Table 1; stop band: min from Table 1, no max. Fractional bands map the octave breakpoints
 * with Formula (9) and interpolate linearly in lg Ω (Formula 11).
 * @see IEC 61260-1:2014 5.10, Table 1, Formulas (9), (11) (via transcription, facts §3)
 */
export function iec61260AcceptanceLimits(
  relativeFrequency: number,
  options: { bandsPerOctave: BandsPerOctave; filterClass: FilterClass },
): AttenuationLimits {
  const { bandsPerOctave, filterClass } = options
  const omega = relativeFrequency >= 1 ? relativeFrequency : 1 / relativeFrequency
  const map = (points: number[]) => points.map((point) => toFractionalBreakpoint(point, bandsPerOctave))
  const passOmega = map(PASS_OMEGA)
  if (omega <= (passOmega[passOmega.length - 1] as number) * (1 + 1e-12)) {
    return { minDb: PASS_MIN_DB[filterClass], maxDb: interpolateInLogOmega(omega, passOmega, PASS_MAX_DB[filterClass]) }
  }
  return { minDb: interpolateInLogOmega(omega, map(STOP_OMEGA), STOP_MIN_DB[filterClass]), maxDb: Infinity }
}

/** Octave-table breakpoints Ω (both sides) mapped to 1/b-octave, for checking a filter. */
export function iec61260Breakpoints(bandsPerOctave: BandsPerOctave): number[] {
  const high = [...PASS_OMEGA, ...STOP_OMEGA.slice(1)].map((point) => toFractionalBreakpoint(point, bandsPerOctave))
  return [...high.map((omega) => 1 / omega).reverse(), ...high.slice(1)]
}
