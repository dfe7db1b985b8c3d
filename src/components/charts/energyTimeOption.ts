import type { ChartColors } from './chartColors'
import { baseChartOption, roundedRange, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './chartOptionParts'
import { decimateSeries } from './decimateSeries'
import { formatMeasure } from '@/utils/formatMeasure'

export interface EnergyTimeInput {
  timeMs: number[]
  levelDb: number[]
  /** Reflections or other events to mark, ms from the onset. */
  markers?: { timeMs: number; label: string }[]
  /** Visible time range, ms (e.g. [−5, 80] for the early part); the whole curve when absent. */
  rangeMs?: [number, number]
  name?: string
}

/** Lowest level shown, dB re peak: below this the curve is background noise. */
const FLOOR_DB = -100

/** Rounds a time up to a tidy axis end: 1995 → 2000, 487 → 490, 78 → 78. */
export function niceCeilMs(valueMs: number): number {
  if (valueMs <= 0) return 0
  const stepMs = Math.max(1, 10 ** (Math.floor(Math.log10(valueMs)) - 1) * 5)
  return Math.ceil(valueMs / stepMs) * stepMs
}

function visibleRangeMs(input: EnergyTimeInput): [number, number] {
  if (input.rangeMs) return input.rangeMs
  const first = input.timeMs[0] ?? 0
  const last = input.timeMs[input.timeMs.length - 1] ?? 1
  return [Math.floor(first), niceCeilMs(last)]
}

export function describeEnergyTime(input: EnergyTimeInput): string {
  const [startMs, endMs] = visibleRangeMs(input)
  const markers = input.markers ?? []
  const markerText = markers.length === 0 ? 'no reflections marked' : `marked: ${markers.map((m) => `${m.label} at ${formatMeasure(m.timeMs, 1, 'ms')}`).join(', ')}`
  return `Energy-time curve, level in dB re peak from ${formatMeasure(startMs, 0, 'ms')} to ${formatMeasure(endMs, 0, 'ms')}; ${markerText}.`
}

/** ECharts option: level (dB re peak) against time (ms), reflections as labelled vertical lines. */
export function energyTimeOption(input: EnergyTimeInput, colors: ChartColors, fileName = 'energy-time'): RingdownChartOption {
  const [startMs, endMs] = visibleRangeMs(input)
  const inRange = input.levelDb.filter((_, i) => (input.timeMs[i] as number) >= startMs && (input.timeMs[i] as number) <= endMs)
  // 10 dB grid lines for the early part, 20 dB when the whole decay into the noise is shown.
  const stepDb = roundedRange(inRange, 10, [-80, 0])[0] < -60 ? 20 : 10
  const [lowDb, highDb] = roundedRange(inRange, stepDb, [-80, 0])
  const markers = (input.markers ?? []).filter((m) => m.timeMs >= startMs && m.timeMs <= endMs)
  return {
    ...baseChartOption(colors, { description: describeEnergyTime(input), fileName, hasLegend: false }),
    grid: { left: 64, right: 24, top: 44, bottom: 52 },
    xAxis: { type: 'value', min: startMs, max: endMs, ...valueAxisStyle(colors, 'Time after the onset (ms)', 30) },
    yAxis: { type: 'value', min: Math.max(FLOOR_DB, lowDb), max: Math.max(0, highDb), interval: stepDb, ...valueAxisStyle(colors, 'Level (dB re peak)', 44) },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const row = (params as { value: [number, number] }[])[0]
        return row ? `${formatMeasure(row.value[0], 2, 'ms')}<br/><b>${formatMeasure(row.value[1], 1, 'dB')}</b>` : ''
      },
    },
    series: [
      {
        type: 'line',
        name: input.name ?? 'Energy-time curve',
        data: decimateSeries(input.timeMs, input.levelDb),
        showSymbol: false,
        clip: true,
        color: colors.palette.single,
        lineStyle: { width: 1.4 },
        emphasis: { disabled: true },
        markLine: {
          silent: true,
          symbol: 'none',
          animation: false,
          lineStyle: { color: colors.palette.marker, type: 'dashed', width: 1 },
          label: { color: colors.text, position: 'insideEndTop', fontSize: 11 },
          data: markers.map((m) => ({ xAxis: m.timeMs, name: m.label, label: { formatter: () => `${m.label} · ${formatMeasure(m.timeMs, 1, 'ms')}` } })),
        },
      },
    ],
  }
}
