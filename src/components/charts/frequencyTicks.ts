/** Octave tick positions, Hz: 1 kHz·2^k, labelled with the IEC 61260-1 nominal values. */
export const OCTAVE_TICKS_HZ = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000] as const

/** Ticks of the low-frequency views (waterfall, modes), Hz. */
export const LOW_FREQUENCY_TICKS_HZ = [20, 30, 40, 50, 63, 80, 100, 125, 160, 200, 250, 300] as const

/**
 * A frequency as people write it on a chart: 31.5 → "31.5", 125 → "125", 1000 → "1k",
 * 1250 → "1.25k", 16000 → "16k". At most 3 significant decimals are kept.
 */
export function formatFrequencyHz(frequencyHz: number): string {
  if (!Number.isFinite(frequencyHz)) return '—'
  if (Math.abs(frequencyHz) >= 1000) return `${trimNumber(frequencyHz / 1000, 2)}k`
  return trimNumber(frequencyHz, frequencyHz < 100 ? 1 : 0)
}

/** A frequency with its unit for text: 31.5 → "31.5 Hz", 1000 → "1 kHz", 1250 → "1.25 kHz". */
export function formatFrequencyWithUnit(frequencyHz: number): string {
  if (Math.abs(frequencyHz) >= 1000) return `${trimNumber(frequencyHz / 1000, 2)} kHz`
  return `${trimNumber(frequencyHz, frequencyHz < 100 ? 1 : 0)} Hz`
}

function trimNumber(value: number, maxDecimals: number): string {
  return String(Number(value.toFixed(maxDecimals)))
}

/** Index of the grid frequency nearest to a target in lg f (for category axes). */
export function nearestFrequencyIndex(frequenciesHz: readonly number[], targetHz: number): number {
  let best = -1
  let bestDistance = Infinity
  frequenciesHz.forEach((frequencyHz, index) => {
    const distance = Math.abs(Math.log(frequencyHz / targetHz))
    if (distance < bestDistance) {
      bestDistance = distance
      best = index
    }
  })
  return best
}
