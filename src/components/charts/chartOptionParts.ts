import type { ComposeOption } from 'echarts/core'
import type { HeatmapSeriesOption, LineSeriesOption } from 'echarts/charts'
import type {
  AriaComponentOption,
  GridComponentOption,
  LegendComponentOption,
  MarkAreaComponentOption,
  MarkLineComponentOption,
  ToolboxComponentOption,
  TooltipComponentOption,
  VisualMapComponentOption,
} from 'echarts/components'
import type { ChartColors } from './chartColors'

export type RingdownChartOption = ComposeOption<
  | LineSeriesOption
  | HeatmapSeriesOption
  | GridComponentOption
  | LegendComponentOption
  | TooltipComponentOption
  | ToolboxComponentOption
  | MarkLineComponentOption
  | MarkAreaComponentOption
  | VisualMapComponentOption
  | AriaComponentOption
>

/** Series names are user text (survey and position labels): escape them in tooltip HTML. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string)
}

/** Options every Ringdown chart shares: theme text, legend, tooltip box, PNG export, ARIA text. */
export function baseChartOption(colors: ChartColors, input: { description: string; fileName: string; hasLegend?: boolean }): RingdownChartOption {
  return {
    backgroundColor: 'transparent',
    animation: false,
    textStyle: { color: colors.text, fontFamily: "'Noto Sans', system-ui, sans-serif" },
    aria: { enabled: true, label: { description: input.description } },
    legend: { show: input.hasLegend ?? true, top: 0, left: 'center', right: 56, type: 'scroll', textStyle: { color: colors.text }, pageTextStyle: { color: colors.text } },
    tooltip: tooltipStyle(colors),
    toolbox: {
      right: 8,
      top: 0,
      iconStyle: { borderColor: colors.mutedText },
      feature: { saveAsImage: { title: 'Save as PNG', name: input.fileName, type: 'png', pixelRatio: 2, backgroundColor: colors.surface } },
    },
  }
}

/** The tooltip box in the theme's surface colour, triggered along the x axis. */
export function tooltipStyle(colors: ChartColors) {
  return {
    trigger: 'axis' as const,
    backgroundColor: colors.surface,
    borderColor: colors.axisLine,
    textStyle: { color: colors.text, fontSize: 12 },
    confine: true,
  }
}

/** A value axis styled for the theme, its name centred along it. */
export function valueAxisStyle(colors: ChartColors, name: string, nameGap: number) {
  return {
    name,
    nameLocation: 'middle' as const,
    nameGap,
    nameTextStyle: { color: colors.mutedText },
    axisLine: { show: true, lineStyle: { color: colors.axisLine } },
    axisTick: { lineStyle: { color: colors.axisLine } },
    axisLabel: { color: colors.mutedText },
    splitLine: { show: true, lineStyle: { color: colors.splitLine } },
  }
}

/** [min, max] of the finite values rounded outwards to a step (e.g. 10 dB); fallback if none. */
export function roundedRange(values: Iterable<number>, stepSize: number, fallback: [number, number]): [number, number] {
  let min = Infinity
  let max = -Infinity
  for (const value of values) {
    if (!Number.isFinite(value)) continue
    if (value < min) min = value
    if (value > max) max = value
  }
  if (min > max) return fallback
  const low = Math.floor(min / stepSize) * stepSize
  const high = Math.ceil(max / stepSize) * stepSize
  return low === high ? [low - stepSize, high + stepSize] : [low, high]
}

/** A tooltip row: the series' colour dot, its (escaped) name and a formatted value. */
export function tooltipRow(marker: unknown, seriesName: string | undefined, valueText: string): string {
  return `${typeof marker === 'string' ? marker : ''}${escapeHtml(seriesName ?? '')}: <b>${valueText}</b>`
}
