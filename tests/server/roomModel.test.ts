import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp, type RingdownApp } from '../../server/app'
import { RoomModel } from '../../server/models'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let ringdown: RingdownApp
let a: WorkspaceFixture
let engineer: ApiAgent
let viewer: ApiAgent

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Lambda')
  engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
  viewer = await signedInAgent(ringdown.app, a.users.viewer.email, FIXTURE_PASSWORD)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

// The fixture room is 5 × 4 × 2.5 m.
const layout = { speakers: [{ label: 'Left', xM: 1, yM: 1.2, zM: 1.2 }, { label: 'Right', xM: 1, yM: 2.8, zM: 1.2 }], listener: { xM: 2.7, yM: 2, zM: 1.2 }, airTemperatureC: 21 }
const treatment = {
  surfaceMaterials: { floor: 'wood-floor-on-joists', ceiling: 'gypsum-board-on-studs', walls: 'plaster-on-brick' },
  openings: [{ name: 'door', boundary: 'rear wall', areaM2: 1.8, materialId: 'wood-floor-on-joists' }],
  absorbers: [{ name: 'Side-wall panels', materialId: 'mineral-wool-24kg-50mm', areaM2: 0.72, count: 4, mountedOn: 'left wall' }],
}

describe('room model API', () => {
  it('saves and returns the layout and the treatment plan', async () => {
    expect((await engineer.get(`/api/rooms/${a.sharedRoom.id}/model`)).body).toMatchObject({ layout: null, treatment: null })
    const saved = await engineer.put(`/api/rooms/${a.sharedRoom.id}/model/layout`, layout)
    expect(saved.status).toBe(200)
    expect(saved.body.layout).toEqual(layout)
    expect((await engineer.put(`/api/rooms/${a.sharedRoom.id}/model/treatment`, treatment)).status).toBe(200)
    const read = await viewer.get(`/api/rooms/${a.sharedRoom.id}/model`)
    expect(read.body.layout).toEqual(layout)
    expect(read.body.treatment.absorbers[0].count).toBe(4)
  })

  it('refuses a position outside the room and an unknown material, writing nothing', async () => {
    const before = (await RoomModel.findOne({ where: { roomId: a.sharedRoom.id } }))!.toJSON()
    const outside = await engineer.put(`/api/rooms/${a.sharedRoom.id}/model/layout`, { ...layout, listener: { xM: 6, yM: 2, zM: 1.2 } })
    expect(outside.status).toBe(400)
    expect(outside.body.error.fields).toHaveProperty('listener')
    const unknown = await engineer.put(`/api/rooms/${a.sharedRoom.id}/model/treatment`, { ...treatment, surfaceMaterials: { ...treatment.surfaceMaterials, floor: 'unobtainium' } })
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.fields).toHaveProperty('surfaceMaterials.floor')
    expect((await RoomModel.findOne({ where: { roomId: a.sharedRoom.id } }))!.toJSON()).toEqual(before)
  })

  it('refuses a viewer (403)', async () => {
    expect((await viewer.put(`/api/rooms/${a.sharedRoom.id}/model/layout`, layout)).status).toBe(403)
  })
})

describe('material library', () => {
  it('lists the handbook materials with their source and adds a workspace material', async () => {
    const list = await engineer.get(`/api/workspaces/${a.workspace.id}/materials`)
    const wool = list.body.find((m: { id: string }) => m.id === 'mineral-wool-24kg-50mm')
    expect(wool.source).toMatch(/Engineering Noise Control/)
    expect(wool.isBuiltIn).toBe(true)
    const created = await engineer.post(`/api/workspaces/${a.workspace.id}/materials`, { name: 'Our 100 mm panel', coefficients: [0.1, 0.35, 0.8, 1, 1, 1, 1, null], source: 'Supplier test report (invented for this test)' })
    expect(created.status).toBe(201)
    expect(created.body.id).toMatch(/^custom-\d+$/)
    const withCustom = await engineer.put(`/api/rooms/${a.sharedRoom.id}/model/treatment`, { ...treatment, absorbers: [{ name: 'Panels', materialId: created.body.id, areaM2: 0.6, count: 2 }] })
    expect(withCustom.status).toBe(200)
  })

  it('rejects a material without a source or with eleven coefficients', async () => {
    const noSource = await engineer.post(`/api/workspaces/${a.workspace.id}/materials`, { name: 'X', coefficients: [0, 0, 0, 0, 0, 0, 0, 0], source: '' })
    expect(noSource.status).toBe(400)
    expect(noSource.body.error.fields).toHaveProperty('source')
    const wrongLength = await engineer.post(`/api/workspaces/${a.workspace.id}/materials`, { name: 'X', coefficients: Array(11).fill(0.1), source: 'data sheet' })
    expect(wrongLength.status).toBe(400)
  })
})
