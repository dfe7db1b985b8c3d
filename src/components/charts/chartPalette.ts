/** Who a curve belongs to; decides its colour and line style. */
export type SeriesRole = 'before' | 'after' | 'single' | 'predicted' | 'other'

export interface ChartPalette {
  before: string
  after: string
  single: string
  predicted: string
  /** Further curves, in turn, when several 'other' series are shown. */
  others: readonly string[]
  /** Fill of a target mask band (translucent). */
  maskFill: string
  maskLine: string
  /** Fitted decay lines; their evaluation ranges are shaded in the same colour. */
  fits: { EDT: string; T20: string; T30: string }
  marker: string
  /** Heatmap colour ramp, quiet to loud. */
  heatRamp: readonly string[]
}

// Ringdown's own colours: slate blue-grey "before", deep teal "after", warm amber for predictions
// and markers. Dark-theme variants are lighter so they keep contrast on the dark surface.
const light: ChartPalette = {
  before: '#5b6f86',
  after: '#0b7a7a',
  single: '#0b5d5e',
  predicted: '#c77d12',
  others: ['#8a4f9e', '#3f7f3a', '#b04a4a', '#2c6491'],
  maskFill: 'rgba(199, 125, 18, 0.14)',
  maskLine: 'rgba(154, 91, 0, 0.55)',
  fits: { EDT: '#8a4f9e', T20: '#5b6f86', T30: '#c77d12' },
  marker: '#9a5b00',
  heatRamp: ['#f4f1e8', '#c9e0dc', '#6fb3ad', '#1f7f80', '#0b4c5a', '#1d2a45'],
}

const dark: ChartPalette = {
  before: '#9fb2c8',
  after: '#5cc0bd',
  single: '#5cc0bd',
  predicted: '#f0b04d',
  others: ['#d0a2e0', '#9fd494', '#f09a9a', '#9ccaf0'],
  maskFill: 'rgba(240, 176, 77, 0.16)',
  maskLine: 'rgba(240, 176, 77, 0.6)',
  fits: { EDT: '#d0a2e0', T20: '#9fb2c8', T30: '#f0b04d' },
  marker: '#f0b04d',
  heatRamp: ['#111b1f', '#17383e', '#1f6566', '#3f9c95', '#a9d8c8', '#fff4d6'],
}

export function chartPalette(isDark: boolean): ChartPalette {
  return isDark ? dark : light
}

/** Colour of the n-th series with a role; 'other' series cycle through the extra colours. */
export function seriesColor(palette: ChartPalette, role: SeriesRole, otherIndex = 0): string {
  if (role === 'other') return palette.others[otherIndex % palette.others.length] as string
  return palette[role]
}

/** Predictions are dashed so they read as estimates even without colour. */
export function seriesLineType(role: SeriesRole): 'solid' | 'dashed' {
  return role === 'predicted' ? 'dashed' : 'solid'
}

/** "#0b5d5e" + 0.2 → "rgba(11, 93, 94, 0.2)"; other colour strings are returned as given. */
export function withAlpha(color: string, alpha: number): string {
  const match = /^#([0-9a-f]{6})$/i.exec(color)
  if (!match) return color
  const value = parseInt(match[1] as string, 16)
  return `rgba(${(value >> 16) & 255}, ${(value >> 8) & 255}, ${value & 255}, ${alpha})`
}
