import { Redis } from 'ioredis'
import type { Sequelize } from 'sequelize'
import { createSequelize } from '../../server/db/createSequelize'
import { createMigrator } from '../../server/db/createMigrator'
import { initModels } from '../../server/models'
import { loadConfig, type AppConfig } from '../../server/config'

/**
 * API and browser tests run against the real PostgreSQL and Redis that `npm run test:all` starts
 * (it exports DATABASE_URL and REDIS_URL). Run alone, they stop with this message.
 */
export function requireServiceUrls(): AppConfig {
  if (!process.env.DATABASE_URL || !process.env.REDIS_URL) {
    throw new Error('API tests need PostgreSQL and Redis: run `npm run test:all` (it starts both), or set DATABASE_URL and REDIS_URL.')
  }
  return loadConfig({ ...process.env, NODE_ENV: 'test', SIGN_IN_RATE_LIMIT: process.env.SIGN_IN_RATE_LIMIT ?? '1000' })
}

export interface TestServices {
  config: AppConfig
  sequelize: Sequelize
  redis: Redis
  close: () => Promise<void>
}

/** Connects, wipes the schema and migrates from scratch: each test file starts from an empty database. */
export async function startTestServices(overrides: Partial<AppConfig> = {}): Promise<TestServices> {
  const config = { ...requireServiceUrls(), ...overrides }
  const sequelize = createSequelize(config.DATABASE_URL)
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;')
  await createMigrator(sequelize).up()
  initModels(sequelize)
  const redis = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null })
  await redis.flushdb()
  return {
    config,
    sequelize,
    redis,
    close: async () => {
      await redis.quit()
      await sequelize.close()
    },
  }
}
