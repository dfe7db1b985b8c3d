import { createVuetify, type ThemeDefinition } from 'vuetify'
import { aliases, mdi } from 'vuetify/iconsets/mdi-svg'
import 'vuetify/styles'

// Ringdown's own palette: deep teal for action, warm amber as the accent, slate blue-grey for
// "before" curves; paper-like surfaces so pages read like a report.
const light: ThemeDefinition = {
  dark: false,
  colors: {
    background: '#f6f5f1',
    surface: '#ffffff',
    'surface-variant': '#e6ebea',
    'on-surface-variant': '#34403f',
    primary: '#0b5d5e',
    secondary: '#55697d',
    accent: '#c77d12',
    error: '#b3261e',
    warning: '#9a5b00',
    info: '#2c6491',
    success: '#2d7452',
    'on-background': '#1b2424',
    'on-surface': '#1b2424',
  },
  variables: { 'border-color': '#1b2424', 'border-opacity': 0.14 },
}

const dark: ThemeDefinition = {
  dark: true,
  colors: {
    background: '#101617',
    surface: '#172021',
    'surface-variant': '#253133',
    'on-surface-variant': '#cbd6d5',
    primary: '#5cc0bd',
    secondary: '#97abbd',
    accent: '#f0b04d',
    error: '#f2b8b5',
    warning: '#f0b04d',
    info: '#9ccaf0',
    success: '#87d1a8',
    'on-background': '#e3eae9',
    'on-surface': '#e3eae9',
  },
  variables: { 'border-color': '#e3eae9', 'border-opacity': 0.16 },
}

export const vuetify = createVuetify({
  theme: { defaultTheme: 'light', themes: { light, dark } },
  icons: { defaultSet: 'mdi', aliases, sets: { mdi } },
  defaults: {
    VTextField: { variant: 'outlined', density: 'comfortable', color: 'primary' },
    VTextarea: { variant: 'outlined', density: 'comfortable', color: 'primary' },
    VSelect: { variant: 'outlined', density: 'comfortable', color: 'primary' },
    VCard: { variant: 'flat', border: true, rounded: 'lg' },
    VBtn: { rounded: 'lg' },
    VDataTable: { hover: true },
    VAlert: { variant: 'tonal', rounded: 'lg' },
  },
})
