import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp, type RingdownApp } from '../../server/app'
import { Membership, Room, RoomShare, Survey } from '../../server/models'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { ApiAgent, signedInAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import type { Role } from '../../shared/api/common'

let services: TestServices
let ringdown: RingdownApp
let a: WorkspaceFixture
let b: WorkspaceFixture
const agents = {} as Record<Role, ApiAgent>

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Alpha')
  b = await createWorkspaceFixture('Beta')
  for (const role of ['owner', 'engineer', 'client', 'viewer'] as const) {
    agents[role] = await signedInAgent(ringdown.app, a.users[role].email, FIXTURE_PASSWORD)
  }
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

const validRoom = { name: 'Intruder room', use: 'other', lengthM: 3, widthM: 3, heightM: 2.4 }
const validSurvey = { name: 'Intruder survey', measuredOn: '2026-02-02' }
const validLayout = { speakers: [{ label: 'Left', xM: 1, yM: 1, zM: 1.2 }], listener: { xM: 2, yM: 2, zM: 1.2 } }
const validTreatment = { surfaceMaterials: { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' } }
const validMaterial = { name: 'Intruder foam', coefficients: [null, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, null], source: 'made up' }

/** Every route, aimed at workspace B's records. */
function routesIntoB() {
  return [
    ['get', `/api/workspaces/${b.workspace.id}/rooms`],
    ['post', `/api/workspaces/${b.workspace.id}/rooms`, validRoom],
    ['get', `/api/workspaces/${b.workspace.id}/members`],
    ['post', `/api/workspaces/${b.workspace.id}/members`, { email: a.users.viewer.email, role: 'viewer' }],
    ['patch', `/api/workspaces/${b.workspace.id}/members/${b.users.viewer.id}`, { role: 'owner' }],
    ['delete', `/api/workspaces/${b.workspace.id}/members/${b.users.viewer.id}`],
    ['get', `/api/rooms/${b.sharedRoom.id}`],
    ['patch', `/api/rooms/${b.sharedRoom.id}`, { name: 'Taken over' }],
    ['delete', `/api/rooms/${b.sharedRoom.id}`],
    ['get', `/api/rooms/${b.sharedRoom.id}/shares`],
    ['post', `/api/rooms/${b.sharedRoom.id}/shares`, { email: b.users.client.email }],
    ['delete', `/api/rooms/${b.sharedRoom.id}/shares/${b.users.client.id}`],
    ['get', `/api/rooms/${b.sharedRoom.id}/surveys`],
    ['post', `/api/rooms/${b.sharedRoom.id}/surveys`, validSurvey],
    ['get', `/api/surveys/${b.sharedSurvey.id}`],
    ['patch', `/api/surveys/${b.sharedSurvey.id}`, { name: 'Taken over' }],
    ['delete', `/api/surveys/${b.sharedSurvey.id}`],
    ['get', `/api/surveys/${b.sharedSurvey.id}/captures`],
    ['get', `/api/surveys/${b.sharedSurvey.id}/events`],
    ['post', `/api/surveys/${b.sharedSurvey.id}/captures`, { kind: 'impulse' }],
    ['get', `/api/surveys/${b.sharedSurvey.id}/summary`],
    ['get', `/api/surveys/${b.sharedSurvey.id}/export?format=csv`],
    ['get', `/api/captures/${b.sharedCapture.id}`],
    ['delete', `/api/captures/${b.sharedCapture.id}`],
    ['get', `/api/captures/${b.sharedCapture.id}/analysis`],
    ['get', `/api/captures/${b.sharedCapture.id}/analyses`],
    ['post', `/api/captures/${b.sharedCapture.id}/analyses`, { bands: 'third', smoothing: 3, channel: 0, gateMs: null, timeReversedFiltering: true }],
    ['get', `/api/captures/${b.sharedCapture.id}/export?format=json`],
    ['get', `/api/rooms/${b.sharedRoom.id}/comparison?surveys=${b.sharedSurvey.id},${b.privateSurvey.id}`],
    ['get', `/api/rooms/${b.sharedRoom.id}/comparison/export?surveys=${b.sharedSurvey.id},${b.privateSurvey.id}&format=csv`],
    ['get', `/api/rooms/${b.sharedRoom.id}/model`],
    ['put', `/api/rooms/${b.sharedRoom.id}/model/layout`, validLayout],
    ['put', `/api/rooms/${b.sharedRoom.id}/model/treatment`, validTreatment],
    ['get', `/api/workspaces/${b.workspace.id}/materials`],
    ['post', `/api/workspaces/${b.workspace.id}/materials`, validMaterial],
    ['delete', `/api/workspaces/${b.workspace.id}/materials/1`],
    ['post', `/api/workspaces/${b.workspace.id}/invitations`, { email: 'x@example.test', role: 'viewer' }],
    ['get', `/api/workspaces/${b.workspace.id}/invitations`],
    ['post', `/api/rooms/${b.sharedRoom.id}/share-links`, { surveyIds: [b.sharedSurvey.id, b.privateSurvey.id] }],
    ['get', `/api/rooms/${b.sharedRoom.id}/share-links`],
    ['delete', `/api/rooms/${b.sharedRoom.id}/share-links/1`],
    ['get', `/api/rooms/${b.sharedRoom.id}/activity`],
    ['put', `/api/captures/${b.sharedCapture.id}/inclusion`, { isIncluded: false, reason: 'Taken over' }],
    ['put', `/api/captures/${b.sharedCapture.id}/pinned-analysis`, { analysisId: null }],
    ['post', `/api/surveys/${b.sharedSurvey.id}/analyses`, { bands: 'third', smoothing: 6, gateMs: null, timeReversedFiltering: true }],
    ['get', `/api/surveys/${b.sharedSurvey.id}/analysis-progress`],
    ['put', `/api/rooms/${b.sharedRoom.id}/target`, { targetProfile: 'auto' }],
    ['get', `/api/rooms/${b.sharedRoom.id}/report-revisions`],
    ['get', `/api/rooms/${b.sharedRoom.id}/report-revisions/1`],
    ['get', `/api/rooms/${b.sharedRoom.id}/report-revisions/1/report.pdf`],
    ['get', `/api/rooms/${b.sharedRoom.id}/report.pdf?surveys=${b.sharedSurvey.id},${b.privateSurvey.id}`],
    ['get', `/api/workspaces/${b.workspace.id}/custom-targets`],
    ['post', `/api/workspaces/${b.workspace.id}/custom-targets`, { name: 'Taken over', sourceNote: 'made up', octaveLimits: [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((centreHz) => ({ centreHz, minS: 0.2, maxS: 0.4 })) }],
    ['put', `/api/workspaces/${b.workspace.id}/custom-targets/1`, { name: 'Taken over', sourceNote: 'made up', octaveLimits: [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((centreHz) => ({ centreHz, minS: 0.2, maxS: 0.4 })) }],
    ['delete', `/api/workspaces/${b.workspace.id}/custom-targets/1`],
    ['get', `/api/workspaces/${b.workspace.id}/target-options`],
    ['get', `/api/workspaces/${b.workspace.id}/profile`],
    ['put', `/api/workspaces/${b.workspace.id}/profile`, { consultancyName: 'Taken over', address: '', contact: '' }],
    ['get', `/api/workspaces/${b.workspace.id}/profile/logo`],
    ['delete', `/api/workspaces/${b.workspace.id}/profile/logo`],
  ] as const
}

async function snapshotOfB() {
  return {
    rooms: (await Room.findAll({ where: { workspaceId: b.workspace.id }, order: [['id', 'ASC']], raw: true })).map((r) => [r.id, r.name]),
    surveys: (await Survey.findAll({ where: { roomId: [b.sharedRoom.id, b.privateRoom.id] }, order: [['id', 'ASC']], raw: true })).map((s) => [s.id, s.name]),
    members: (await Membership.findAll({ where: { workspaceId: b.workspace.id }, order: [['id', 'ASC']], raw: true })).map((m) => [m.userId, m.role]),
    shares: await RoomShare.count({ where: { roomId: b.sharedRoom.id } }),
  }
}

describe('cross-workspace access', () => {
  for (const role of ['owner', 'engineer', 'client', 'viewer'] as const) {
    it(`answers 404 and changes nothing when workspace A's ${role} touches workspace B on every route`, async () => {
      const before = await snapshotOfB()
      for (const [method, url, body] of routesIntoB()) {
        const response = await agents[role].send(method, url, body)
        expect(response.status, `${method.toUpperCase()} ${url}`).toBe(404)
        expect(response.body.error.code).toMatch(/not-found/)
        expect(JSON.stringify(response.body)).not.toContain('Beta')
      }
      expect(await snapshotOfB()).toEqual(before)
    })
  }
})

describe('viewer and client (rooms shared with them only, read-only here)', () => {
  for (const role of ['viewer', 'client'] as const) {
    it(`lets the ${role} list and read only the rooms shared with them`, async () => {
      const list = await agents[role].get(`/api/workspaces/${a.workspace.id}/rooms`)
      expect(list.status).toBe(200)
      expect(list.body.map((r: { id: number }) => r.id)).toEqual([a.sharedRoom.id])
      expect((await agents[role].get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)
      expect((await agents[role].get(`/api/rooms/${a.sharedRoom.id}/surveys`)).status).toBe(200)
      expect((await agents[role].get(`/api/surveys/${a.sharedSurvey.id}`)).status).toBe(200)
      expect((await agents[role].get(`/api/rooms/${a.privateRoom.id}`)).status).toBe(404)
      expect((await agents[role].get(`/api/surveys/${a.privateSurvey.id}`)).status).toBe(404)
    })

    it(`refuses every change by the ${role} with 403 and writes nothing`, async () => {
      const attempts = [
        ['post', `/api/workspaces/${a.workspace.id}/rooms`, validRoom],
        ['patch', `/api/rooms/${a.sharedRoom.id}`, { name: 'Renamed' }],
        ['delete', `/api/rooms/${a.sharedRoom.id}`],
        ['get', `/api/rooms/${a.sharedRoom.id}/shares`],
        ['post', `/api/rooms/${a.sharedRoom.id}/shares`, { email: a.users.viewer.email }],
        ['delete', `/api/rooms/${a.sharedRoom.id}/shares/${a.users.viewer.id}`],
        ['post', `/api/rooms/${a.sharedRoom.id}/surveys`, validSurvey],
        ['patch', `/api/surveys/${a.sharedSurvey.id}`, { name: 'Renamed' }],
        ['delete', `/api/surveys/${a.sharedSurvey.id}`],
        ['get', `/api/workspaces/${a.workspace.id}/members`],
        ['patch', `/api/workspaces/${a.workspace.id}/members/${a.users.owner.id}`, { role: 'viewer' }],
      ] as const
      for (const [method, url, body] of attempts) {
        const response = await agents[role].send(method, url, body)
        expect(response.status, `${method.toUpperCase()} ${url}`).toBe(403)
        expect(response.body.error.code).toBe('forbidden')
      }
      expect((await Room.findByPk(a.sharedRoom.id))!.name).toBe(a.sharedRoom.name)
      expect((await Survey.findByPk(a.sharedSurvey.id))!.name).toBe('Bare room')
      expect(await Room.count({ where: { workspaceId: a.workspace.id } })).toBe(2)
    })
  }
})

describe('engineer', () => {
  it('creates, edits and deletes rooms and surveys, and shares rooms', async () => {
    const engineer = agents.engineer
    const room = await engineer.post(`/api/workspaces/${a.workspace.id}/rooms`, { name: 'Vocal booth', use: 'other', volumeM3: 9 })
    expect(room.status).toBe(201)
    expect(room.body.permissions).toMatchObject({ role: 'engineer', canEdit: true, canDelete: true, canShare: true })
    expect((await engineer.patch(`/api/rooms/${room.body.id}`, { notes: 'Lined with panels' })).body.notes).toBe('Lined with panels')
    const survey = await engineer.post(`/api/rooms/${room.body.id}/surveys`, { name: 'Bare booth', measuredOn: '2026-03-01', temperatureC: 21 })
    expect(survey.status).toBe(201)
    expect((await engineer.patch(`/api/surveys/${survey.body.id}`, { humidityPercent: 45 })).body.humidityPercent).toBe(45)
    const share = await engineer.post(`/api/rooms/${room.body.id}/shares`, { email: a.users.client.email })
    expect(share.status).toBe(201)
    expect((await agents.client.get(`/api/rooms/${room.body.id}`)).status).toBe(200)
    expect((await engineer.delete(`/api/rooms/${room.body.id}/shares/${a.users.client.id}`)).status).toBe(204)
    expect((await agents.client.get(`/api/rooms/${room.body.id}`)).status).toBe(404)
    expect((await engineer.delete(`/api/surveys/${survey.body.id}`)).status).toBe(204)
    expect((await engineer.delete(`/api/rooms/${room.body.id}`)).status).toBe(204)
    expect(await Room.findByPk(room.body.id)).toBeNull()
  })

  it('reads the member list but may not change roles', async () => {
    expect((await agents.engineer.get(`/api/workspaces/${a.workspace.id}/members`)).status).toBe(200)
    const response = await agents.engineer.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.viewer.id}`, { role: 'engineer' })
    expect(response.status).toBe(403)
    expect((await Membership.findOne({ where: { workspaceId: a.workspace.id, userId: a.users.viewer.id } }))!.role).toBe('viewer')
  })

  it('refuses to share a room with someone outside the workspace (404 member-not-found)', async () => {
    const response = await agents.engineer.post(`/api/rooms/${a.sharedRoom.id}/shares`, { email: b.users.client.email })
    expect(response.status).toBe(404)
    expect(response.body.error.code).toBe('member-not-found')
  })
})

describe('owner', () => {
  it('changes a member role and keeps at least one owner', async () => {
    const owner = agents.owner
    const promote = await owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.viewer.id}`, { role: 'client' })
    expect(promote.status).toBe(200)
    expect(promote.body.role).toBe('client')
    await owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.viewer.id}`, { role: 'viewer' })
    const demoteSelf = await owner.patch(`/api/workspaces/${a.workspace.id}/members/${a.users.owner.id}`, { role: 'engineer' })
    expect(demoteSelf.status).toBe(400)
    expect((await Membership.findOne({ where: { workspaceId: a.workspace.id, userId: a.users.owner.id } }))!.role).toBe('owner')
  })

  it('adds a registered user by e-mail and removes them again', async () => {
    const owner = agents.owner
    const added = await owner.post(`/api/workspaces/${a.workspace.id}/members`, { email: b.users.viewer.email, role: 'viewer' })
    expect(added.status).toBe(201)
    expect((await owner.post(`/api/workspaces/${a.workspace.id}/members`, { email: b.users.viewer.email, role: 'viewer' })).status).toBe(409)
    expect((await owner.delete(`/api/workspaces/${a.workspace.id}/members/${b.users.viewer.id}`)).status).toBe(204)
    const unknown = await owner.post(`/api/workspaces/${a.workspace.id}/members`, { email: 'nobody@nowhere.test', role: 'viewer' })
    expect(unknown.status).toBe(404)
    expect(unknown.body.error.code).toBe('user-not-found')
  })
})

describe('signed-out callers', () => {
  it('get 401 on every route', async () => {
    const anonymous = new ApiAgent(ringdown.app)
    for (const [method, url, body] of routesIntoB()) {
      const response = await anonymous.send(method, url, body)
      expect(response.status, `${method.toUpperCase()} ${url}`).toBe(401)
    }
  })
})
