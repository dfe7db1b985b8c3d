import pg from 'pg'
import { logger } from '../logger'

export interface PostgresListenerOptions {
  connectionString: string
  channel: string
  onNotice: (payload: string) => void
  /** Called after every successful LISTEN; `isReconnect` after a lost connection came back. */
  onConnected?: (isReconnect: boolean) => void
  /** A query on the connection this often finds a silently dead socket (TCP keep-alive alone may not). */
  healthCheckMs?: number
  /** Delay before reconnect attempt n (from 1): 0.5 s doubling to 10 s by default. */
  retryDelayMs?: (attempt: number) => number
}

export interface PostgresListener {
  isConnected: () => boolean
  /** Resolves true once listening (at once when it is), false after `timeoutMs` without. */
  whenConnected: (timeoutMs: number) => Promise<boolean>
  close: () => Promise<void>
}

const defaultRetryDelayMs = (attempt: number) => Math.min(500 * 2 ** (attempt - 1), 10_000)

/**
 * LISTEN on one dedicated connection (pooled connections cannot LISTEN), reconnecting for as long
 * as it runs: a database restart or a terminated backend costs the notifications sent while it was
 * away, which `onConnected(true)` lets the caller make up for. (A small own loop rather than a
 * package: the packages we looked at give up reconnecting after a few seconds, or never retry the
 * first connection.)
 */
export function listenToPostgres(options: PostgresListenerOptions): PostgresListener {
  const retryDelayMs = options.retryDelayMs ?? defaultRetryDelayMs
  let client: pg.Client | null = null
  let isClosed = false
  let hasConnected = false
  let attempt = 0
  let retryTimer: ReturnType<typeof setTimeout> | null = null
  let healthTimer: ReturnType<typeof setInterval> | null = null
  const connectedWaiters = new Set<() => void>()

  function scheduleReconnect(): void {
    if (isClosed || retryTimer) return
    attempt += 1
    retryTimer = setTimeout(() => {
      retryTimer = null
      void connect()
    }, retryDelayMs(attempt))
  }

  function drop(dropped: pg.Client, reason: unknown): void {
    if (client === dropped) {
      client = null
      if (healthTimer) clearInterval(healthTimer)
      healthTimer = null
      logger.warn({ err: reason }, 'notification listener lost its database connection; reconnecting')
    }
    dropped.removeAllListeners('notification')
    dropped.end().catch(() => {})
    scheduleReconnect()
  }

  async function connect(): Promise<void> {
    const next = new pg.Client({ connectionString: options.connectionString, keepAlive: true, application_name: 'ringdown-listener' })
    next.on('error', (error) => drop(next, error))
    next.on('end', () => drop(next, new Error('connection ended')))
    next.on('notification', (message) => {
      if (message.channel === options.channel && message.payload) options.onNotice(message.payload)
    })
    try {
      await next.connect()
      await next.query(`LISTEN ${pg.escapeIdentifier(options.channel)}`)
    } catch (error) {
      if (!isClosed && attempt % 10 === 0) logger.warn({ err: error }, 'notification listener cannot reach the database yet')
      drop(next, error)
      return
    }
    if (isClosed) {
      await next.end().catch(() => {})
      return
    }
    client = next
    attempt = 0
    healthTimer = setInterval(() => {
      next.query('SELECT 1').catch((error: unknown) => drop(next, error))
    }, options.healthCheckMs ?? 30_000)
    healthTimer.unref()
    options.onConnected?.(hasConnected)
    hasConnected = true
    for (const wake of connectedWaiters) wake()
    connectedWaiters.clear()
  }

  void connect()
  return {
    isConnected: () => client !== null,
    whenConnected(timeoutMs) {
      if (client) return Promise.resolve(true)
      return new Promise((resolve) => {
        const wake = () => {
          clearTimeout(timer)
          resolve(true)
        }
        const timer = setTimeout(() => {
          connectedWaiters.delete(wake)
          resolve(false)
        }, timeoutMs)
        connectedWaiters.add(wake)
      })
    },
    async close() {
      isClosed = true
      if (retryTimer) clearTimeout(retryTimer)
      if (healthTimer) clearInterval(healthTimer)
      const current = client
      client = null
      if (current) {
        current.removeAllListeners('end')
        await current.end().catch(() => {})
      }
    },
  }
}
