import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { Readable } from 'node:stream'
import { QueryTypes } from 'sequelize'
import { Capture } from '../../server/models'
import { contentKey, incomingKey } from '../../server/storage/contentKeys'
import { commitUploads } from '../../server/storage/commitUploads'
import { releaseQueuedContent } from '../../server/storage/releaseContent'
import { STALE_OBJECT_AGE_MS, sweepStorage } from '../../server/storage/sweepStorage'
import { storeContentBytes } from '../../server/storage/storeContentBytes'
import type { IncomingUpload } from '../../server/storage/incomingUploadStorage'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { createWorkspaceFixture, type WorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let a: WorkspaceFixture

beforeAll(async () => {
  services = await startTestServices()
  a = await createWorkspaceFixture('Housekeeping')
})
afterAll(async () => {
  await services.close()
})

const later = () => new Date(Date.now() + STALE_OBJECT_AGE_MS + 60_000)
const sha256Of = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex')

async function captureNaming(sha256: string, referenceSha256: string | null = null): Promise<Capture> {
  return Capture.create({
    surveyId: a.sharedSurvey.id, uploadedById: null, kind: 'impulse', positionXM: null, positionYM: null, positionZM: null,
    sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256, originalName: 'kept.wav', sha256,
    byteSize: 4, sampleRateHz: 48_000, bitDepth: 16, channelCount: 1, durationS: 1,
  })
}

async function queuedReleases(): Promise<string[]> {
  const rows = await services.sequelize.query<{ sha256: string }>('SELECT sha256 FROM content_releases', { type: QueryTypes.SELECT })
  return rows.map((row) => row.sha256)
}

describe('sweepStorage (run at server start and every few minutes)', () => {
  it('removes temporary uploads left by a server that stopped, once they are stale', async () => {
    const key = incomingKey()
    await services.store.putBytes(key, new Uint8Array([1, 2, 3]))
    await sweepStorage(services.store)
    expect(await services.store.head(key)).not.toBeNull() // may still be an upload in progress
    const report = await sweepStorage(services.store, { now: later() })
    expect(report.temporaryObjectsRemoved).toBe(1)
    expect(await services.objectKeys('incoming/')).toEqual([])
  })

  it('says so, without failing, when the server cannot list unfinished multipart uploads (the local fake)', async () => {
    const report = await sweepStorage(services.store, { now: later() })
    expect(report.multipartUploadsAborted).toBeNull()
  })

  it('removes content no row names and keeps content a capture file or a reference sweep names', async () => {
    const orphan = await storeContentBytes(services.store, new Uint8Array([9, 9, 9, 1]))
    const file = await storeContentBytes(services.store, new Uint8Array([9, 9, 9, 2]))
    const reference = await storeContentBytes(services.store, new Uint8Array([9, 9, 9, 3]))
    await captureNaming(file, reference)
    await sweepStorage(services.store)
    expect(await services.store.head(contentKey(orphan))).not.toBeNull() // too fresh: its row may be on its way
    const report = await sweepStorage(services.store, { now: later() })
    expect(report.unusedContentRemoved).toBe(1)
    expect(await services.store.head(contentKey(orphan))).toBeNull()
    expect(await services.store.head(contentKey(file))).not.toBeNull()
    expect(await services.store.head(contentKey(reference))).not.toBeNull()
  })
})

describe('releaseQueuedContent', () => {
  it('removes the files of rows deleted by any route (here plain SQL), queued by the delete trigger', async () => {
    const sha256 = await storeContentBytes(services.store, new Uint8Array([7, 7, 7, 1]))
    const reference = await storeContentBytes(services.store, new Uint8Array([7, 7, 7, 2]))
    const capture = await captureNaming(sha256, reference)
    await services.sequelize.query('DELETE FROM captures WHERE id = :id', { replacements: { id: capture.id } })
    expect((await queuedReleases()).sort()).toEqual([sha256, reference].sort())
    expect(await releaseQueuedContent(services.store)).toBe(2)
    expect(await services.store.head(contentKey(sha256))).toBeNull()
    expect(await services.store.head(contentKey(reference))).toBeNull()
    expect(await queuedReleases()).toEqual([])
  })

  it('keeps a queued file that another row still names, and clears the queue entry', async () => {
    const sha256 = await storeContentBytes(services.store, new Uint8Array([7, 7, 7, 3]))
    const doomed = await captureNaming(sha256)
    await captureNaming(sha256)
    await doomed.destroy()
    expect(await queuedReleases()).toEqual([sha256])
    expect(await releaseQueuedContent(services.store)).toBe(0)
    expect(await services.store.head(contentKey(sha256))).not.toBeNull()
    expect(await queuedReleases()).toEqual([])
  })

  it('queues the old file when a row is changed to name other content', async () => {
    const before = await storeContentBytes(services.store, new Uint8Array([7, 7, 7, 4]))
    const after = await storeContentBytes(services.store, new Uint8Array([7, 7, 7, 5]))
    const capture = await captureNaming(before)
    await capture.update({ sha256: after })
    expect(await queuedReleases()).toEqual([before])
    await releaseQueuedContent(services.store)
    expect(await services.store.head(contentKey(before))).toBeNull()
    expect(await services.store.head(contentKey(after))).not.toBeNull()
  })
})

describe('commitUploads', () => {
  it('removes the temporary object and the content it copied when the row cannot be written', async () => {
    const bytes = new Uint8Array([5, 4, 3, 2, 1])
    const tempKey = incomingKey()
    await services.store.putStream(tempKey, Readable.from([Buffer.from(bytes)]))
    const upload: IncomingUpload = { fieldname: 'file', originalname: 'x.wav', tempKey, size: bytes.length, sha256: sha256Of(bytes), headBytes: bytes }
    await expect(commitUploads(services.store, [upload], async () => { throw new Error('row refused') })).rejects.toThrow('row refused')
    expect(await services.store.head(tempKey)).toBeNull()
    expect(await services.store.head(contentKey(upload.sha256))).toBeNull()
  })

  it('reuses content already stored under the same sha256 and leaves it when the row fails', async () => {
    const bytes = new Uint8Array([5, 4, 3, 2, 0])
    const sha256 = await storeContentBytes(services.store, bytes)
    await captureNaming(sha256)
    const tempKey = incomingKey()
    await services.store.putBytes(tempKey, bytes)
    const upload: IncomingUpload = { fieldname: 'file', originalname: 'x.wav', tempKey, size: bytes.length, sha256, headBytes: bytes }
    await expect(commitUploads(services.store, [upload], async () => { throw new Error('row refused') })).rejects.toThrow()
    expect(await services.store.head(contentKey(sha256))).toEqual({ byteSize: bytes.length })
    expect(await services.store.head(tempKey)).toBeNull()
  })
})
