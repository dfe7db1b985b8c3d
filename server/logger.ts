import { pino } from 'pino'

/** One logger for server and worker; level from LOG_LEVEL (read here, before config, for scripts too). */
export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
  base: { app: 'ringdown' },
})
