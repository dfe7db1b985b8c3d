import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { createApp, type RingdownApp } from '../../server/app'
import { Invitation, Survey } from '../../server/models'
import { createSmtpMailer } from '../../server/mail/mailer'
import { readFakeInbox, startFakeSmtpInbox } from '../../server/mail/fakeSmtpInbox'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { ApiAgent, signedInAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { createAnalysedSurvey } from '../helpers/analysedSurveys'

let services: TestServices
let ringdown: RingdownApp
let mailDir: string
let inbox: { port: number; close: () => Promise<void> }
let a: WorkspaceFixture
let owner: ApiAgent

beforeAll(async () => {
  mailDir = await mkdtemp(path.join(tmpdir(), 'ringdown-mail-'))
  inbox = await startFakeSmtpInbox({ port: 0, mailDir })
  services = await startTestServices({ MAIL_DIR: mailDir, PUBLIC_URL: 'http://ringdown.test', STORAGE_DIR: path.join(mailDir, 'files') })
  ringdown = createApp({ ...services, mailer: createSmtpMailer(`smtp://127.0.0.1:${inbox.port}`, 'Ringdown <no-reply@ringdown.invalid>') })
  a = await createWorkspaceFixture('Mu')
  owner = await signedInAgent(ringdown.app, a.users.owner.email, FIXTURE_PASSWORD)
})
afterAll(async () => {
  await ringdown.close()
  await inbox.close()
  await services.close()
  await rm(mailDir, { recursive: true, force: true })
})

async function lastMailTo(address: string) {
  const messages = await readFakeInbox(mailDir)
  return messages.find((message) => message.to.includes(address))
}

function tokenIn(text: string, route: 'invitations' | 'reset-password' | 'shared'): string {
  const match = text.match(new RegExp(`http://ringdown\\.test/${route}/([A-Za-z0-9_-]+)`))
  if (!match) throw new Error(`no ${route} link in: ${text}`)
  return match[1]!
}

describe('invitations by e-mail', () => {
  let token: string

  it('sends an invitation e-mail to the fake inbox with a single-use link', async () => {
    const response = await owner.post(`/api/workspaces/${a.workspace.id}/invitations`, { email: 'new.client@example.test', role: 'client', roomId: a.sharedRoom.id })
    expect(response.status).toBe(201)
    const mail = await lastMailTo('new.client@example.test')
    expect(mail?.subject).toMatch(/invites you to Mu shared room on Ringdown/)
    token = tokenIn(mail!.text, 'invitations')
    expect(token.length).toBeGreaterThanOrEqual(40)
    expect(await Invitation.count({ where: { tokenHash: token } })).toBe(0) // only the hash is stored
    const preview = await request(ringdown.app).get(`/api/invitations/${token}`)
    expect(preview.body).toMatchObject({ workspaceName: 'Workspace Mu', roomName: 'Mu shared room', role: 'client', email: 'new.client@example.test' })
  })

  it('lets the invitee register from the link and land in the room, once', async () => {
    const invitee = new ApiAgent(ringdown.app)
    const registered = await invitee.post('/api/auth/register', { name: 'New Client', email: 'new.client@example.test', password: 'a-long-password', invitationToken: token })
    expect(registered.status).toBe(201)
    expect(registered.body.memberships).toEqual([expect.objectContaining({ workspaceId: a.workspace.id, role: 'client' })])
    await invitee.refreshCsrf()
    expect((await invitee.get(`/api/rooms/${a.sharedRoom.id}`)).status).toBe(200)
    expect((await invitee.get(`/api/rooms/${a.privateRoom.id}`)).status).toBe(404)
    const reuse = await invitee.post(`/api/invitations/${token}/accept`)
    expect(reuse.status).toBe(410)
    expect(reuse.body.error.code).toBe('invitation-used')
  })

  it('refuses an expired invitation with 410', async () => {
    await owner.post(`/api/workspaces/${a.workspace.id}/invitations`, { email: 'late@example.test', role: 'viewer' })
    const expiredToken = tokenIn((await lastMailTo('late@example.test'))!.text, 'invitations')
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: 'late@example.test' } })
    const response = await request(ringdown.app).get(`/api/invitations/${expiredToken}`)
    expect(response.status).toBe(410)
    expect(response.body.error.code).toBe('invitation-expired')
  })

  it('refuses an invitation accepted from another account, and an engineer inviting an owner', async () => {
    await owner.post(`/api/workspaces/${a.workspace.id}/invitations`, { email: 'someone.else@example.test', role: 'viewer' })
    const otherToken = tokenIn((await lastMailTo('someone.else@example.test'))!.text, 'invitations')
    const wrongAccount = await signedInAgent(ringdown.app, a.users.viewer.email, FIXTURE_PASSWORD)
    expect((await wrongAccount.post(`/api/invitations/${otherToken}/accept`)).status).toBe(403)
    const engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
    expect((await engineer.post(`/api/workspaces/${a.workspace.id}/invitations`, { email: 'boss@example.test', role: 'owner' })).status).toBe(403)
    expect((await request(ringdown.app).get('/api/invitations/not-a-real-token-but-long-enough')).status).toBe(404)
  })
})

