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

/** A tick labels a bin only if the bin lies this close to it (a modal-view grid is ~1/40 octave). */
const MAX_LABEL_OFFSET_OCTAVES = 0.05

/** Grid index → tick frequency for the bins nearest each low-frequency tick inside the grid. */
export function labelledFrequencyIndices(frequenciesHz: readonly number[]): Map<number, number> {
  const first = frequenciesHz[0]
  const last = frequenciesHz[frequenciesHz.length - 1]
  const labels = new Map<number, number>()
  if (first === undefined || last === undefined) return labels
  const octavesOff = (index: number, tickHz: number) => Math.abs(Math.log2((frequenciesHz[index] as number) / tickHz))
  for (const tickHz of LOW_FREQUENCY_TICKS_HZ) {
    const index = nearestFrequencyIndex(frequenciesHz, tickHz)
    // A coarse grid may have no bin near a tick; a label there would name the wrong frequency.
    if (octavesOff(index, tickHz) > MAX_LABEL_OFFSET_OCTAVES) continue
    const taken = labels.get(index)
    if (taken === undefined || octavesOff(index, tickHz) < octavesOff(index, taken)) labels.set(index, tickHz)
  }
  return labels
}

/** Modes falling in the same bin share one line, their labels joined ("1,0,0 / 0,0,1"). */
export function modeLines(frequenciesHz: readonly number[], modes: readonly RoomModeMark[]): { index: number; label: string }[] {
  const byIndex = new Map<number, string[]>()
  for (const mode of modes) {
    const index = nearestFrequencyIndex(frequenciesHz, mode.frequencyHz)
    // Modes outside the grid (more than a tenth of an octave from any bin) are not drawn.
    if (index < 0 || Math.abs(Math.log2(mode.frequencyHz / (frequenciesHz[index] as number))) > 0.1) continue
    byIndex.set(index, [...(byIndex.get(index) ?? []), mode.label])
  }
  return [...byIndex.entries()].map(([index, labels]) => ({ index, label: labels.join(' / ') }))
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
      axisLabel: { color: colors.mutedText, interval: (index: number) => labelled.has(index), formatter: (_value: string, index: number) => formatFrequencyHz(labelled.get(index) ?? 0) },
      axisTick: { interval: (index: number) => labelled.has(index), lineStyle: { color: colors.axisLine } },
      splitLine: { show: false },
    },
    yAxis: {
      type: 'category',
      data: data.timeMs.map((timeMs) => formatMeasure(timeMs, 0)),
      ...valueAxisStyle(colors, 'Slice start (ms)', 48),
      axisLabel: { color: colors.mutedText, interval: data.timeMs.length > 12 ? 1 : 0 },
      axisTick: { show: false },
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
          data: modeLines(data.frequencyHz, modes).map(({ index, label }) => ({ xAxis: index, name: label, label: { formatter: () => label } })),
        },
      },
    ],
  }
}
