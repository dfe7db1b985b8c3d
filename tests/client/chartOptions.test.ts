import { describe, expect, it } from 'vitest'
import type { DecayCurve } from '@shared/types/analysis'
import type { TargetMask } from '@shared/room'
import { chartColorsFromTheme } from '@/components/charts/chartColors'
import { decayChartOption, FIT_RANGES_DB } from '@/components/charts/decayChartOption'
import { frequencyResponseOption } from '@/components/charts/frequencyResponseOption'
import { reverberationTargetOption } from '@/components/charts/reverberationTargetOption'
import { labelledFrequencyIndices, modeLines, waterfallOption } from '@/components/charts/waterfallOption'

const COLORS = chartColorsFromTheme({ dark: false, colors: { 'on-surface': '#1b2424', surface: '#ffffff' } })

// Loose views of the option objects, enough to read back what the builders set.
type AnyRecord = Record<string, any> // eslint-disable-line @typescript-eslint/no-explicit-any

describe('frequencyResponseOption', () => {
  it('returns a log axis from 20 Hz to 20 kHz with octave ticks when given a curve', () => {
    const option = frequencyResponseOption([{ name: 'Before', role: 'before', frequencyHz: [20, 1000, 20000], magnitudeDb: [-3, 0, -12] }], COLORS) as AnyRecord
    expect(option.xAxis.type).toBe('log')
    expect([option.xAxis.min, option.xAxis.max]).toEqual([20, 20000])
    expect(option.xAxis.axisLabel.customValues).toEqual([31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000])
    expect(option.xAxis.axisLabel.formatter(1000)).toBe('1k')
    expect(option.series[0].name).toBe('Before')
    expect(option.series[0].color).toBe(COLORS.palette.before)
    expect(option.toolbox.feature.saveAsImage.type).toBe('png')
    expect(option.aria.enabled).toBe(true)
    expect(option.aria.label.description).toContain('Before: lowest −12.0 dB at 20 kHz, highest 0.0 dB at 1 kHz')
  })
})

describe('decayChartOption', () => {
  const curve: DecayCurve = {
    centreHz: 500,
    timeMs: [0, 100, 200, 300],
    levelDb: [0, -20, -40, -60],
    fits: { EDT: [0, 0, 50, -10], T20: [25, -5, 125, -25], T30: [25, -5, 175, -35] },
    truncationMs: 280,
  }

  // Evaluation ranges: EDT 0 … −10 dB, T20 −5 … −25 dB, T30 −5 … −35 dB (ISO 3382-1:2009 3.4–3.5, ISO 3382-2:2008 cl. 6).
  it('returns each fit with its ISO 3382 evaluation range shaded when the curve has fits', () => {
    const option = decayChartOption([{ name: 'Bare room', role: 'before', curve }], ['EDT', 'T20', 'T30'], COLORS) as AnyRecord
    const t20 = option.series.find((s: AnyRecord) => s.name === 'T20 fit')
    expect(FIT_RANGES_DB.T20).toEqual([-5, -25])
    expect(t20.data).toEqual([
      [25, -5],
      [125, -25],
    ])
    expect(t20.markArea.data[0]).toEqual([
      { xAxis: 25, yAxis: -5 },
      { xAxis: 125, yAxis: -25 },
    ])
    const t30 = option.series.find((s: AnyRecord) => s.name === 'T30 fit')
    expect(t30.markArea.data[0][1]).toEqual({ xAxis: 175, yAxis: -35 })
    const edt = option.series.find((s: AnyRecord) => s.name === 'EDT fit')
    expect(edt.markArea.data[0][0]).toEqual({ xAxis: 0, yAxis: 0 })
  })

  it('returns the truncation point as a vertical line when it is known', () => {
    const option = decayChartOption([{ name: 'Bare room', role: 'before', curve }], ['T30'], COLORS) as AnyRecord
    expect(option.series[0].markLine.data).toEqual([{ xAxis: 280 }])
    expect(option.series.map((s: AnyRecord) => s.name)).toEqual(['Bare room', 'T30 fit'])
  })
})

describe('modeLines', () => {
  it('returns one line per bin, joining modes that share it, when modes coincide', () => {
    const lines = modeLines([20, 33, 42, 66, 84], [
      { frequencyHz: 33, label: 'a' },
      { frequencyHz: 66.1, label: 'b' },
      { frequencyHz: 65.9, label: 'c' },
      { frequencyHz: 500, label: 'outside' },
    ])
    expect(lines).toEqual([
      { index: 1, label: 'a' },
      { index: 3, label: 'b / c' },
    ])
  })
})

describe('labelledFrequencyIndices', () => {
  it('returns only ticks that fall on a bin when the grid is coarse', () => {
    // 30, 50, 63 … Hz have no bin within 0.05 octave of [20, 40, 80, 300]: they get no label.
    expect([...labelledFrequencyIndices([20, 40, 80, 300]).entries()]).toEqual([
      [0, 20],
      [1, 40],
      [2, 80],
      [3, 300],
    ])
  })
})

describe('waterfallOption', () => {
  it('returns a heatmap cell per slice and frequency when given waterfall data', () => {
    const data = { frequencyHz: [20, 40, 80], timeMs: [0, 20], levelDb: [[0, -3, -6], [-10, -70, -20]] }
    const option = waterfallOption(data, [], COLORS) as AnyRecord
    expect(option.series[0].type).toBe('heatmap')
    // Cells are [frequencyIndex, sliceIndex, levelDb], levels clamped at the −60 dB floor.
    expect(option.series[0].data).toContainEqual([1, 1, -60])
    expect(option.series[0].data).toHaveLength(6)
    expect(option.xAxis.axisLabel.formatter('40', 1)).toBe('40')
  })
})

describe('reverberationTargetOption', () => {
  const mask: TargetMask = {
    id: 'test',
    name: 'Test mask',
    kind: 'custom',
    citation: null,
    sourceNote: 'invented',
    notes: [],
    bands: [
      { centreHz: 125, minS: 0.2, maxS: 0.5, nominalS: null },
      { centreHz: 250, minS: 0.2, maxS: 0.4, nominalS: null },
      { centreHz: 500, minS: null, maxS: null, nominalS: null },
    ],
  }

  it('returns the mask as a lower line and a stacked band of height max − min when given a mask', () => {
    const option = reverberationTargetOption([{ name: 'After', role: 'after', bands: [{ centreHz: 125, reverberationTimeS: 0.3 }] }], mask, COLORS) as AnyRecord
    const [lower, band, measured] = option.series
    expect(lower.data).toEqual([
      [125, 0.2],
      [250, 0.2],
    ])
    expect(band.stack).toBe(lower.stack)
    expect(band.data[0][1]).toBeCloseTo(0.3, 12)
    expect(band.data[1][1]).toBeCloseTo(0.2, 12)
    expect(band.areaStyle).toBeDefined()
    expect(measured.data).toEqual([[125, 0.3]])
    expect(option.legend.data).toEqual(['After', 'Target: Test mask'])
  })
})