describe('password reset', () => {
  it('mails a single-use link that sets a new password and signs the account out', async () => {
    const before = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
    const anonymous = new ApiAgent(ringdown.app)
    expect((await anonymous.post('/api/auth/password-reset', { email: a.users.engineer.email })).status).toBe(202)
    const resetToken = tokenIn((await lastMailTo(a.users.engineer.email))!.text, 'reset-password')
    expect((await anonymous.post(`/api/auth/password-reset/${resetToken}`, { password: 'brand-new-password' })).status).toBe(204)
    expect((await before.get('/api/auth/me')).status).toBe(401)
    expect((await new ApiAgent(ringdown.app).signIn(a.users.engineer.email, 'brand-new-password')).status).toBe(200)
    const reuse = await anonymous.post(`/api/auth/password-reset/${resetToken}`, { password: 'another-password' })
    expect(reuse.status).toBe(410)
  })

  it('answers 202 for an unknown address without sending anything', async () => {
    const count = (await readFakeInbox(mailDir)).length
    expect((await new ApiAgent(ringdown.app).post('/api/auth/password-reset', { email: 'nobody@example.test' })).status).toBe(202)
    expect((await readFakeInbox(mailDir)).length).toBe(count)
  })
})

describe('read-only share links', () => {
  it('shows the comparison signed out and stops working when revoked', async () => {
    // Sharing freezes a report revision, so the surveys need analysed positions (an empty one is refused).
    const empty = await Survey.create({ roomId: a.sharedRoom.id, name: 'Not measured yet', measuredOn: '2026-02-01', temperatureC: null, humidityPercent: null })
    expect((await owner.post(`/api/rooms/${a.sharedRoom.id}/share-links`, { surveyIds: [a.sharedSurvey.id, empty.id] })).status).toBe(409)
    const first = await createAnalysedSurvey(a.sharedRoom, { name: 'Bare room', t60S: 0.6, positions: 1, store: services.store, seed: 5 })
    const second = await createAnalysedSurvey(a.sharedRoom, { name: 'After panels', t60S: 0.2, positions: 1, store: services.store, seed: 6 })
    const created = await owner.post(`/api/rooms/${a.sharedRoom.id}/share-links`, { surveyIds: [first.id, second.id], label: 'For the client', expiresInDays: 30 })
    expect(created.status).toBe(201)
    const shareToken = tokenIn(created.body.url, 'shared')
    const shown = await request(ringdown.app).get(`/api/shared/${shareToken}`)
    expect(shown.status).toBe(200)
    expect(shown.body.roomName).toBe('Mu shared room')
    expect(shown.body.surveys.map((s: { summary: { survey: { name: string } } }) => s.summary.survey.name)).toEqual(['Bare room', 'After panels'])
    expect((await owner.delete(`/api/rooms/${a.sharedRoom.id}/share-links/${created.body.id}`)).status).toBe(204)
    const revoked = await request(ringdown.app).get(`/api/shared/${shareToken}`)
    expect(revoked.status).toBe(410)
    expect(revoked.body.error.code).toBe('share-revoked')
  })

  it('refuses a viewer creating a link (403)', async () => {
    const viewer = await signedInAgent(ringdown.app, a.users.viewer.email, FIXTURE_PASSWORD)
    expect((await viewer.post(`/api/rooms/${a.sharedRoom.id}/share-links`, { surveyIds: [1, 2] })).status).toBe(403)
  })
})

describe('activity trail', () => {
  it("lists who shared and invited what on the room, newest first", async () => {
    const response = await owner.get(`/api/rooms/${a.sharedRoom.id}/activity`)
    expect(response.status).toBe(200)
    const actions = response.body.map((entry: { action: string }) => entry.action)
    expect(actions).toEqual(expect.arrayContaining(['invitation.sent', 'invitation.accepted', 'share-link.created', 'share-link.revoked']))
    expect(actions.indexOf('share-link.revoked')).toBeLessThan(actions.indexOf('share-link.created'))
    expect(response.body[0].userName).toBe('Mu owner')
  })
})
