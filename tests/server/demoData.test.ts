import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Capture, Room, Survey, User } from '../../server/models'
import { seedDemoData } from '../../server/db/demoData'
import { contentKey } from '../../server/storage/contentKeys'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { compareSurveys } from '../../server/services/comparisonService'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { captureStatusOf } from '../helpers/captureStatus'

let services: TestServices

beforeAll(async () => {
  services = await startTestServices()
})
afterAll(async () => {
  await services.close()
})

describe('seedDemoData', () => {
  it('writes the invented scenario once, with three stored captures per demo survey', async () => {
    expect(await seedDemoData(services.sequelize, { store: services.store })).toBe(true)
    expect(await seedDemoData(services.sequelize, { store: services.store })).toBe(false)
    expect(await User.count()).toBe(4)
    const captures = await Capture.findAll()
    expect(captures).toHaveLength(6)
    for (const capture of captures) {
      expect(await captureStatusOf(capture.id)).toBe('uploaded')
      expect((await services.store.head(contentKey(capture.sha256)))?.byteSize).toBe(Number(capture.byteSize))
    }
  })

  it('gives a comparison in which the treatment brings the mid bands inside the EBU Tech 3276 mask once analysed', async () => {
    for (const capture of await Capture.findAll()) {
      await processAnalysisJob({ data: { captureId: capture.id }, attemptsMade: 0, opts: { attempts: 1 }, updateProgress: async () => {} }, { store: services.store })
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
