import type { App } from 'vue'
import { createPinia } from 'pinia'
import { router } from '@/router'
import { vuetify } from './vuetify'

/** Installs everything the app needs, in dependency order (the router's guards use Pinia). */
export function registerPlugins(app: App): void {
  app.use(createPinia())
  app.use(vuetify)
  app.use(router)
}
