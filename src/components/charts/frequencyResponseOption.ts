import type { ChartColors } from './chartColors'
import { baseChartOption, roundedRange, tooltipRow, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './chartOptionParts'
import { seriesColor, seriesLineType, type SeriesRole } from './chartPalette'
import { decimateSeries } from './decimateSeries'
import { formatFrequencyHz, formatFrequencyWithUnit, OCTAVE_TICKS_HZ } from './frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface ResponseSeries {
  name: string
  role: SeriesRole
  frequencyHz: number[]
  magnitudeDb: number[]
}

export const RESPONSE_RANGE_HZ: [number, number] = [20, 20000]

/** Plain-language summary for screen readers: range and level extremes of each curve. */
export function describeFrequencyResponse(series: readonly ResponseSeries[]): string {
  if (series.length === 0) return 'Frequency response: no curve to show.'
  const parts = series.map((s) => {
    let minIndex = -1
    let maxIndex = -1
    s.magnitudeDb.forEach((levelDb, i) => {
      const frequencyHz = s.frequencyHz[i] as number
      if (!Number.isFinite(levelDb) || frequencyHz < RESPONSE_RANGE_HZ[0] || frequencyHz > RESPONSE_RANGE_HZ[1]) return
      if (minIndex < 0 || levelDb < (s.magnitudeDb[minIndex] as number)) minIndex = i
      if (maxIndex < 0 || levelDb > (s.magnitudeDb[maxIndex] as number)) maxIndex = i
    })
    if (minIndex < 0) return `${s.name}: no values between 20 Hz and 20 kHz`
    const at = (i: number) => `${formatMeasure(s.magnitudeDb[i], 1, 'dB')} at ${formatFrequencyWithUnit(s.frequencyHz[i] as number)}`
    return `${s.name}: lowest ${at(minIndex)}, highest ${at(maxIndex)}`
  })
  return `Frequency response, 20 Hz to 20 kHz, level in dB. ${parts.join('; ')}.`
}

/** ECharts option: log frequency axis 20 Hz–20 kHz with octave ticks, dB axis, one line a series. */
export function frequencyResponseOption(series: readonly ResponseSeries[], colors: ChartColors, fileName = 'frequency-response'): RingdownChartOption {
  let otherIndex = 0
  const yRange = roundedRange(
    series.flatMap((s) => s.magnitudeDb.filter((_, i) => (s.frequencyHz[i] as number) >= RESPONSE_RANGE_HZ[0])),
    10,
    [-40, 10],
  )
  return {
    ...baseChartOption(colors, { description: describeFrequencyResponse(series), fileName }),
    grid: { left: 64, right: 24, top: 44, bottom: 52 },
    xAxis: {
      type: 'log',
      min: RESPONSE_RANGE_HZ[0],
      max: RESPONSE_RANGE_HZ[1],
      ...valueAxisStyle(colors, 'Frequency (Hz)', 30),
      axisLabel: { color: colors.mutedText, customValues: [...OCTAVE_TICKS_HZ], formatter: (value: number) => formatFrequencyHz(value) },
      axisTick: { customValues: [...OCTAVE_TICKS_HZ], lineStyle: { color: colors.axisLine } },
    },
    yAxis: { type: 'value', min: yRange[0], max: yRange[1], interval: 10, ...valueAxisStyle(colors, 'Level (dB)', 44) },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const rows = params as { marker?: unknown; seriesName?: string; value: [number, number] }[]
        const first = rows[0]
        if (!first) return ''
        const header = formatFrequencyWithUnit(first.value[0])
        return [header, ...rows.map((row) => tooltipRow(row.marker, row.seriesName, formatMeasure(row.value[1], 1, 'dB')))].join('<br/>')
      },
    },
    series: series.map((s) => ({
      type: 'line' as const,
      name: s.name,
      data: decimateSeries(s.frequencyHz, s.magnitudeDb),
      showSymbol: false,
      color: seriesColor(colors.palette, s.role, s.role === 'other' ? otherIndex++ : 0),
      lineStyle: { width: s.role === 'after' || s.role === 'single' ? 2 : 1.6, type: seriesLineType(s.role) },
      emphasis: { disabled: true },
    })),
  }
}
