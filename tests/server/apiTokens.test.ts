import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { createApp, type RingdownApp } from '../../server/app'
import { Activity, ApiToken, Membership, RoomShare } from '../../server/models'
import { hashToken } from '../../server/auth/singleUseToken'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import type { Role } from '../../shared/api/common'
import type { CreatedApiTokenDto } from '../../shared/api/apiTokens'

const RATE_LIMIT_PER_MINUTE = 40

let services: TestServices
let storageDir: string
let ringdown: RingdownApp
let a: WorkspaceFixture
let b: WorkspaceFixture
const sessions = {} as Record<Role, ApiAgent>

beforeAll(async () => {
  storageDir = await mkdtemp(path.join(tmpdir(), 'ringdown-tokens-'))
  services = await startTestServices({ STORAGE_DIR: storageDir, API_TOKEN_RATE_LIMIT: RATE_LIMIT_PER_MINUTE })
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Kappa')
  b = await createWorkspaceFixture('Lambda')
  // A's engineer also works in B: a token for A must still not reach B.
  await Membership.create({ workspaceId: b.workspace.id, userId: a.users.engineer.id, role: 'engineer' })
  // A token acts as a member with its role: a client or viewer token sees the rooms shared with its person.
  await RoomShare.create({ roomId: a.sharedRoom.id, userId: a.users.engineer.id })
  for (const role of ['owner', 'engineer', 'client', 'viewer'] as const) {
    sessions[role] = await signedInAgent(ringdown.app, a.users[role].email, FIXTURE_PASSWORD)
  }
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
  await rm(storageDir, { recursive: true, force: true })
})

async function createToken(owner: Role, body: { role: Role; name?: string; workspaceId?: number; expiresInDays?: number }): Promise<CreatedApiTokenDto> {
  const response = await sessions[owner].post('/api/tokens', { name: body.name ?? `${owner} script`, workspaceId: body.workspaceId ?? a.workspace.id, role: body.role, ...(body.expiresInDays ? { expiresInDays: body.expiresInDays } : {}) })
  expect(response.status, JSON.stringify(response.body)).toBe(201)
  return response.body as CreatedApiTokenDto
}

/** A plain client with no cookies: only the Authorization header identifies it. */
function withToken(secret: string) {
  const app = ringdown.app
  return {
    get: (url: string) => request(app).get(url).set('Authorization', `Bearer ${secret}`),
    post: (url: string, body: object = {}) => request(app).post(url).set('Authorization', `Bearer ${secret}`).send(body),
    patch: (url: string, body: object) => request(app).patch(url).set('Authorization', `Bearer ${secret}`).send(body),
    upload: (surveyId: number) =>
      request(app).post(`/api/surveys/${surveyId}/captures`).set('Authorization', `Bearer ${secret}`).field('kind', 'impulse').attach('file', Buffer.from(decayingNoiseWav()), 'rig-p1.wav'),
  }
}

describe('creating and listing API tokens', () => {
  it('shows the secret once and stores only its sha256', async () => {
    const created = await createToken('engineer', { role: 'engineer', name: 'Rig A' })
    expect(created.secret).toMatch(/^rdt_[A-Za-z0-9_-]{43}$/)
    const row = await ApiToken.findByPk(created.token.id)
    expect(row!.tokenHash).toBe(hashToken(created.secret))
    expect(JSON.stringify(row!.toJSON())).not.toContain(created.secret)
    const list = await sessions.engineer.get('/api/tokens')
    expect(JSON.stringify(list.body)).not.toContain(created.secret)
    expect(list.body).toEqual(expect.arrayContaining([expect.objectContaining({ id: created.token.id, name: 'Rig A', status: 'active', prefix: created.secret.slice(0, 12) })]))
  })

  it('expires after 90 days unless told otherwise', async () => {
    const created = await createToken('engineer', { role: 'viewer' })
    const days = (Date.parse(created.token.expiresAt) - Date.parse(created.token.createdAt)) / 86_400_000
    expect(days).toBeCloseTo(90, 2)
  })

  it('refuses a role above the creator’s own, and a workspace they are not in', async () => {
    const tooHigh = await sessions.viewer.post('/api/tokens', { name: 'x', workspaceId: a.workspace.id, role: 'engineer' })
    expect(tooHigh.status).toBe(403)
    expect(tooHigh.body.error.code).toBe('token-role-too-high')
    const elsewhere = await sessions.viewer.post('/api/tokens', { name: 'x', workspaceId: b.workspace.id, role: 'viewer' })
    expect(elsewhere.status).toBe(404)
  })

  it('answers 400 with the field for a missing name or an expiry past a year', async () => {
    const response = await sessions.engineer.post('/api/tokens', { name: '', workspaceId: a.workspace.id, role: 'viewer', expiresInDays: 400 })
    expect(response.status).toBe(400)
    expect(Object.keys(response.body.error.fields)).toEqual(expect.arrayContaining(['name', 'expiresInDays']))
  })
})

