import express, { type Express } from 'express'
import session from 'express-session'
import connectPgSimple from 'connect-pg-simple'
import helmet from 'helmet'
import compression from 'compression'
import { pinoHttp } from 'pino-http'
import pg from 'pg'
import { csrfSync } from 'csrf-sync'
import { existsSync } from 'node:fs'
import path from 'node:path'
import type { Sequelize } from 'sequelize'
import type { Redis } from 'ioredis'
import type { AppConfig } from './config'
import { logger } from './logger'
import { configurePassport } from './auth/configurePassport'
import { authRouter } from './routes/authRouter'
import { workspacesRouter } from './routes/workspacesRouter'
import { roomsRouter } from './routes/roomsRouter'
import { surveysRouter } from './routes/surveysRouter'
import { capturesRouter } from './routes/capturesRouter'
import { resultsRouter } from './routes/resultsRouter'
import { roomModelRouter } from './routes/roomModelRouter'
import { invitationsRouter } from './routes/invitationsRouter'
import { reportInputsRouter } from './routes/reportInputsRouter'
import { surveyEventsRouter } from './routes/surveyEventsRouter'
import { createSurveyEventHub, type SurveyEventHub } from './events/surveyEventHub'
import { apiTokensRouter } from './routes/apiTokensRouter'
import { openApiRouter } from './routes/openApiRouter'
import { apiTokenAuthentication, exceptApiTokenRequests } from './middleware/apiTokenAuth'
import { createSmtpMailer, type Mailer } from './mail/mailer'
import { readFakeInbox } from './mail/fakeSmtpInbox'
import { createAnalysisQueue, type AnalysisQueue } from './queue/analysisQueue'
import { createObjectStore, type ObjectStore } from './storage/createObjectStore'
import { errorHandler, notFoundHandler } from './middleware/errorHandler'
import { checkHealth } from './services/healthService'
import { initModels } from './models'
import { NotFoundError } from './errors'

export interface AppDependencies {
  config: AppConfig
  sequelize: Sequelize
  redis: Redis
  /** Folder with the built client; served with an SPA fallback when it exists. */
  clientDir?: string
  /** Defaults to a BullMQ queue on `redis`. */
  queue?: AnalysisQueue
  /** Defaults to SMTP_URL, else the local fake inbox on FAKE_SMTP_PORT. */
  mailer?: Mailer
  /** Defaults to the bucket the S3_* settings name. */
  store?: ObjectStore
  /** Live status streams; defaults to one fed by the database's change notifications. */
  events?: SurveyEventHub
}

export const APP_VERSION = '0.1.0'

function isLoopback(address: string): boolean {
  return address === 'localhost' || address === '::1' || address.startsWith('127.') || address.startsWith('::ffff:127.')
}

export interface RingdownApp {
  app: Express
  queue: AnalysisQueue
  store: ObjectStore
  events: SurveyEventHub
  /** Closes what the app itself opened (the session store's pool, the queue). */
  close: () => Promise<void>
}

