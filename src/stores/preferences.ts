import { defineStore } from 'pinia'
import { ref, watch } from 'vue'
import { LENGTH_UNITS, type LengthUnit } from '@/utils/lengthUnits'
import { STORAGE_KEYS, readStorage, writeStorage } from '@/utils/storage'

export type ThemeName = 'light' | 'dark'

function storedLengthUnit(): LengthUnit {
  const stored = readStorage(STORAGE_KEYS.lengthUnit)
  return LENGTH_UNITS.find((unit) => unit === stored) ?? 'm'
}

function storedTheme(): ThemeName {
  return readStorage(STORAGE_KEYS.theme) === 'dark' ? 'dark' : 'light'
}

/** Per-browser choices: unit for dimensions and the colour theme. Remembered in localStorage. */
export const usePreferencesStore = defineStore('preferences', () => {
  const lengthUnit = ref<LengthUnit>(storedLengthUnit())
  const themeName = ref<ThemeName>(storedTheme())

  watch(lengthUnit, (unit) => writeStorage(STORAGE_KEYS.lengthUnit, unit))
  watch(themeName, (name) => writeStorage(STORAGE_KEYS.theme, name))

  function toggleTheme(): void {
    themeName.value = themeName.value === 'dark' ? 'light' : 'dark'
  }

  return { lengthUnit, themeName, toggleTheme }
})
