import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm, stat } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { Capture, Room, Survey, User } from '../../server/models'
import { seedDemoData } from '../../server/db/demoData'
import { contentPath } from '../../server/storage/contentPath'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { compareSurveys } from '../../server/services/comparisonService'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { captureStatusOf } from '../helpers/captureStatus'

let services: TestServices
let storageDir: string

beforeAll(async () => {
  storageDir = await mkdtemp(path.join(tmpdir(), 'ringdown-demo-test-'))
  services = await startTestServices({ STORAGE_DIR: storageDir })
})
afterAll(async () => {
  await services.close()
  await rm(storageDir, { recursive: true, force: true })
})

describe('seedDemoData', () => {
  it('writes the invented scenario once, with three stored captures per demo survey', async () => {
    expect(await seedDemoData(services.sequelize, { storageDir })).toBe(true)
    expect(await seedDemoData(services.sequelize, { storageDir })).toBe(false)
    expect(await User.count()).toBe(4)
    const captures = await Capture.findAll()
    expect(captures).toHaveLength(6)
    for (const capture of captures) {
      expect(await captureStatusOf(capture.id)).toBe('uploaded')
      expect((await stat(contentPath(storageDir, capture.sha256))).size).toBe(Number(capture.byteSize))
    }
  })

  it('gives a comparison in which the treatment brings the mid bands inside the EBU Tech 3276 mask once analysed', async () => {
    for (const capture of await Capture.findAll()) {
      await processAnalysisJob({ data: { captureId: capture.id }, attemptsMade: 0, opts: { attempts: 1 }, updateProgress: async () => {} }, { storageDir })
    }
    const room = (await Room.findOne({ where: { name: 'Garden studio control room' } }))!
    const surveys = await Survey.findAll({ where: { roomId: room.id }, order: [['measuredOn', 'ASC']] })
    const owner = (await User.findOne({ where: { email: 'owner@ringdown.test' } }))!
    const comparison = await compareSurveys(owner.id, room.id, surveys.map((s) => s.id), 'octave')
    const verdictAt = (index: number, hz: number) => comparison.surveys[index]!.verdicts.find((v) => v.centreHz === hz)!.verdict
    // Invented demo T60s: 0.5 s bare and 0.2 s treated at 1 kHz; Tm for 39.1 m³ is 0.183 s ± 0.05 s.
    expect(verdictAt(0, 1000)).toBe('too-live')
    expect(verdictAt(1, 1000)).toBe('inside')
    expect(comparison.summaryLine).toMatch(/^After panels and bass traps: /)
  })
})
