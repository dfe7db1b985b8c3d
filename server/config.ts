import { z } from 'zod'

/** Environment validated once at start-up; nothing else reads process.env. */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (the start command sets it).'),
  REDIS_URL: z.string().min(1, 'REDIS_URL is required (the start command sets it).'),
  SESSION_SECRET: z.string().min(8).default('ringdown-development-secret'),
  STORAGE_DIR: z.string().default('.data/files'),
  /** Set when the app is served over TLS (directly or behind a proxy): cookies become Secure. */
  TRUST_PROXY: z.enum(['0', '1']).default('0'),
  SECURE_COOKIES: z.enum(['0', '1']).default('0'),
  /** Largest accepted upload, MB. */
  UPLOAD_LIMIT_MB: z.coerce.number().positive().default(250),
  /** BullMQ job lock and stalled-job check: how soon a killed worker's job is picked up again. */
  WORKER_LOCK_DURATION_MS: z.coerce.number().int().min(500).default(30_000),
  WORKER_STALLED_INTERVAL_MS: z.coerce.number().int().min(500).default(30_000),
  /** Real SMTP server for outgoing mail; without it mail goes to the local fake inbox (MAIL_DIR). */
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Ringdown <no-reply@ringdown.invalid>'),
  MAIL_DIR: z.string().default('.data/mail'),
  /** Loopback port of the fake SMTP inbox the server starts when SMTP_URL is not set. */
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(56025),
  /** The address people reach the product at, for links in e-mails; default http://HOST:PORT. */
  PUBLIC_URL: z.string().optional(),
  SIGN_IN_RATE_LIMIT: z.coerce.number().int().positive().default(10),
  /** Requests per minute one API token may make (uploads and status polls of a measuring rig). */
  API_TOKEN_RATE_LIMIT: z.coerce.number().int().positive().default(600),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
})

export type AppConfig = z.infer<typeof envSchema>

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env)
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`)
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`)
  }
  return parsed.data
}
