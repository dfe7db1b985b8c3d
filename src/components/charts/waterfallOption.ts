import type { WaterfallData } from '@shared/types/analysis'
import type { ChartColors } from './chartColors'
import { baseChartOption, valueAxisStyle, type RingdownChartOption } from './chartOptionParts'
import { formatFrequencyHz, formatFrequencyWithUnit, LOW_FREQUENCY_TICKS_HZ, nearestFrequencyIndex } from './frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface RoomModeMark {
  frequencyHz: number
  label: string
}

/** Quietest level coloured, dB re the first slice's maximum (the engine clamps at −60 dB). */
const FLOOR_DB = -60

/** Grid indices that get a frequency label: the bin nearest each low-frequency tick inside the grid. */
export function labelledFrequencyIndices(frequenciesHz: readonly number[]): Set<number> {
  const first = frequenciesHz[0]
  const last = frequenciesHz[frequenciesHz.length - 1]
  if (first === undefined || last === undefined) return new Set()
  return new Set(LOW_FREQUENCY_TICKS_HZ.filter((tickHz) => tickHz >= first * 0.99 && tickHz <= last * 1.01).map((tickHz) => nearestFrequencyIndex(frequenciesHz, tickHz)))
}

export function describeWaterfall(data: WaterfallData, modes: readonly RoomModeMark[]): string {
  const first = data.frequencyHz[0]
  const last = data.frequencyHz[data.frequencyHz.length - 1]
  if (first === undefined || last === undefined || data.timeMs.length === 0) return 'Low-frequency waterfall: no data.'
  const modeText = modes.length === 0 ? '' : ` Room modes marked at ${modes.map((m) => formatFrequencyWithUnit(m.frequencyHz)).join(', ')}.`
  const lastSliceMs = data.timeMs[data.timeMs.length - 1] as number
  return `Low-frequency waterfall from ${formatFrequencyWithUnit(first)} to ${formatFrequencyWithUnit(last)}, ${data.timeMs.length} time slices from 0 to ${formatMeasure(lastSliceMs, 0, 'ms')}, colour = level in dB.${modeText}`
}

/**
 * ECharts option: a heatmap of level (colour, dB) over frequency (x, the engine's log-spaced bins
 * as categories) and slice start time (y, ms). Heatmaps on a cartesian grid need category axes,
 * so the x axis shows the bins in order and labels the ones nearest the usual ticks.
 */
export function waterfallOption(data: WaterfallData, modes: readonly RoomModeMark[], colors: ChartColors, fileName = 'waterfall'): RingdownChartOption {
  const labelled = labelledFrequencyIndices(data.frequencyHz)
  const cells: [number, number, number][] = []
  data.levelDb.forEach((slice, sliceIndex) => slice.forEach((levelDb, frequencyIndex) => cells.push([frequencyIndex, sliceIndex, Math.max(FLOOR_DB, levelDb)])))
  const axisStyle = valueAxisStyle(colors, 'Frequency (Hz)', 30)
  return {
    ...baseChartOption(colors, { description: describeWaterfall(data, modes), fileName, hasLegend: false }),
    grid: { left: 72, right: 96, top: 40, bottom: 52 },
    xAxis: {
      type: 'category',
      data: data.frequencyHz.map((frequencyHz) => String(frequencyHz)),
      ...axisStyle,
      axisLabel: { color: colors.mutedText, interval: (index: number) => labelled.has(index), formatter: (value: string) => formatFrequencyHz(Number(value)) },
      axisTick: { interval: (index: number) => labelled.has(index), lineStyle: { color: colors.axisLine } },
      splitLine: { show: false },
    },
    yAxis: {
      type: 'category',
      data: data.timeMs.map((timeMs) => formatMeasure(timeMs, 0)),
      ...valueAxisStyle(colors, 'Slice start (ms)', 48),
      splitLine: { show: false },
    },
    visualMap: {
      type: 'continuous',
      min: FLOOR_DB,
      max: 0,
      calculable: false,
      orient: 'vertical',
      right: 8,
      top: 'middle',
      itemHeight: 180,
      text: ['0 dB', `${formatMeasure(FLOOR_DB, 0)} dB`],
      textStyle: { color: colors.mutedText },
      inRange: { color: [...colors.palette.heatRamp] },
    },
    tooltip: {
      trigger: 'item',
      backgroundColor: colors.surface,
      borderColor: colors.axisLine,
      textStyle: { color: colors.text, fontSize: 12 },
      formatter: (params: unknown) => {
        const [frequencyIndex, sliceIndex, levelDb] = (params as { value: [number, number, number] }).value
        const frequencyText = formatFrequencyWithUnit(data.frequencyHz[frequencyIndex] as number)
        return `${frequencyText}, slice at ${formatMeasure(data.timeMs[sliceIndex], 0, 'ms')}<br/><b>${formatMeasure(levelDb, 1, 'dB')}</b>`
      },
    },
    series: [
      {
        type: 'heatmap',
        name: 'Level',
        data: cells,
        emphasis: { disabled: true },
        progressive: 0,
        markLine: {
          silent: true,
          symbol: 'none',
          lineStyle: { color: colors.palette.marker, type: 'dashed', width: 1.2 },
          label: { color: colors.text, position: 'insideEndTop', fontSize: 11 },
          data: modes
            .map((mode) => ({ mode, index: nearestFrequencyIndex(data.frequencyHz, mode.frequencyHz) }))
            .filter(({ mode, index }) => index >= 0 && Math.abs(Math.log2(mode.frequencyHz / (data.frequencyHz[index] as number))) < 0.1)
            .map(({ mode, index }) => ({ xAxis: index, name: mode.label, label: { formatter: () => mode.label } })),
        },
      },
    ],
  }
}
