import type { BandResult } from '@shared/types/analysis'
import { bandName } from '@/components/charts/decayChartOption'
import { formatMeasure } from '@/utils/formatMeasure'
import { midBandMean } from './midBandMean'
import type { ChartReading } from './chartReading'

/** Differences under the just-noticeable 5 % of T read as "about the same" (ISO 3382-1:2009 Table A.1). */
const JND_FRACTION = 0.05

function reverberationOf(band: Pick<BandResult, 'T30' | 'T20'>): { name: 'T30' | 'T20'; valueS: number } | null {
  if (band.T30 !== null) return { name: 'T30', valueS: band.T30 }
  if (band.T20 !== null) return { name: 'T20', valueS: band.T20 }
  return null
}

/**
 * Reads the selected band's decay against the mid-band, e.g. "Mid-band T30 is 0.42 s; the 125 Hz
 * band rings 0.30 s longer than the mids." and its fit quality or flags.
 */
export function readDecay(bands: readonly BandResult[], centreHz: number | null): ChartReading {
  const band = bands.find((b) => b.centreHz === centreHz)
  const midT30 = midBandMean(bands, 'T30')
  const midT20 = midBandMean(bands, 'T20')
  const mid = midT30 !== null ? { name: 'T30', valueS: midT30 } : midT20 !== null ? { name: 'T20', valueS: midT20 } : null
  const midText = mid ? `Mid-band ${mid.name} is ${formatMeasure(mid.valueS, 2, 's')}` : 'Mid-band reverberation time could not be computed'
  if (!band) return [`${midText}.`, 'Pick a band above to read its decay.']
  const own = reverberationOf(band)
  let first: string
  if (!own) first = `${midText}; the ${bandName(band.centreHz)} has too little decay to measure.`
  else if (!mid || (band.centreHz >= 355 && band.centreHz <= 1413)) first = `${midText}; the ${bandName(band.centreHz)} has ${own.name} ${formatMeasure(own.valueS, 2, 's')}.`
  else {
    const differenceS = own.valueS - mid.valueS
    const how = Math.abs(differenceS) < JND_FRACTION * mid.valueS
      ? 'decays about as fast as the mids'
      : `rings ${formatMeasure(Math.abs(differenceS), 2, 's')} ${differenceS > 0 ? 'longer' : 'shorter'} than the mids`
    first = `${midText}; the ${bandName(band.centreHz)} ${how} (${own.name} ${formatMeasure(own.valueS, 2, 's')}).`
  }
  const range = band.decayRangeDb === null ? '' : `${formatMeasure(band.decayRangeDb, 0, 'dB')} of usable decay`
  const edt = band.EDT === null ? '' : `EDT ${formatMeasure(band.EDT, 2, 's')}`
  const facts = [range, edt].filter(Boolean).join(', ')
  const flags = band.warnings.length === 0 ? 'no validity flags' : `${band.warnings.length} validity ${band.warnings.length === 1 ? 'flag' : 'flags'}: ${band.warnings[0]!.message}`
  return [first, `${facts ? `${facts[0]!.toUpperCase()}${facts.slice(1)}; ` : ''}${flags}${flags.endsWith('.') ? '' : '.'}`]
}
