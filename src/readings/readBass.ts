import type { BandResult, WaterfallData } from '@shared/types/analysis'
import { formatFrequencyWithUnit } from '@/components/charts/frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'
import { midBandMean } from './midBandMean'
import { frequencyText, type ChartReading } from './chartReading'

/** Fall read from the waterfall, dB: the time for a frequency to drop this far below its first slice. */
const FALL_DB = 20
/** Frequencies this far below the loudest one in the first slice are nulls, not ringing, dB. */
const SIGNIFICANT_DB = -20
const LOW_BANDS_HZ = [63, 125]

export interface RingingFrequency {
  frequencyHz: number
  /** Start of the first slice at least FALL_DB below the first; null if none within the span. */
  fallMs: number | null
}

/** The frequency of the waterfall that takes longest to fall 20 dB; among those that never do, the one that falls least (ties: the lower frequency). */
export function longestRinging(data: WaterfallData): RingingFrequency | null {
  const first = data.levelDb[0]
  if (!first || data.timeMs.length < 2) return null
  let best: RingingFrequency | null = null
  let bestMs = -Infinity
  data.frequencyHz.forEach((frequencyHz, f) => {
    const startDb = first[f] as number
    if (!Number.isFinite(startDb) || startDb < SIGNIFICANT_DB) return
    const slice = data.levelDb.findIndex((levels) => (levels[f] as number) <= startDb - FALL_DB)
    const fallMs = slice < 0 ? null : (data.timeMs[slice] as number)
    // Frequencies that never fall 20 dB in the view rank above all others, least fall first.
    const lastDb = data.levelDb[data.levelDb.length - 1]?.[f] as number
    const rankMs = fallMs ?? 1e9 - (startDb - lastDb)
    if (rankMs > bestMs) {
      bestMs = rankMs
      best = { frequencyHz, fallMs }
    }
  })
  return best
}

/** Reads the low-frequency waterfall (ringing) and the low bands' T against the mid-band. */
export function readBass(data: WaterfallData | null, bands: readonly BandResult[], modes: readonly { frequencyHz: number; label: string }[] = []): ChartReading {
  let first = 'This capture is too short for a low-frequency waterfall.'
  const ringing = data ? longestRinging(data) : null
  if (data && ringing) {
    const spanMs = data.timeMs[data.timeMs.length - 1] as number
    const fall = ringing.fallMs === null ? `is still within ${FALL_DB} dB of its start after ${formatMeasure(spanMs, 0, 'ms')}` : `takes about ${formatMeasure(ringing.fallMs, 0, 'ms')} to fall ${FALL_DB} dB`
    const mode = modes.reduce<{ frequencyHz: number; label: string } | null>(
      (near, m) => (Math.abs(Math.log(m.frequencyHz / ringing.frequencyHz)) < Math.abs(Math.log((near?.frequencyHz ?? Infinity) / ringing.frequencyHz)) ? m : near),
      null,
    )
    const modeText = mode && Math.abs(mode.frequencyHz / ringing.frequencyHz - 1) < 0.06 ? `, close to the room mode ${mode.label}` : ''
    first = `The longest ringing is near ${frequencyText(ringing.frequencyHz)}${modeText}: it ${fall}.`
  }
  const low = LOW_BANDS_HZ.map((centreHz) => bands.find((b) => b.centreHz === centreHz))
    .filter((b): b is BandResult => b !== undefined && (b.T30 ?? b.T20) !== null)
    .map((b) => `${formatMeasure(b.T30 ?? b.T20, 2, 's')}${b.T30 === null ? ' (T20)' : ''} at ${formatFrequencyWithUnit(b.centreHz)}`)
  const mid = midBandMean(bands, 'T30')
  if (low.length === 0) return [first, 'The low bands have too little decay to give a reverberation time.']
  return [first, `T30 is ${low.join(' and ')}${mid === null ? '' : `, against ${formatMeasure(mid, 2, 's')} at mid-band`}.`]
}
