import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp, type RingdownApp } from '../../server/app'
import { Room, Survey } from '../../server/models'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let ringdown: RingdownApp
let a: WorkspaceFixture
let owner: ApiAgent

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Gamma')
  owner = await signedInAgent(ringdown.app, a.users.owner.email, FIXTURE_PASSWORD)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

async function counts() {
  return { rooms: await Room.count(), surveys: await Survey.count() }
}

async function expectRejected(method: 'post' | 'patch' | 'get' | 'delete', url: string, body: unknown, field?: string) {
  const before = await counts()
  const response = await owner.send(method, url, body)
  expect(response.status, `${method} ${url} ${JSON.stringify(body)}`).toBe(400)
  expect(response.body.error.code).toBe('validation')
  expect(typeof response.body.error.message).toBe('string')
  if (field) expect(Object.keys(response.body.error.fields ?? {})).toContain(field)
  expect(await counts()).toEqual(before)
}

describe('room validation', () => {
  const url = () => `/api/workspaces/${a.workspace.id}/rooms`
  it.each([
    [{ use: 'control-room', volumeM3: 30 }, 'name'],
    [{ name: 'R', use: 'spaceship', volumeM3: 30 }, 'use'],
    [{ name: 'R', use: 'other', lengthM: -4, widthM: 3, heightM: 2.5 }, 'lengthM'],
    [{ name: 'R', use: 'other', lengthM: '4', widthM: 3, heightM: 2.5 }, 'lengthM'],
    [{ name: 'R', use: 'other', lengthM: 4, widthM: 3 }, 'lengthM'],
    [{ name: 'R', use: 'other', volumeM3: 0 }, 'volumeM3'],
    [{ name: 'R'.repeat(121), use: 'other', volumeM3: 30 }, 'name'],
    [{ name: 'R', use: 'other', lengthM: 500, widthM: 3, heightM: 2.5 }, 'lengthM'],
  ])('rejects %j on create with a message for %s', async (body, field) => {
    await expectRejected('post', url(), body, field)
  })

  it('rejects an empty update and an update that removes the size', async () => {
    await expectRejected('patch', `/api/rooms/${a.sharedRoom.id}`, {})
    const response = await owner.patch(`/api/rooms/${a.sharedRoom.id}`, { lengthM: null })
    expect(response.status).toBe(400)
    expect((await Room.findByPk(a.sharedRoom.id))!.lengthM).toBe(5)
  })

  it('rejects a non-numeric or negative id in the path', async () => {
    await expectRejected('get', '/api/rooms/abc', undefined, 'roomId')
    await expectRejected('delete', '/api/rooms/-3', undefined, 'roomId')
    await expectRejected('get', '/api/workspaces/1.5/rooms', undefined, 'workspaceId')
  })

  it('treats search text with SQL wildcards literally', async () => {
    const response = await owner.get(`${url()}?search=${encodeURIComponent('%')}`)
    expect(response.status).toBe(200)
    expect(response.body).toEqual([])
  })
})

describe('survey validation', () => {
  it.each([
    [{ measuredOn: '2026-01-01' }, 'name'],
    [{ name: 'Bare', measuredOn: '14/03/2026' }, 'measuredOn'],
    [{ name: 'Bare', measuredOn: '2026-02-30' }, 'measuredOn'],
    [{ name: 'Bare', measuredOn: '2026-01-01', temperatureC: 80 }, 'temperatureC'],
    [{ name: 'Bare', measuredOn: '2026-01-01', humidityPercent: 120 }, 'humidityPercent'],
  ])('rejects %j with a message for %s', async (body, field) => {
    await expectRejected('post', `/api/rooms/${a.sharedRoom.id}/surveys`, body, field)
  })

  it('rejects an empty survey update', async () => {
    await expectRejected('patch', `/api/surveys/${a.sharedSurvey.id}`, {})
  })
})

describe('member and share validation', () => {
  it('rejects an unknown role and a malformed e-mail', async () => {
    const roleResponse = await owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.viewer.id}`, { role: 'admin' })
    expect(roleResponse.status).toBe(400)
    expect(roleResponse.body.error.fields).toHaveProperty('role')
    const shareResponse = await owner.post(`/api/rooms/${a.sharedRoom.id}/shares`, { email: 'no-at-sign' })
    expect(shareResponse.status).toBe(400)
    expect(shareResponse.body.error.fields).toHaveProperty('email')
  })
})
