import { z } from 'zod'
import { DEFAULT_QUEUE_PREFIX } from '../shared/jobs/analysisJob'

/** Environment validated once at start-up; nothing else reads process.env. */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (the start command sets it).'),
  REDIS_URL: z.string().min(1, 'REDIS_URL is required (the start command sets it).'),
  SESSION_SECRET: z.string().min(8).default('ringdown-development-secret'),
  /** Where an earlier version kept uploaded files; `npm run migrate` moves them into the bucket once. */
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
  /**
   * Object storage through the S3 API. Without S3_ENDPOINT the SDK's own endpoint for S3_REGION is
   * used; credentials come from the SDK's usual chain (AWS_ACCESS_KEY_ID/AWS_SECRET_ACCESS_KEY,
   * profile, instance role). The start and test commands run a local S3 fake and set all of these.
   */
  S3_ENDPOINT: z.preprocess((value) => (value === '' ? undefined : value), z.string().url('S3_ENDPOINT must be a URL such as http://127.0.0.1:56390').optional()),
  S3_BUCKET: z.string().regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, 'S3_BUCKET must be a valid bucket name (3–63 lower-case letters, digits, dots, hyphens).').default('ringdown'),
  S3_REGION: z.string().min(1).default('us-east-1'),
  /** Path-style addressing (http://host/bucket/key); default on when S3_ENDPOINT is set, as compatible servers need. */
  S3_FORCE_PATH_STYLE: z.enum(['0', '1']).optional(),
  /** BullMQ key prefix; keep the braces (a Redis Cluster hash tag) when changing it. */
  QUEUE_PREFIX: z.string().min(1).default(DEFAULT_QUEUE_PREFIX),
  /** Jobs one worker process runs at once (the analysis is CPU-bound: scale with processes). */
  WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(32).default(1),
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

/**
 * What a worker needs, and nothing more: the database, Redis, the bucket and its own
 * tuning, so a worker runs on any machine with only these set (no session secret, no mail).
 */
const workerEnvSchema = envSchema.pick({
  NODE_ENV: true,
  DATABASE_URL: true,
  REDIS_URL: true,
  S3_ENDPOINT: true,
  S3_BUCKET: true,
  S3_REGION: true,
  S3_FORCE_PATH_STYLE: true,
  QUEUE_PREFIX: true,
  WORKER_CONCURRENCY: true,
  WORKER_LOCK_DURATION_MS: true,
  WORKER_STALLED_INTERVAL_MS: true,
  LOG_LEVEL: true,
})

export type WorkerConfig = z.infer<typeof workerEnvSchema>

export function loadWorkerConfig(env: NodeJS.ProcessEnv = process.env): WorkerConfig {
  const parsed = workerEnvSchema.safeParse(env)
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`)
    throw new Error(`Invalid worker configuration:\n${lines.join('\n')}`)
  }
  return parsed.data
}
