import type { SmoothingFraction } from '@shared/types/analysis'
import { frequencyText, signedDbText, type ChartReading } from './chartReading'

interface Response {
  frequencyHz: readonly number[]
  magnitudeDb: readonly number[]
}

/** The reference is the 500 Hz – 2 kHz average; deviations are read over 100 Hz – 10 kHz. */
const REFERENCE_HZ: [number, number] = [500, 2000]
const READ_HZ: [number, number] = [100, 10_000]

function pointsWithin(response: Response, [lowHz, highHz]: [number, number]): { frequencyHz: number; levelDb: number }[] {
  return response.frequencyHz
    .map((frequencyHz, i) => ({ frequencyHz, levelDb: response.magnitudeDb[i] as number }))
    .filter((p) => p.frequencyHz >= lowHz && p.frequencyHz <= highHz && Number.isFinite(p.levelDb))
}

/**
 * Reads a magnitude response: how far it strays from its 500 Hz – 2 kHz average between 100 Hz
 * and 10 kHz, and where its largest peak and deepest dip are.
 */
export function readFrequencyResponse(response: Response, smoothing: SmoothingFraction): ChartReading {
  const reference = pointsWithin(response, REFERENCE_HZ)
  const read = pointsWithin(response, READ_HZ)
  if (reference.length === 0 || read.length === 0) {
    return ['This analysis has no usable response between 100 Hz and 10 kHz.', 'Check that the recording covers the whole sweep or impulse, then upload it again.']
  }
  const referenceDb = reference.reduce((sum, p) => sum + p.levelDb, 0) / reference.length
  let peak = read[0]!
  let dip = read[0]!
  for (const point of read) {
    if (point.levelDb > peak.levelDb) peak = point
    if (point.levelDb < dip.levelDb) dip = point
  }
  const spanDb = peak.levelDb - dip.levelDb
  return [
    `With 1/${smoothing}-octave smoothing the level between 100 Hz and 10 kHz spans ${spanDb.toFixed(1)} dB around its 500 Hz – 2 kHz average.`,
    `The largest peak is ${signedDbText(peak.levelDb - referenceDb)} at ${frequencyText(peak.frequencyHz)}; the deepest dip is ${signedDbText(dip.levelDb - referenceDb)} at ${frequencyText(dip.frequencyHz)}.`,
  ]
}
