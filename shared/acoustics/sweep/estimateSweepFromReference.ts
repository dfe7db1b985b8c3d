import { hilbertTransform } from '../fft/hilbertTransform'
import { linearFit } from '../linearFit'

export interface ReferenceSweepEstimate {
  /** L from the fit ln f(t) = ln f1 + t/L, s; null when the reference is not an exponential sweep. */
  sweepRateS: number | null
  /** Frequencies at the first and last sample above 1 % of the peak envelope, Hz (null with the rate). */
  startHz: number | null
  endHz: number | null
  /** Index of the last sample above 1 % of the peak envelope (the end of the sweep). */
  endSample: number
}

/** Fit quality below which the reference is not taken for an exponential sweep. */
const MIN_FIT_R2 = 0.99

/**
 * Reads an exponential sweep's rate and range from its samples: the instantaneous frequency of the
 * analytic signal, f[n] = arg(a[n+1]·a*[n])·fs/(2π), is fitted as ln f = ln f1 + t/L by least
 * squares where the envelope is at least half its peak (inside the fades); exponential sweeps give
 * a straight line (Farina 2000: f(t) = f1·e^(t/L)). A poor fit (r² < 0.99) means some other
 * signal, and the rate is reported as null.
 */
export function estimateSweepFromReference(reference: Float64Array, sampleRateHz: number): ReferenceSweepEstimate {
  const quadrature = hilbertTransform(reference)
  const envelope = new Float64Array(reference.length)
  let peakEnvelope = 0
  for (let i = 0; i < reference.length; i++) {
    envelope[i] = Math.hypot(reference[i] as number, quadrature[i] as number)
    peakEnvelope = Math.max(peakEnvelope, envelope[i] as number)
  }
  const envelopeAt = (i: number): number => envelope[i] as number
  let first = 0
  while (first < reference.length - 1 && envelopeAt(first) < 0.01 * peakEnvelope) first++
  let last = reference.length - 1
  while (last > first && envelopeAt(last) < 0.01 * peakEnvelope) last--
  const times: number[] = []
  const logFrequencies: number[] = []
  for (let n = first; n < last; n++) {
    if (envelopeAt(n) < 0.5 * peakEnvelope) continue
    const x0 = reference[n] as number
    const q0 = quadrature[n] as number
    const x1 = reference[n + 1] as number
    const q1 = quadrature[n + 1] as number
    const frequencyHz = (Math.atan2(x0 * q1 - q0 * x1, x0 * x1 + q0 * q1) * sampleRateHz) / (2 * Math.PI)
    if (frequencyHz <= 0) continue
    times.push(n / sampleRateHz)
    logFrequencies.push(Math.log(frequencyHz))
  }
  const unknown = { sweepRateS: null, startHz: null, endHz: null, endSample: last }
  if (times.length < 64) return unknown
  const fit = linearFit(times, logFrequencies)
  if (!(fit.slope > 0 && fit.r2 >= MIN_FIT_R2)) return unknown
  return {
    sweepRateS: 1 / fit.slope,
    startHz: Math.exp(fit.intercept + (fit.slope * first) / sampleRateHz),
    endHz: Math.min(sampleRateHz / 2, Math.exp(fit.intercept + (fit.slope * last) / sampleRateHz)),
    endSample: last,
  }
}
