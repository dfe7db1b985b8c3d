import { chartPalette, withAlpha, type ChartPalette } from './chartPalette'

/** Everything a chart option needs to look right in the current theme. */
export interface ChartColors {
  isDark: boolean
  palette: ChartPalette
  text: string
  mutedText: string
  axisLine: string
  splitLine: string
  surface: string
}

/** Chart colours from the Vuetify theme's surface and on-surface colours (hex). */
export function chartColorsFromTheme(theme: { dark: boolean; colors: Record<string, string | undefined> }): ChartColors {
  const onSurface = theme.colors['on-surface'] ?? (theme.dark ? '#e3eae9' : '#1b2424')
  return {
    isDark: theme.dark,
    palette: chartPalette(theme.dark),
    text: onSurface,
    mutedText: withAlpha(onSurface, 0.72),
    axisLine: withAlpha(onSurface, 0.45),
    splitLine: withAlpha(onSurface, theme.dark ? 0.12 : 0.09),
    surface: theme.colors.surface ?? (theme.dark ? '#172021' : '#ffffff'),
  }
}
