import { randomBytes } from 'node:crypto'
import { DeleteBucketCommand } from '@aws-sdk/client-s3'
import { Redis } from 'ioredis'
import type { Sequelize } from 'sequelize'
import { createSequelize } from '../../server/db/createSequelize'
import { createMigrator } from '../../server/db/createMigrator'
import { initModels } from '../../server/models'
import { loadConfig, type AppConfig } from '../../server/config'
import { createObjectStore, type ObjectStore } from '../../server/storage/createObjectStore'

/**
 * API and browser tests run against the real PostgreSQL, Redis and local S3 fake that
 * `npm run test:all` starts (it exports DATABASE_URL, REDIS_URL and S3_ENDPOINT with the fake's
 * credentials). Run alone, they stop with this message.
 */
export function requireServiceUrls(): AppConfig {
  if (!process.env.DATABASE_URL || !process.env.REDIS_URL || !process.env.S3_ENDPOINT) {
    throw new Error('API tests need PostgreSQL, Redis and the local S3 fake: run `npm run test:all` (it starts them), or set DATABASE_URL, REDIS_URL and S3_ENDPOINT (with AWS_ACCESS_KEY_ID/AWS_SECRET_ACCESS_KEY).')
  }
  return loadConfig({ ...process.env, NODE_ENV: 'test', SIGN_IN_RATE_LIMIT: process.env.SIGN_IN_RATE_LIMIT ?? '1000' })
}

export interface TestServices {
  config: AppConfig
  sequelize: Sequelize
  redis: Redis
  /** A bucket of this test file's own, empty at the start. */
  store: ObjectStore
  /** Every key in the test file's bucket, sorted. */
  objectKeys: (prefix?: string) => Promise<string[]>
  close: () => Promise<void>
}

/** Removes every object, then the bucket itself. */
async function deleteBucket(store: ObjectStore): Promise<void> {
  const keys: string[] = []
  for await (const object of store.list('')) keys.push(object.key)
  await store.remove(keys)
  await store.client.send(new DeleteBucketCommand({ Bucket: store.bucket }))
}

/**
 * Connects, wipes the schema and migrates from scratch, and creates a fresh bucket: each test
 * file starts from an empty database and empty storage.
 */
export async function startTestServices(overrides: Partial<AppConfig> = {}): Promise<TestServices> {
  const bucket = `ringdown-test-${process.pid}-${randomBytes(4).toString('hex')}`
  const config = { ...requireServiceUrls(), S3_BUCKET: bucket, ...overrides }
  const sequelize = createSequelize(config.DATABASE_URL)
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;')
  await createMigrator(sequelize).up()
  initModels(sequelize)
  const redis = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null })
  await redis.flushdb()
  const store = createObjectStore(config)
  await store.ensureBucket()
  return {
    config,
    sequelize,
    redis,
    store,
    objectKeys: async (prefix = '') => {
      const keys: string[] = []
      for await (const object of store.list(prefix)) keys.push(object.key)
      return keys.sort()
    },
    close: async () => {
      await deleteBucket(store).catch(() => {})
      store.close()
      await redis.quit()
      await sequelize.close()
    },
  }
}
