import type { ComparisonDto } from '../../shared/api/results'
import { renderChartSvg } from './renderChartSvg'

// Our report palette: "before" slate blue-grey, "after" teal, further surveys amber and plum.
const SURVEY_COLOURS = ['#5b6b7f', '#0b7a75', '#c77d12', '#7a4d8c', '#3f7f3a', '#9a3b3b']
export const surveyColour = (index: number, count: number) => (index === count - 1 && count > 1 ? SURVEY_COLOURS[1]! : index === 0 ? SURVEY_COLOURS[0]! : SURVEY_COLOURS[index + 1]!)

const OCTAVE_TICKS_HZ = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000]
const hzLabel = (hz: number) => (hz >= 1000 ? `${hz / 1000}k` : String(hz))

/** The surveys' averaged magnitude responses on a log-frequency axis, dB (legend by survey key S1, S2 …). */
export function responseOverlaySvg(comparison: ComparisonDto): string {
  const count = comparison.surveys.length
  return renderChartSvg(
    {
      legend: { top: 0 },
      grid: { left: 50, right: 20, top: 30, bottom: 40 },
      xAxis: { type: 'log', min: 20, max: 20000, name: 'Hz', nameLocation: 'middle', nameGap: 25, axisLabel: { customValues: OCTAVE_TICKS_HZ, formatter: hzLabel }, axisTick: { customValues: OCTAVE_TICKS_HZ } },
      yAxis: { type: 'value', name: 'dB', scale: true },
      series: comparison.surveys.map((entry, index) => ({
        name: `S${index + 1}`,
        type: 'line',
        showSymbol: false,
        lineStyle: { width: 1.5, color: surveyColour(index, count) },
        itemStyle: { color: surveyColour(index, count) },
        data: (entry.summary.averagedResponse?.frequencyHz ?? []).map((f, i) => [f, entry.summary.averagedResponse!.magnitudeDb[i]]),
      })),
    },
    520,
    220,
  )
}

/** Reverberation time per band for each survey, over the target mask as a shaded band. */
export function reverberationOverlaySvg(comparison: ComparisonDto): string {
  const bands = comparison.differences.map((d) => d.centreHz)
  const count = comparison.surveys.length
  const target = comparison.target
  const lower = bands.map((hz) => target?.bands.find((b) => b.centreHz === hz)?.minS ?? null)
  const upper = bands.map((hz) => target?.bands.find((b) => b.centreHz === hz)?.maxS ?? null)
  const legendNames = [...(target ? ['Target'] : []), ...comparison.surveys.map((_, index) => `S${index + 1}`)]
  return renderChartSvg(
    {
      legend: { top: 0, data: legendNames },
      grid: { left: 50, right: 20, top: 30, bottom: 40 },
      xAxis: { type: 'category', data: bands.map(hzLabel), name: 'Hz', nameLocation: 'middle', nameGap: 25 },
      yAxis: { type: 'value', name: 's', min: 0 },
      series: [
        ...(target
          ? [
              { name: 'target low', type: 'line', stack: 'mask', data: lower, lineStyle: { opacity: 0 }, symbol: 'none', tooltip: { show: false } },
              { name: 'Target', type: 'line', stack: 'mask', data: upper.map((u, i) => (u !== null && lower[i] !== null ? u - lower[i]! : null)), lineStyle: { opacity: 0 }, symbol: 'none', areaStyle: { color: 'rgba(11,122,117,0.15)' }, itemStyle: { color: 'rgba(11,122,117,0.35)' } },
            ]
          : []),
        ...comparison.surveys.map((entry, index) => ({
          name: `S${index + 1}`,
          type: 'line',
          data: bands.map((hz) => entry.summary.readings.find((r) => r.centreHz === hz)?.reverberationTimeS ?? null),
          lineStyle: { width: 2, color: surveyColour(index, count) },
          itemStyle: { color: surveyColour(index, count) },
        })),
      ],
    },
    520,
    220,
  )
}
