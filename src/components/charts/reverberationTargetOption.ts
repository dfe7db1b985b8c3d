import type { TargetMask } from '@shared/room'
import type { ChartColors } from './chartColors'
import { baseChartOption, tooltipRow, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './chartOptionParts'
import { seriesColor, seriesLineType, type SeriesRole } from './chartPalette'
import { formatFrequencyHz, formatFrequencyWithUnit } from './frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'
import { formatTargetRange } from '../verdictPresentation'

export interface ReverberationSeries {
  name: string
  role: SeriesRole
  bands: { centreHz: number; reverberationTimeS: number | null }[]
}

const LOWER_NAME = '__target-lower'

function bandCentres(series: readonly ReverberationSeries[], mask: TargetMask | null): number[] {
  const centres = new Set<number>([...(mask?.bands.map((b) => b.centreHz) ?? []), ...series.flatMap((s) => s.bands.map((b) => b.centreHz))])
  return [...centres].sort((a, b) => a - b)
}

export function describeReverberationTarget(series: readonly ReverberationSeries[], mask: TargetMask | null): string {
  const seriesText = series
    .map((s) => `${s.name}: ${s.bands.map((b) => `${formatFrequencyWithUnit(b.centreHz)} ${formatMeasure(b.reverberationTimeS, 2, 's')}`).join(', ')}`)
    .join('; ')
  const maskText = mask ? ` Target ${mask.name}: ${mask.bands.map((b) => `${formatFrequencyWithUnit(b.centreHz)} ${formatTargetRange(b)}`).join(', ')}.` : ' No target.'
  return `Reverberation time per band in seconds. ${seriesText || 'No measurements'}.${maskText}`
}

/** The mask as two stacked lines: the lower limit, and the band's height above it (shaded). */
function maskSeries(mask: TargetMask, colors: ChartColors) {
  const limited = mask.bands.filter((b) => b.minS !== null || b.maxS !== null)
  const lower = limited.map((b) => [b.centreHz, b.minS ?? 0])
  const height = limited.map((b) => [b.centreHz, b.maxS === null ? null : b.maxS - (b.minS ?? 0)])
  const line = { color: colors.palette.maskLine, width: 1 }
  return [
    { type: 'line' as const, name: LOWER_NAME, data: lower, stack: 'target', showSymbol: false, lineStyle: line, color: colors.palette.maskLine, silent: true, z: 1 },
    {
      type: 'line' as const,
      name: `Target: ${mask.name}`,
      data: height,
      stack: 'target',
      showSymbol: false,
      lineStyle: line,
      areaStyle: { color: colors.palette.maskFill },
      color: colors.palette.maskLine,
      silent: true,
      z: 1,
    },
  ]
}

/** ECharts option: T (s) per band on a log frequency axis, several series, the target as a soft band. */
export function reverberationTargetOption(series: readonly ReverberationSeries[], mask: TargetMask | null, colors: ChartColors, fileName = 'reverberation-target'): RingdownChartOption {
  const centres = bandCentres(series, mask)
  const lowHz = (centres[0] ?? 63) / Math.SQRT2
  const highHz = (centres[centres.length - 1] ?? 8000) * Math.SQRT2
  let otherIndex = 0
  const measured = series.map((s) => {
    const color = seriesColor(colors.palette, s.role, s.role === 'other' ? otherIndex++ : 0)
    return {
      type: 'line' as const,
      name: s.name,
      data: s.bands.map((b) => [b.centreHz, b.reverberationTimeS]),
      color,
      symbol: s.role === 'predicted' ? 'diamond' : 'circle',
      symbolSize: 7,
      lineStyle: { width: 2, type: seriesLineType(s.role) },
      emphasis: { disabled: true },
      z: 3,
    }
  })
  const legendNames = [...series.map((s) => s.name), ...(mask ? [`Target: ${mask.name}`] : [])]
  return {
    ...baseChartOption(colors, { description: describeReverberationTarget(series, mask), fileName }),
    legend: { top: 0, left: 'center', right: 56, type: 'scroll', data: legendNames, textStyle: { color: colors.text }, pageTextStyle: { color: colors.text } },
    grid: { left: 64, right: 24, top: 44, bottom: 52 },
    xAxis: {
      type: 'log',
      min: lowHz,
      max: highHz,
      ...valueAxisStyle(colors, 'Band centre (Hz)', 30),
      axisLabel: { color: colors.mutedText, customValues: centres, formatter: (value: number) => formatFrequencyHz(value) },
      axisTick: { customValues: centres, lineStyle: { color: colors.axisLine } },
    },
    yAxis: { type: 'value', min: 0, ...valueAxisStyle(colors, 'Reverberation time (s)', 44) },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const rows = params as { marker?: unknown; seriesName?: string; value: [number, number | null] }[]
        const head = rows[0]
        if (!head) return ''
        const centreHz = head.value[0]
        const target = mask?.bands.find((b) => Math.abs(b.centreHz / centreHz - 1) < 0.01)
        const lines = rows
          .filter((row) => row.seriesName !== LOWER_NAME && !row.seriesName?.startsWith('Target: '))
          .map((row) => tooltipRow(row.marker, row.seriesName, formatMeasure(row.value[1], 2, 's')))
        if (mask) lines.push(`Target: <b>${formatTargetRange(target)}</b>`)
        return [formatFrequencyWithUnit(centreHz), ...lines].join('<br/>')
      },
    },
    series: [...(mask ? maskSeries(mask, colors) : []), ...measured],
  }
}
