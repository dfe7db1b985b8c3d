import { computed, type ComputedRef } from 'vue'
import { useTheme } from 'vuetify'
import { chartColorsFromTheme, type ChartColors } from './chartColors'

/** The chart colours of the current Vuetify theme; recomputed when the theme switches. */
export function useChartColors(): ComputedRef<ChartColors> {
  const theme = useTheme()
  return computed(() => {
    const current = theme.current.value
    // Theme colours are hex strings once Vuetify has parsed the theme; keep only those.
    const colors = Object.fromEntries(Object.entries(current.colors).filter((entry): entry is [string, string] => typeof entry[1] === 'string'))
    return chartColorsFromTheme({ dark: current.dark, colors })
  })
}
