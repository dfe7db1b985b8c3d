import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request from 'supertest'
import { createApp, type RingdownApp } from '../../server/app'
import { Membership, User, Workspace } from '../../server/models'
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

const newUser = { name: 'New Person', email: 'New.Person@Example.test', password: 'long-enough-password', workspaceName: 'New Studio' }

describe('registration', () => {
  it('creates a user and a workspace they own, and signs them in', async () => {
    const agent = new ApiAgent(ringdown.app)
    const response = await agent.post('/api/auth/register', newUser)
    expect(response.status).toBe(201)
    expect(response.body.user.email).toBe('new.person@example.test')
    expect(response.body.memberships).toEqual([expect.objectContaining({ workspaceName: 'New Studio', role: 'owner' })])
    await agent.refreshCsrf()
    expect((await agent.get('/api/auth/me')).status).toBe(200)
    const stored = await User.findOne({ where: { email: 'new.person@example.test' } })
    expect(stored!.passwordHash).not.toContain(newUser.password)
    expect(stored!.passwordHash).toMatch(/^\$2[aby]\$/)
  })

  it('returns 409 email-taken when the e-mail is registered already', async () => {
    const response = await new ApiAgent(ringdown.app).post('/api/auth/register', newUser)
    expect(response.status).toBe(409)
    expect(response.body.error.code).toBe('email-taken')
  })

  it('returns 400 with field messages and writes nothing when the body is invalid', async () => {
    const usersBefore = await User.count()
    const workspacesBefore = await Workspace.count()
    const response = await new ApiAgent(ringdown.app).post('/api/auth/register', { name: '', email: 'not-an-email', password: 'short', workspaceName: '' })
    expect(response.status).toBe(400)
    expect(response.body.error.code).toBe('validation')
    expect(Object.keys(response.body.error.fields)).toEqual(expect.arrayContaining(['name', 'email', 'password', 'workspaceName']))
    expect(await User.count()).toBe(usersBefore)
    expect(await Workspace.count()).toBe(workspacesBefore)
  })
})

describe('sign-in', () => {
  it('returns 401 invalid-credentials for a wrong password', async () => {
    const response = await new ApiAgent(ringdown.app).post('/api/auth/sign-in', { email: newUser.email, password: 'wrong-password' })
    expect(response.status).toBe(401)
    expect(response.body.error.code).toBe('invalid-credentials')
  })

  it('regenerates the session id at sign-in and sets an httpOnly SameSite cookie', async () => {
    const agent = new ApiAgent(ringdown.app)
    const before = await agent.agent.get('/api/auth/csrf')
    const cookieBefore = String(before.headers['set-cookie'])
    const token = before.body.csrfToken as string
    const response = await agent.agent.post('/api/auth/sign-in').set('x-csrf-token', token).send({ email: newUser.email, password: newUser.password })
    expect(response.status).toBe(200)
    const cookieAfter = String(response.headers['set-cookie'])
    expect(cookieAfter).toMatch(/ringdown\.sid=/)
    expect(cookieAfter).toMatch(/HttpOnly/)
    expect(cookieAfter).toMatch(/SameSite=Lax/)
    expect(cookieAfter.split(';')[0]).not.toBe(cookieBefore.split(';')[0])
  })

  it('signs out and then answers 401 on /me', async () => {
    const agent = new ApiAgent(ringdown.app)
    await agent.signIn(newUser.email, newUser.password)
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204)
    const me = await agent.get('/api/auth/me')
    expect(me.status).toBe(401)
    expect(me.body.error.code).toBe('unauthenticated')
  })
})

describe('CSRF protection', () => {
  it('refuses a state-changing request without the token with 403 csrf', async () => {
    const response = await request(ringdown.app).post('/api/auth/sign-in').send({ email: newUser.email, password: newUser.password })
    expect(response.status).toBe(403)
    expect(response.body.error.code).toBe('csrf')
  })

  it('refuses a token from another session', async () => {
    const other = new ApiAgent(ringdown.app)
    const foreignToken = await other.refreshCsrf()
    const victim = new ApiAgent(ringdown.app)
    await victim.signIn(newUser.email, newUser.password)
    const response = await victim.agent.post('/api/auth/sign-out').set('x-csrf-token', foreignToken)
    expect(response.status).toBe(403)
  })
})

describe('sign-in rate limit', () => {
  it('answers 429 rate-limited after the configured number of attempts', async () => {
    const limited = createApp({ ...services, config: { ...services.config, SIGN_IN_RATE_LIMIT: 3 } })
    const agent = new ApiAgent(limited.app)
    const statuses: number[] = []
    for (let attempt = 0; attempt < 4; attempt++) {
      statuses.push((await agent.post('/api/auth/sign-in', { email: 'someone@example.test', password: 'guess' })).status)
    }
    expect(statuses).toEqual([401, 401, 401, 429])
    await limited.close()
  })
})

describe('security headers', () => {
  it('sends helmet headers and never a stack trace on unknown routes', async () => {
    const response = await request(ringdown.app).get('/api/no-such-route')
    expect(response.status).toBe(404)
    expect(response.headers['x-content-type-options']).toBe('nosniff')
    expect(response.headers['content-security-policy']).toContain("default-src 'self'")
    expect(response.headers['x-powered-by']).toBeUndefined()
    expect(JSON.stringify(response.body)).not.toMatch(/at .*\.ts:\d+/)
  })

  it('returns 400 invalid-json for a malformed body', async () => {
    const agent = new ApiAgent(ringdown.app)
    const token = await agent.refreshCsrf()
    const response = await agent.agent.post('/api/auth/sign-in').set('x-csrf-token', token).set('content-type', 'application/json').send('{"email":')
    expect(response.status).toBe(400)
    expect(response.body.error.code).toBe('invalid-json')
  })
})

describe('membership of a new workspace', () => {
  it('stores exactly one owner membership for the registering user', async () => {
    const user = await User.findOne({ where: { email: 'new.person@example.test' } })
    expect(await Membership.count({ where: { userId: user!.id, role: 'owner' } })).toBe(1)
  })
})