describe('Bearer authentication', () => {
  it('reaches only the token’s workspace: another workspace’s records are 404, as with sessions', async () => {
    const { secret } = await createToken('engineer', { role: 'engineer' })
    const api = withToken(secret)
    expect((await api.get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)
    expect((await sessions.engineer.get(`/api/rooms/${b.sharedRoom.id}`)).status).toBe(200) // the person may
    expect((await api.get(`/api/rooms/${b.sharedRoom.id}`)).status).toBe(404) // the token may not
    expect((await api.get(`/api/surveys/${b.sharedSurvey.id}/captures`)).status).toBe(404)
    expect((await api.get(`/api/workspaces/${b.workspace.id}/rooms`)).status).toBe(404)
    const me = await api.get('/api/auth/me')
    expect(me.body.memberships).toEqual([{ workspaceId: a.workspace.id, workspaceName: a.workspace.name, role: 'engineer' }])
  })

  it('acts with the token’s role, not the person’s: an engineer’s viewer token reads but cannot change', async () => {
    const { secret } = await createToken('engineer', { role: 'viewer' })
    const api = withToken(secret)
    expect((await api.get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)
    expect((await sessions.engineer.get(`/api/rooms/${a.privateRoom.id}`)).status).toBe(200)
    expect((await api.get(`/api/rooms/${a.privateRoom.id}`)).status).toBe(404) // viewers see shared rooms only
    expect((await api.patch(`/api/rooms/${a.sharedRoom.id}`, { name: 'Renamed by a viewer token' })).status).toBe(403)
    expect((await api.upload(a.sharedSurvey.id)).status).toBe(403)
  })

  it('refuses an upload with a viewer’s token', async () => {
    const { secret } = await createToken('viewer', { role: 'viewer' })
    const response = await withToken(secret).upload(a.sharedSurvey.id)
    expect(response.status).toBe(403)
  })

  it('accepts an upload with a client-role token and names the token in the room’s activity', async () => {
    const { secret } = await createToken('engineer', { role: 'client', name: 'Rig B' })
    const response = await withToken(secret).upload(a.sharedSurvey.id)
    expect(response.status, JSON.stringify(response.body)).toBe(202)
    // Written by the capture service after multer has read the body: the token scope got there.
    const line = await Activity.findOne({ where: { roomId: a.sharedRoom.id, action: 'capture.uploaded' }, order: [['id', 'DESC']] })
    expect(line!.summary).toContain('(with the API token "Rig B")')
    expect(line!.apiTokenId).not.toBeNull()
  })

  it('answers 401 with a reason for expired, revoked, unknown and malformed tokens', async () => {
    const expired = await createToken('engineer', { role: 'engineer', name: 'Old rig' })
    await ApiToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: expired.token.id } })
    const revoked = await createToken('engineer', { role: 'engineer', name: 'Lost laptop' })
    expect((await sessions.engineer.delete(`/api/tokens/${revoked.token.id}`)).body.status).toBe('revoked')
    const cases: [string, string][] = [
      [`Bearer ${expired.secret}`, 'token-expired'],
      [`Bearer ${revoked.secret}`, 'token-revoked'],
      [`Bearer rdt_${'x'.repeat(43)}`, 'invalid-token'],
      ['Basic dXNlcjpwYXNz', 'invalid-token'],
    ]
    for (const [header, code] of cases) {
      const response = await request(ringdown.app).get(`/api/rooms/${a.sharedRoom.id}`).set('Authorization', header)
      expect(response.status, header).toBe(401)
      expect(response.body.error.code).toBe(code)
      expect(response.headers['www-authenticate']).toMatch(/^Bearer /)
    }
  })

  it('records the last time a token was used', async () => {
    const created = await createToken('engineer', { role: 'viewer' })
    expect(created.token.lastUsedAt).toBeNull()
    await withToken(created.secret).get(`/api/rooms/${a.sharedRoom.id}`).expect(200)
    const row = await ApiToken.findByPk(created.token.id)
    expect(row!.lastUsedAt).not.toBeNull()
  })
})

describe('CSRF applies to cookie sessions only', () => {
  it('lets a token request change things without a CSRF header', async () => {
    const { secret } = await createToken('engineer', { role: 'engineer' })
    const response = await withToken(secret).post(`/api/rooms/${a.sharedRoom.id}/surveys`, { name: 'Scripted survey', measuredOn: '2026-04-01' })
    expect(response.status).toBe(201)
  })

  it('still refuses a cookie request without its CSRF header', async () => {
    const response = await sessions.engineer.agent.post(`/api/rooms/${a.sharedRoom.id}/surveys`).send({ name: 'No CSRF', measuredOn: '2026-04-01' })
    expect(response.status).toBe(403)
    expect(response.body.error.code).toBe('csrf')
  })
})