export function createApp({
  config,
  sequelize,
  redis,
  clientDir = path.resolve('dist'),
  queue = createAnalysisQueue(redis, { prefix: config.QUEUE_PREFIX }),
  mailer = createSmtpMailer(config.SMTP_URL ?? `smtp://127.0.0.1:${config.FAKE_SMTP_PORT}`, config.MAIL_FROM),
  store = createObjectStore(config),
  events = createSurveyEventHub({ databaseUrl: config.DATABASE_URL }),
}: AppDependencies): RingdownApp {
  initModels(sequelize)
  const mail = { mailer, publicUrl: config.PUBLIC_URL ?? `http://${config.HOST}:${config.PORT}` }
  const app = express()
  const isSecure = config.SECURE_COOKIES === '1'
  if (config.TRUST_PROXY === '1') app.set('trust proxy', 1)
  app.disable('x-powered-by')
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Vuetify writes its theme into a <style> element at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'media-src': ["'self'", 'blob:'],
          'upgrade-insecure-requests': isSecure ? [] : null,
        },
      },
    }),
  )
  if (config.NODE_ENV !== 'test') app.use(
      pinoHttp({
        logger,
        autoLogging: { ignore: (req) => req.url === '/api/health' },
        serializers: { req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }), res: (res: { statusCode: number }) => ({ status: res.statusCode }) },
      }),
    )
  // Live status streams must not be buffered by the compressor.
  app.use(compression({ filter: (req, res) => req.headers.accept !== 'text/event-stream' && compression.filter(req, res) }))
  app.use(express.json({ limit: '1mb' }))

  const sessionPool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5, application_name: 'ringdown-sessions' })
  // An idle client whose backend goes away (database restart, pg_terminate_backend) makes the pool
  // emit 'error'; unhandled, that event ends the process. The pool has already dropped the client
  // and opens a new one for the next request, so logging is all that is left to do.
  sessionPool.on('error', (error) => logger.warn({ err: error }, 'session store lost an idle database connection'))
  const PgStore = connectPgSimple(session)
  app.use(
    session({
      name: 'ringdown.sid',
      secret: config.SESSION_SECRET,
      store: new PgStore({ pool: sessionPool, tableName: 'sessions', createTableIfMissing: false }),
      resave: false,
      saveUninitialized: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: isSecure, maxAge: 14 * 24 * 3600 * 1000 },
    }),
  )
  const passport = configurePassport()
  app.use(passport.session())
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => req.headers['x-csrf-token'] as string | undefined,
  })

  app.get('/api/health', async (_req, res) => {
    const health = await checkHealth(sequelize, redis, APP_VERSION)
    res.status(health.status === 'ok' ? 200 : 503).json(health)
  })
  app.use('/api', apiTokenAuthentication({ requestsPerMinute: config.API_TOKEN_RATE_LIMIT }))
  app.use('/api', exceptApiTokenRequests(csrfSynchronisedProtection))
  app.use(
    '/api/auth',
    authRouter({ sequelize, signInLimitPerWindow: config.SIGN_IN_RATE_LIMIT, generateCsrfToken: (req) => generateToken(req as express.Request), mail }),
  )
  app.use('/api/workspaces', workspacesRouter())
  app.use('/api/rooms', roomsRouter({ store }))
  app.use('/api', capturesRouter({ store, uploadLimitMb: config.UPLOAD_LIMIT_MB, queue }))
  app.use('/api', resultsRouter({ queue }))
  app.use('/api', roomModelRouter())
  app.use('/api', invitationsRouter(mail))
  app.use('/api', reportInputsRouter({ queue }))
  app.use('/api', surveyEventsRouter(events))
  if (!config.SMTP_URL && isLoopback(config.HOST)) {
    // The development mailbox: only while mail goes to the local fake inbox, the server listens on
    // loopback and the request comes from this machine (it shows reset links, so never further).
    app.get('/api/dev/mailbox', async (req, res) => {
      if (!isLoopback(req.socket.remoteAddress ?? '')) throw new NotFoundError('That API route')
      res.json(await readFakeInbox(config.MAIL_DIR))
    })
  }
  app.use('/api/surveys', surveysRouter({ store }))
  app.use('/api/tokens', apiTokensRouter())
  app.use('/api', openApiRouter(app, APP_VERSION))
  app.use('/api', notFoundHandler)

  if (existsSync(path.join(clientDir, 'index.html'))) {
    // Files under assets/ carry a content hash in their names: cache them for a year; index.html
    // names the current hashes, so it is always revalidated.
    app.use('/assets', express.static(path.join(clientDir, 'assets'), { index: false, maxAge: '1y', immutable: true }))
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }))
    app.get(/^\/(?!api\/).*/, (_req, res) => res.sendFile(path.join(clientDir, 'index.html'), { headers: { 'Cache-Control': 'no-cache' } }))
  }
  app.use(errorHandler)
  return { app, queue, store, events, close: async () => { mailer.close(); await Promise.allSettled([events.close(), sessionPool.end(), queue.close()]) } }
}
