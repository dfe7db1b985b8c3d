import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import pg from 'pg'
import { createApp, type RingdownApp } from '../../server/app'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { ApiAgent } from '../helpers/apiAgent'

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

/** Ends every other backend of the test database, as a database restart or an operator would. */
async function terminateOtherBackends(): Promise<number> {
  const admin = new pg.Client({ connectionString: services.config.DATABASE_URL })
  await admin.connect()
  try {
    const result = await admin.query(
      'SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid()',
    )
    return result.rowCount ?? 0
  } finally {
    await admin.end()
  }
}

/** Until the pools have seen their sockets close (the error events arrive asynchronously). */
const settle = () => new Promise((resolve) => setTimeout(resolve, 300))

describe('a terminated database connection', () => {
  it('does not stop the server: the signed-in session and the health check answer on the next request', async () => {
    const agent = new ApiAgent(ringdown.app)
    const registered = await agent.post('/api/auth/register', { name: 'Night Shift', email: 'night@example.test', password: 'long-enough-password', workspaceName: 'Night Studio' })
    expect(registered.status).toBe(201)
    await agent.refreshCsrf()
    // Both the session store's pool and Sequelize's now hold idle connections.
    expect((await agent.get('/api/auth/me')).status).toBe(200)

    expect(await terminateOtherBackends()).toBeGreaterThanOrEqual(2)
    await settle()

    expect((await agent.get('/api/auth/me')).status).toBe(200)
    const health = await agent.get('/api/health')
    expect(health.status).toBe(200)
    expect(health.body).toMatchObject({ database: 'ok' })
  })

  it('keeps serving after the connections are terminated twice in a row', async () => {
    const agent = new ApiAgent(ringdown.app)
    expect((await agent.post('/api/auth/sign-in', { email: 'night@example.test', password: 'long-enough-password' })).status).toBe(200)
    for (let round = 0; round < 2; round += 1) {
      await terminateOtherBackends()
      await settle()
      expect((await agent.get('/api/auth/me')).status).toBe(200)
    }
  })
})
