import { formatFrequencyWithUnit } from '@/components/charts/frequencyTicks'

/** The two plain-language lines under a chart: what the numbers say, then what stands out. */
export type ChartReading = [string, string]

/** A measured frequency for a sentence: whole hertz below 1 kHz ("87 Hz"), else "2.35 kHz". */
export function frequencyText(frequencyHz: number): string {
  return formatFrequencyWithUnit(frequencyHz < 1000 ? Math.round(frequencyHz) : frequencyHz)
}

/** "+3.5 dB" / "−2.0 dB": a level difference with its sign. */
export function signedDbText(levelDb: number, decimals = 1): string {
  const rounded = Number(levelDb.toFixed(decimals))
  const sign = rounded > 0 ? '+' : rounded < 0 ? '−' : ''
  return `${sign}${Math.abs(rounded).toFixed(decimals)} dB`
}