describe('what a token may never do', () => {
  it('cannot create or revoke tokens, or accept invitations: those need the person at a browser', async () => {
    const { secret, token } = await createToken('owner', { role: 'owner' })
    const api = withToken(secret)
    const attempts = [
      await api.post('/api/tokens', { name: 'Child', workspaceId: a.workspace.id, role: 'owner' }),
      await request(ringdown.app).delete(`/api/tokens/${token.id}`).set('Authorization', `Bearer ${secret}`),
      await api.post(`/api/invitations/${'a'.repeat(43)}/accept`),
      await api.post('/api/auth/sign-out'),
    ]
    for (const response of attempts) {
      expect(response.status).toBe(403)
      expect(response.body.error.code).toBe('session-only')
    }
  })
})

describe('per-token rate limit and audit trail', () => {
  it('answers 429 with Retry-After once a token goes over its requests per minute, and other tokens go on', async () => {
    const busy = await createToken('engineer', { role: 'viewer', name: 'Busy rig' })
    const calm = await createToken('engineer', { role: 'viewer', name: 'Calm rig' })
    const statuses: number[] = []
    for (let i = 0; i <= RATE_LIMIT_PER_MINUTE; i++) statuses.push((await withToken(busy.secret).get(`/api/rooms/${a.sharedRoom.id}`)).status)
    expect(statuses.slice(0, RATE_LIMIT_PER_MINUTE).every((status) => status === 200)).toBe(true)
    const over = await withToken(busy.secret).get(`/api/rooms/${a.sharedRoom.id}`)
    expect(over.status).toBe(429)
    expect(Number(over.headers['retry-after'])).toBeGreaterThan(0)
    expect((await withToken(calm.secret).get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)
    const trail = await sessions.engineer.get(`/api/tokens/${busy.token.id}/activity`)
    expect(trail.body.filter((line: { action: string }) => line.action === 'api-token.rate-limited')).toHaveLength(1)
  })

  it('lists the token’s changing and refused requests in its own trail, not its successful reads', async () => {
    const created = await createToken('engineer', { role: 'viewer', name: 'Audited rig' })
    const api = withToken(created.secret)
    await api.get(`/api/rooms/${a.sharedRoom.id}`).expect(200)
    await api.patch(`/api/rooms/${a.sharedRoom.id}`, { name: 'Nope' }).expect(403)
    await api.get(`/api/rooms/${b.sharedRoom.id}`).expect(404)
    const trail = await sessions.engineer.get(`/api/tokens/${created.token.id}/activity`)
    const summaries = (trail.body as { summary: string }[]).map((line) => line.summary)
    expect(summaries).toEqual(expect.arrayContaining([`PATCH /api/rooms/${a.sharedRoom.id} → 403`, `GET /api/rooms/${b.sharedRoom.id} → 404`]))
    expect(summaries.some((s) => s.startsWith('created the API token'))).toBe(true)
    expect(summaries).not.toContain(`GET /api/rooms/${a.sharedRoom.id} → 200`)
    expect((await sessions.viewer.get(`/api/tokens/${created.token.id}/activity`)).status).toBe(404) // someone else's token
  })
})

describe('membership changes limit or revoke tokens', () => {
  it('lowers a member’s tokens to a new, lower role and revokes them when the member leaves', async () => {
    const { secret, token } = await createToken('client', { role: 'client', name: 'Client rig' })
    const api = withToken(secret)
    expect((await api.upload(a.sharedSurvey.id)).status).toBe(202)

    expect((await sessions.owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.client.id}`, { role: 'viewer' })).status).toBe(200)
    expect((await ApiToken.findByPk(token.id))!.role).toBe('viewer')
    expect((await api.upload(a.sharedSurvey.id)).status).toBe(403)
    expect((await api.get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)

    expect((await sessions.owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.client.id}`, { role: 'client' })).status).toBe(200)
    expect((await ApiToken.findByPk(token.id))!.role).toBe('viewer') // never raised again by itself

    expect((await sessions.owner.delete(`/api/workspaces/${a.workspace.id}/members/${a.users.client.id}`)).status).toBe(204)
    const afterRemoval = await api.get(`/api/rooms/${a.sharedRoom.id}`)
    expect(afterRemoval.status).toBe(401)
    expect(afterRemoval.body.error.code).toBe('token-revoked')
    expect(afterRemoval.body.error.message).toContain('left the workspace')
  })
})
