import type { ListenerScan } from '@shared/room'
import type { ChartColors } from './charts/chartColors'
import { baseChartOption, tooltipRow, tooltipStyle, valueAxisStyle, type RingdownChartOption } from './charts/chartOptionParts'
import { formatMeasure } from '@/utils/formatMeasure'

export function describeListenerScan(scan: ListenerScan, listenerXM: number): string {
  const best = scan.positions[scan.bestIndex]
  if (!best) return 'Listener scan: no positions.'
  return `Bass smoothness along the room length, standard deviation of the predicted 30–200 Hz level in dB (lower is smoother). Smoothest at ${formatMeasure(best.listener.xM, 2, 'm')} from the front wall (${formatMeasure(best.smoothnessDb, 1, 'dB')}); listener now at ${formatMeasure(listenerXM, 2, 'm')}.`
}

/** Smoothness (dB) against distance from the front wall, the smoothest spot and the listener marked. */
export function listenerScanOption(scan: ListenerScan, listenerXM: number, colors: ChartColors): RingdownChartOption {
  const { palette } = colors
  const best = scan.positions[scan.bestIndex]
  const marks = [
    ...(best ? [{ xAxis: best.listener.xM, lineStyle: { color: palette.after, type: 'solid' as const, width: 2 }, label: { formatter: `smoothest ${formatMeasure(best.listener.xM, 2, 'm')}`, color: palette.after } }] : []),
    { xAxis: listenerXM, lineStyle: { color: palette.marker, type: 'dashed' as const }, label: { formatter: 'listener', color: palette.marker, position: 'insideEndBottom' as const } },
  ]
  const xs = scan.positions.map((p) => p.listener.xM)
  return {
    ...baseChartOption(colors, { description: describeListenerScan(scan, listenerXM), fileName: 'listener-scan', hasLegend: false }),
    grid: { left: 64, right: 24, top: 36, bottom: 52 },
    xAxis: { type: 'value', min: Math.floor(Math.min(...xs, listenerXM) * 10) / 10, max: Math.ceil(Math.max(...xs, listenerXM) * 10) / 10, ...valueAxisStyle(colors, 'Listener distance from the front wall (m)', 30) },
    yAxis: { type: 'value', min: 0, ...valueAxisStyle(colors, 'Unevenness (dB)', 44) },
    tooltip: {
      ...tooltipStyle(colors),
      formatter: (params: unknown) => {
        const rows = params as { marker?: unknown; seriesName?: string; value: [number, number] }[]
        const head = rows[0]
        return head ? [`${formatMeasure(head.value[0], 2, 'm')} from the front wall`, ...rows.map((r) => tooltipRow(r.marker, r.seriesName, formatMeasure(r.value[1], 1, 'dB')))].join('<br/>') : ''
      },
    },
    series: [
      {
        type: 'line',
        name: 'Unevenness 30–200 Hz',
        data: scan.positions.map((p) => [p.listener.xM, p.smoothnessDb]),
        color: palette.predicted,
        symbol: 'circle',
        symbolSize: 6,
        lineStyle: { width: 2, type: 'dashed' },
        emphasis: { disabled: true },
        markLine: { silent: true, symbol: 'none', data: marks },
      },
    ],
  }
}
