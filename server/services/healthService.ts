import type { Sequelize } from 'sequelize'
import type { Redis } from 'ioredis'
import type { HealthResponse } from '../../shared/api/health'

const PROBE_TIMEOUT_MS = 2000

function withTimeout<T>(promise: Promise<T>): Promise<T> {
  return Promise.race([promise, new Promise<T>((_, reject) => setTimeout(() => reject(new Error('timeout')), PROBE_TIMEOUT_MS))])
}

/** Reports whether PostgreSQL and Redis answer, each within two seconds. */
export async function checkHealth(sequelize: Sequelize, redis: Redis, version: string): Promise<HealthResponse> {
  const [database, redisState] = await Promise.all([
    withTimeout(sequelize.query('SELECT 1')).then(() => 'ok' as const, () => 'unreachable' as const),
    withTimeout(redis.ping()).then(() => 'ok' as const, () => 'unreachable' as const),
  ])
  return { status: database === 'ok' && redisState === 'ok' ? 'ok' : 'degraded', database, redis: redisState, version }
}
