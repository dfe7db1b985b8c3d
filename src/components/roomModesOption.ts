import type { RoomMode, RoomModeType } from '@shared/room'
import type { ChartColors } from './charts/chartColors'
import { baseChartOption, roundedRange, tooltipRow, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './charts/chartOptionParts'
import { formatFrequencyHz, formatFrequencyWithUnit, LOW_FREQUENCY_TICKS_HZ } from './charts/frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface BassCurve {
  name: string
  frequencyHz: number[]
  levelDb: number[]
}

export interface RoomModesChartInput {
  modes: readonly RoomMode[]
  predicted: BassCurve | null
  measured: BassCurve | null
  schroederHz: number | null
}

export const MODE_TYPES: readonly RoomModeType[] = ['oblique', 'tangential', 'axial']
const RANGE_HZ: [number, number] = [20, 300]
const SYMBOLS: Record<RoomModeType, { symbol: string; size: number }> = { axial: { symbol: 'circle', size: 11 }, tangential: { symbol: 'triangle', size: 10 }, oblique: { symbol: 'diamond', size: 8 } }

export function describeRoomModes(input: RoomModesChartInput): string {
  const counts = MODE_TYPES.map((t) => `${input.modes.filter((m) => m.type === t).length} ${t}`).join(', ')
  const first = input.modes.slice(0, 3).map((m) => `${formatFrequencyWithUnit(m.frequencyHz)} (${m.indices.join(',')})`).join(', ')
  return `Room modes 20–300 Hz: ${counts}; lowest ${first || 'none'}.${input.predicted ? ` Predicted level at the listener: ${extremes(input.predicted)}.` : ''}${input.measured ? ` Measured: ${extremes(input.measured)}.` : ''}`
}

/** "highest +18.9 dB at 34.5 Hz, lowest −4.1 dB at 48 Hz" over 30–200 Hz, where the bass is judged. */
function extremes(curve: BassCurve): string {
  let high = -1
  let low = -1
  curve.levelDb.forEach((level, i) => {
    const f = curve.frequencyHz[i] ?? 0
    if (f < 30 || f > 200 || !Number.isFinite(level)) return
    if (high < 0 || level > curve.levelDb[high]!) high = i
    if (low < 0 || level < curve.levelDb[low]!) low = i
  })
  if (high < 0) return 'no values between 30 and 200 Hz'
  const at = (i: number) => `${formatMeasure(curve.levelDb[i], 1, 'dB')} at ${formatFrequencyWithUnit(curve.frequencyHz[i]!)}`
  return `highest ${at(high)}, lowest ${at(low)} (30–200 Hz)`
}

/** Response curves above (dB re free field at 1 m), a ladder of mode markers by type below; both on one log axis 20–300 Hz. */
export function roomModesOption(input: RoomModesChartInput, colors: ChartColors): RingdownChartOption {
  const { palette } = colors
  const curves = [input.predicted, input.measured].filter((c): c is BassCurve => c !== null)
  const yRange = roundedRange(curves.flatMap((c) => c.levelDb), 10, [-20, 20])
  const modeColor: Record<RoomModeType, string> = { axial: palette.single, tangential: palette.before, oblique: palette.others[0] as string }
  const xAxis = (gridIndex: number, showLabels: boolean) => ({
    type: 'log' as const,
    gridIndex,
    min: RANGE_HZ[0],
    max: RANGE_HZ[1],
    ...valueAxisStyle(colors, showLabels ? 'Frequency (Hz)' : '', 30),
    axisLabel: { show: showLabels, color: colors.mutedText, customValues: [...LOW_FREQUENCY_TICKS_HZ], formatter: (v: number) => formatFrequencyHz(v) },
    axisTick: { customValues: [...LOW_FREQUENCY_TICKS_HZ], lineStyle: { color: colors.axisLine } },
  })
  const schroederLine = input.schroederHz !== null && input.schroederHz <= RANGE_HZ[1]
    ? { silent: true, symbol: 'none', lineStyle: { color: palette.marker, type: 'dashed' as const }, label: { formatter: `Schroeder ${formatMeasure(input.schroederHz, 0, 'Hz')}`, color: palette.marker, position: 'insideEndTop' as const }, data: [{ xAxis: input.schroederHz }] }
    : undefined
  const curveSeries = curves.map((c, i) => ({
    type: 'line' as const,
    name: c.name,
    xAxisIndex: 0,
    yAxisIndex: 0,
    data: c.frequencyHz.map((f, k) => [f, c.levelDb[k] ?? null]),
    showSymbol: false,
    color: c === input.predicted ? palette.predicted : palette.single,
    lineStyle: { width: 2, type: c === input.predicted ? ('dashed' as const) : ('solid' as const) },
    emphasis: { disabled: true },
    ...(i === 0 && schroederLine ? { markLine: schroederLine } : {}),
  }))
  // Markers as symbol-only line series: the ladder needs no series type beyond the shared chart option.
  const modeSeries = MODE_TYPES.map((type) => ({
    type: 'line' as const,
    name: `${type[0]!.toUpperCase()}${type.slice(1)} modes`,
    xAxisIndex: 1,
    yAxisIndex: 1,
    data: input.modes.filter((m) => m.type === type).map((m) => [m.frequencyHz, type, m.indices.join(',')]),
    showSymbol: true,
    showAllSymbol: true,
    symbol: SYMBOLS[type].symbol,
    symbolSize: SYMBOLS[type].size,
    color: modeColor[type],
    lineStyle: { opacity: 0 },
    emphasis: { disabled: true },
  }))
  return {
    ...baseChartOption(colors, { description: describeRoomModes(input), fileName: 'room-modes' }),
    grid: [
      { left: 76, right: 24, top: 44, bottom: 150 },
      { left: 76, right: 24, height: 74, bottom: 52 },
    ],
    xAxis: [xAxis(0, false), xAxis(1, true)],
    yAxis: [
      { type: 'value', gridIndex: 0, min: yRange[0], max: yRange[1], interval: 10, ...valueAxisStyle(colors, 'Level (dB)', 44) },
      { type: 'category', gridIndex: 1, data: [...MODE_TYPES], ...valueAxisStyle(colors, '', 0), splitLine: { show: false } },
    ],
    axisPointer: { link: [{ xAxisIndex: 'all' }] },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const rows = params as { marker?: unknown; seriesName?: string; value: [number, number | string, string?] }[]
        const head = rows[0]
        if (!head) return ''
        const lines = rows.map((r) =>
          typeof r.value[1] === 'string' ? tooltipRow(r.marker, r.seriesName, `${formatMeasure(r.value[0], 1, 'Hz')} (${r.value[2] ?? ''})`) : tooltipRow(r.marker, r.seriesName, formatMeasure(r.value[1], 1, 'dB')),
        )
        return [formatFrequencyWithUnit(head.value[0]), ...lines].join('<br/>')
      },
    },
    series: [...curveSeries, ...modeSeries],
  }
}
