import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request from 'supertest'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { startTestServices, type TestServices } from '../helpers/testServices'

let services: TestServices
let ringdown: RingdownApp

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

describe('GET /api/health', () => {
  it('reports database and Redis reachable', async () => {
    const response = await request(ringdown.app).get('/api/health')
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({ status: 'ok', database: 'ok', redis: 'ok' })
  })

  it('reports Redis unreachable with 503 when Redis does not answer', async () => {
    // Port 1 on loopback: nothing listens there, so the ping fails fast.
    const deadRedis = new Redis('redis://127.0.0.1:1', { maxRetriesPerRequest: 0, lazyConnect: true, retryStrategy: () => null })
    deadRedis.on('error', () => {})
    const degraded = createApp({ ...services, redis: deadRedis })
    const response = await request(degraded.app).get('/api/health')
    expect(response.status).toBe(503)
    expect(response.body).toMatchObject({ status: 'degraded', database: 'ok', redis: 'unreachable' })
    await degraded.close()
    deadRedis.disconnect()
  })
})
