import type { DecayCurve } from '@shared/types/analysis'
import type { ChartColors } from './chartColors'
import { baseChartOption, roundedRange, tooltipRow, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './chartOptionParts'
import { seriesColor, withAlpha, type SeriesRole } from './chartPalette'
import { decimateSeries } from './decimateSeries'
import { formatFrequencyWithUnit } from './frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export type FitName = 'EDT' | 'T20' | 'T30'

/** Evaluation ranges of the decay fits, dB re the start of the Schroeder curve (ISO 3382-1:2009 cl. 3 / ISO 3382-2:2008 cl. 6). */
export const FIT_RANGES_DB: Record<FitName, [number, number]> = { EDT: [0, -10], T20: [-5, -25], T30: [-5, -35] }

export interface DecaySeries {
  name: string
  role: SeriesRole
  curve: DecayCurve
}

/** Lowest level drawn, dB: a decay this far down is noise in any real capture. */
const FLOOR_DB = -80

export function bandName(centreHz: number | null): string {
  return centreHz === null ? 'broadband' : `${formatFrequencyWithUnit(centreHz)} band`
}

export function describeDecay(series: readonly DecaySeries[], fits: readonly FitName[]): string {
  if (series.length === 0) return 'Decay: no curve for this band.'
  const first = series[0] as DecaySeries
  const parts = series.map((s) => {
    const truncation = s.curve.truncationMs === null ? 'no truncation' : `truncated at ${formatMeasure(s.curve.truncationMs, 0, 'ms')}`
    return `${s.name}: ${truncation}`
  })
  const fitText = fits.filter((fit) => first.curve.fits[fit] !== null).join(', ') || 'none'
  return `Schroeder decay of the ${bandName(first.curve.centreHz)}, level in dB against ms; fitted lines: ${fitText}. ${parts.join('; ')}.`
}

function fitSeries(name: FitName, segment: number[], colors: ChartColors) {
  const [startMs = 0, startDb = 0, endMs = 0, endDb = 0] = segment
  const [topDb, bottomDb] = FIT_RANGES_DB[name]
  const color = colors.palette.fits[name]
  return {
    type: 'line' as const,
    name: `${name} fit`,
    data: [
      [startMs, startDb],
      [endMs, endDb],
    ],
    color,
    showSymbol: false,
    lineStyle: { width: 2, type: 'dashed' as const },
    emphasis: { disabled: true },
    z: 3,
    // The evaluation range: from where the curve crosses the top limit to where it crosses the bottom.
    markArea: {
      silent: true,
      itemStyle: { color: withAlpha(color, colors.isDark ? 0.12 : 0.09) },
      label: { show: false },
      data: [[{ xAxis: startMs, yAxis: topDb }, { xAxis: endMs, yAxis: bottomDb }]] as [{ xAxis: number; yAxis: number }, { xAxis: number; yAxis: number }][],
    },
  }
}

/** ECharts option: Schroeder curves (dB) against ms, the first curve's fits with their evaluation ranges, truncation marked. */
export function decayChartOption(series: readonly DecaySeries[], fits: readonly FitName[], colors: ChartColors, fileName = 'decay'): RingdownChartOption {
  let otherIndex = 0
  const endMs = Math.max(10, ...series.map((s) => Math.max(s.curve.truncationMs ?? 0, s.curve.timeMs[s.curve.timeMs.length - 1] ?? 0)))
  const first = series[0]
  const lowestDb = Math.max(FLOOR_DB, roundedRange(series.flatMap((s) => s.curve.levelDb), 10, [FLOOR_DB, 0])[0])
  const curves = series.map((s) => {
    const color = seriesColor(colors.palette, s.role, s.role === 'other' ? otherIndex++ : 0)
    const truncationMs = s.curve.truncationMs
    return {
      type: 'line' as const,
      name: s.name,
      data: decimateSeries(s.curve.timeMs, s.curve.levelDb),
      showSymbol: false,
      color,
      lineStyle: { width: 1.8 },
      emphasis: { disabled: true },
      markLine:
        truncationMs === null
          ? undefined
          : {
              silent: true,
              symbol: 'none',
              lineStyle: { color, type: 'dotted' as const, width: 1.5 },
              label: { color: colors.text, position: 'insideEndTop' as const, fontSize: 11, formatter: () => `Truncation · ${formatMeasure(truncationMs, 0, 'ms')}` },
              data: [{ xAxis: truncationMs }],
            },
    }
  })
  const fitLines = first ? fits.flatMap((fit) => (first.curve.fits[fit] ? [fitSeries(fit, first.curve.fits[fit] as number[], colors)] : [])) : []
  return {
    ...baseChartOption(colors, { description: describeDecay(series, fits), fileName }),
    grid: { left: 64, right: 24, top: 44, bottom: 52 },
    xAxis: { type: 'value', min: 0, max: Math.ceil(endMs / 50) * 50, ...valueAxisStyle(colors, 'Time after the onset (ms)', 30) },
    yAxis: { type: 'value', min: lowestDb, max: 0, interval: 10, ...valueAxisStyle(colors, 'Level (dB)', 44) },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const rows = (params as { marker?: unknown; seriesName?: string; value: [number, number] }[]).filter((row) => !row.seriesName?.endsWith(' fit'))
        const head = rows[0]
        if (!head) return ''
        return [formatMeasure(head.value[0], 0, 'ms'), ...rows.map((row) => tooltipRow(row.marker, row.seriesName, formatMeasure(row.value[1], 1, 'dB')))].join('<br/>')
      },
    },
    series: [...curves, ...fitLines],
  }
}
