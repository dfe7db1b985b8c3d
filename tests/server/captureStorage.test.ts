import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp, type RingdownApp } from '../../server/app'
import { Capture, Room, Survey } from '../../server/models'
import { contentKey } from '../../server/storage/contentKeys'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'

// Uploads against the real local S3 fake: what ends up in the bucket and in PostgreSQL.

let services: TestServices
let ringdown: RingdownApp
let a: WorkspaceFixture
let engineer: ApiAgent
let owner: ApiAgent

const UPLOAD_LIMIT_MB = 8

beforeAll(async () => {
  services = await startTestServices({ UPLOAD_LIMIT_MB })
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Storage')
  engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
  owner = await signedInAgent(ringdown.app, a.users.owner.email, FIXTURE_PASSWORD)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

interface UploadParts {
  file?: Uint8Array
  fileName?: string
  reference?: Uint8Array
  fields?: Record<string, string>
}

async function upload(surveyId: number, parts: UploadParts) {
  const token = await engineer.refreshCsrf()
  const req = engineer.agent.post(`/api/surveys/${surveyId}/captures`).set('x-csrf-token', token)
  for (const [key, value] of Object.entries(parts.fields ?? { kind: 'impulse' })) req.field(key, value)
  if (parts.file) req.attach('file', Buffer.from(parts.file), parts.fileName ?? 'capture.wav')
  if (parts.reference) req.attach('reference', Buffer.from(parts.reference), 'reference.wav')
  return req
}

/** A hand-built multipart body, for the malformed requests a browser never sends. */
async function rawUpload(surveyId: number, contentType: string, body: Buffer) {
  const token = await engineer.refreshCsrf()
  return engineer.agent.post(`/api/surveys/${surveyId}/captures`).set('x-csrf-token', token).set('content-type', contentType).send(body)
}

/** `fileNameParameter` is the raw Content-Disposition parameter, e.g. `filename="a.wav"`. */
function multipartBody(boundary: string, fileNameParameter: string, bytes: Uint8Array, options: { terminated: boolean }): Buffer {
  const head = `--${boundary}\r\nContent-Disposition: form-data; name="kind"\r\n\r\nimpulse\r\n--${boundary}\r\nContent-Disposition: form-data; name="file"; ${fileNameParameter}\r\nContent-Type: audio/wav\r\n\r\n`
  const tail = options.terminated ? `\r\n--${boundary}--\r\n` : ''
  return Buffer.concat([Buffer.from(head, 'latin1'), Buffer.from(bytes), Buffer.from(tail)])
}

/** A room with one survey, made directly in the database. */
async function roomWithSurvey(name: string): Promise<{ room: Room; survey: Survey }> {
  const room = await Room.create({ workspaceId: a.workspace.id, name, use: 'mixing-room', lengthM: 4, widthM: 3, heightM: 2.4, volumeM3: null })
  const survey = await Survey.create({ roomId: room.id, name: 'Bare room', measuredOn: '2026-02-01', temperatureC: 20, humidityPercent: 45 })
  return { room, survey }
}

describe('an accepted upload', () => {
  it('ends as exactly one content object and one row', async () => {
    const { survey } = await roomWithSurvey('One object')
    const keysBefore = await services.objectKeys()
    const rowsBefore = await Capture.count()
    const bytes = decayingNoiseWav({ seed: 101 })
    const response = await upload(survey.id, { file: bytes })
    expect(response.status).toBe(202)
    expect(await Capture.count()).toBe(rowsBefore + 1)
    expect(await services.objectKeys()).toEqual([...keysBefore, contentKey(response.body.sha256)].sort())
    expect(await services.objectKeys('incoming/')).toEqual([])
    expect((await services.store.head(contentKey(response.body.sha256)))?.byteSize).toBe(bytes.length)
  })

  it('stores a sweep recording and its reference sweep as two objects behind one row', async () => {
    const { survey } = await roomWithSurvey('Sweep with reference')
    const recording = decayingNoiseWav({ seed: 102, durationS: 2 })
    const reference = decayingNoiseWav({ seed: 103, durationS: 1 })
    const response = await upload(survey.id, { file: recording, reference, fields: { kind: 'sweep' } })
    expect(response.status).toBe(202)
    const row = (await Capture.findByPk(response.body.id))!
    expect(row.referenceSha256).not.toBeNull()
    expect(await services.store.head(contentKey(row.sha256))).toEqual({ byteSize: recording.length })
    expect(await services.store.head(contentKey(row.referenceSha256!))).toEqual({ byteSize: reference.length })
    expect(await services.objectKeys('incoming/')).toEqual([])
  })

  it('streams a file larger than one multipart part (5 MiB) into one object with the right sha256', async () => {
    const { survey } = await roomWithSurvey('Multipart')
    const bytes = decayingNoiseWav({ seed: 104, durationS: 70 }) // 16-bit mono 48 kHz: 6.7 MB
    expect(bytes.length).toBeGreaterThan(5 * 1024 * 1024)
    const response = await upload(survey.id, { file: bytes })
    expect(response.status).toBe(202)
    const { createHash } = await import('node:crypto')
    expect(response.body.sha256).toBe(createHash('sha256').update(bytes).digest('hex'))
    expect(await services.store.head(contentKey(response.body.sha256))).toEqual({ byteSize: bytes.length })
  })
})

describe('a failing upload leaves neither object nor row', () => {
  const good = () => decayingNoiseWav({ seed: 110 })
  const boundary = 'ringdown-test-boundary'
  const cases: [string, (surveyId: number) => Promise<{ status: number; body: { error: { code: string; message: string } } }>, number, RegExp][] = [
    ['multipart without a boundary', (id) => rawUpload(id, 'multipart/form-data', multipartBody(boundary, 'filename="a.wav"', good(), { terminated: true })), 400, /boundary/i],
    ['an unterminated multipart body', (id) => rawUpload(id, `multipart/form-data; boundary=${boundary}`, multipartBody(boundary, 'filename="a.wav"', good(), { terminated: false })), 400, /not a complete multipart/],
    ['a raw NUL byte in the file name', (id) => rawUpload(id, `multipart/form-data; boundary=${boundary}`, multipartBody(boundary, 'filename="room\u0000.wav"', good(), { terminated: true })), 400, /not a complete multipart.*Malformed part header/],
    ['a NUL in an RFC 5987 encoded file name', (id) => rawUpload(id, `multipart/form-data; boundary=${boundary}`, multipartBody(boundary, "filename*=UTF-8''room%00.wav", good(), { terminated: true })), 400, /NUL character/],
    ['a file over the limit, past the first multipart part', (id) => upload(id, { file: decayingNoiseWav({ seed: 111, durationS: 95 }) }), 413, /upload limit/],
    ['a truncated WAV', (id) => upload(id, { file: good().subarray(0, 20_000) }), 400, /truncated/],
    ['an unknown kind (fields checked after the file arrived)', (id) => upload(id, { file: good(), fields: { kind: 'noise' } }), 400, /impulse response or a sweep/],
    ['a reference sweep at another sample rate', (id) => upload(id, { file: good(), reference: decayingNoiseWav({ seed: 112, sampleRateHz: 44_100, durationS: 0.5 }), fields: { kind: 'sweep' } }), 400, /44100 Hz but the recording at 48000 Hz/],
    ['a reference sweep longer than the recording', (id) => upload(id, { file: good(), reference: decayingNoiseWav({ seed: 113, durationS: 3 }), fields: { kind: 'sweep' } }), 400, /shorter than the reference sweep/],
    ['a sweep recording shorter than its sweep parameters', (id) => upload(id, { file: good(), fields: { kind: 'sweep', sweepF1Hz: '20', sweepF2Hz: '20000', sweepDurationS: '4' } }), 400, /shorter than the sweep/],
    ['a reference sweep that is not a WAV', (id) => upload(id, { file: good(), reference: new TextEncoder().encode('not audio, just words '.repeat(10)), fields: { kind: 'sweep' } }), 400, /reference sweep: .*not a WAV/],
  ]
  for (const [label, send, status, message] of cases) {
    it(`answers ${status} with a clear message for ${label}`, async () => {
      const { survey } = await roomWithSurvey(`Failing: ${label}`)
      const keysBefore = await services.objectKeys()
      const rowsBefore = await Capture.count()
      const response = await send(survey.id)
      expect(response.status).toBe(status)
      expect(response.body.error.message).toMatch(message)
      expect(await Capture.count()).toBe(rowsBefore)
      expect(await services.objectKeys()).toEqual(keysBefore)
    })
  }
})

describe('stored content shared between captures', () => {
  it('keeps a file while another capture uses it and removes it with the last one', async () => {
    const { survey } = await roomWithSurvey('Two captures, one file')
    const bytes = decayingNoiseWav({ seed: 120 })
    const first = await upload(survey.id, { file: bytes })
    const second = await upload(survey.id, { file: bytes, fileName: 'same-again.wav' })
    expect(first.body.sha256).toBe(second.body.sha256)
    const key = contentKey(first.body.sha256)
    expect((await services.objectKeys()).filter((k) => k === key)).toHaveLength(1)
    expect((await engineer.delete(`/api/captures/${first.body.id}`)).status).toBe(204)
    expect(await services.store.head(key)).not.toBeNull()
    expect((await engineer.delete(`/api/captures/${second.body.id}`)).status).toBe(204)
    expect(await services.store.head(key)).toBeNull()
  })

  it("keeps a capture's file while another capture uses the same content as its reference sweep", async () => {
    const { survey } = await roomWithSurvey('File and reference')
    const shared = decayingNoiseWav({ seed: 121, durationS: 1 })
    const recording = decayingNoiseWav({ seed: 122, durationS: 2 })
    const impulse = await upload(survey.id, { file: shared })
    const sweep = await upload(survey.id, { file: recording, reference: shared, fields: { kind: 'sweep' } })
    expect(sweep.status).toBe(202)
    const sharedKey = contentKey(impulse.body.sha256)
    expect((await engineer.delete(`/api/captures/${impulse.body.id}`)).status).toBe(204)
    expect(await services.store.head(sharedKey)).not.toBeNull()
    expect((await engineer.delete(`/api/captures/${sweep.body.id}`)).status).toBe(204)
    expect(await services.store.head(sharedKey)).toBeNull()
    expect(await services.store.head(contentKey(sweep.body.sha256))).toBeNull()
  })

  it('never leaves a row without its file when the same content is deleted and uploaded at once', async () => {
    const { survey } = await roomWithSurvey('Delete and upload together')
    const bytes = decayingNoiseWav({ seed: 125 })
    for (let round = 0; round < 6; round++) {
      const existing = await upload(survey.id, { file: bytes })
      const [deleted, added] = await Promise.all([engineer.delete(`/api/captures/${existing.body.id}`), upload(survey.id, { file: bytes })])
      expect(deleted.status).toBe(204)
      expect(added.status).toBe(202)
      expect(await services.store.head(contentKey(added.body.sha256))).toEqual({ byteSize: bytes.length })
      expect((await engineer.delete(`/api/captures/${added.body.id}`)).status).toBe(204)
      expect(await services.store.head(contentKey(added.body.sha256))).toBeNull()
    }
  }, 60_000)

  it('purges the files of a deleted survey, except those another survey still uses', async () => {
    const { survey: doomed } = await roomWithSurvey('Deleted survey')
    const { room: otherRoom, survey: kept } = await roomWithSurvey('Keeps a shared file')
    const only = await upload(doomed.id, { file: decayingNoiseWav({ seed: 130 }) })
    const sharedBytes = decayingNoiseWav({ seed: 131 })
    const shared = await upload(doomed.id, { file: sharedBytes })
    await upload(kept.id, { file: sharedBytes })
    expect((await owner.delete(`/api/surveys/${doomed.id}`)).status).toBe(204)
    expect(await services.store.head(contentKey(only.body.sha256))).toBeNull()
    expect(await services.store.head(contentKey(shared.body.sha256))).not.toBeNull()

    expect((await owner.delete(`/api/rooms/${otherRoom.id}`)).status).toBe(204)
    expect(await services.store.head(contentKey(shared.body.sha256))).toBeNull()
  })

  it('purges every file of a deleted room (its surveys and their captures)', async () => {
    const { room, survey } = await roomWithSurvey('Deleted room')
    const second = await Survey.create({ roomId: room.id, name: 'After panels', measuredOn: '2026-03-01', temperatureC: 20, humidityPercent: 45 })
    const uploads = [
      await upload(survey.id, { file: decayingNoiseWav({ seed: 140 }) }),
      await upload(second.id, { file: decayingNoiseWav({ seed: 141, durationS: 2 }), reference: decayingNoiseWav({ seed: 142 }), fields: { kind: 'sweep' } }),
    ]
    const rows = await Capture.findAll({ where: { id: uploads.map((u) => u.body.id) } })
    const keys = rows.flatMap((row) => [row.sha256, row.referenceSha256].filter((sha): sha is string => sha !== null)).map(contentKey)
    expect(keys).toHaveLength(3)
    expect((await owner.delete(`/api/rooms/${room.id}`)).status).toBe(204)
    for (const key of keys) expect(await services.store.head(key)).toBeNull()
  })
})
