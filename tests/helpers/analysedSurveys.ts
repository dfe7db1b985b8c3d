import { Capture, Survey, type Room } from '../../server/models'
import type { ObjectStore } from '../../server/storage/createObjectStore'
import { storeContentBytes } from '../../server/storage/storeContentBytes'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000]

/** A survey whose positions are synthetic rooms with one T60 in every band, analysed in-process. */
export async function createAnalysedSurvey(room: Room, options: { name: string; t60S: number; positions: number; store: ObjectStore; seed: number }): Promise<Survey> {
  const survey = await Survey.create({ roomId: room.id, name: options.name, measuredOn: '2026-05-01', temperatureC: 20, humidityPercent: 50 })
  for (let position = 0; position < options.positions; position++) {
    const impulse = synthesizeRoomImpulse({
      sampleRateHz: 48_000,
      durationS: Math.max(1.5, options.t60S * 2.5),
      bandDecays: OCTAVES_HZ.map((centreHz) => ({ centreHz, T60S: options.t60S })),
      noiseFloorDb: -95,
      seed: options.seed + position,
      directDelayMs: 5,
    })
    const bytes = encodeWav(impulse, { sampleRateHz: 48_000, encoding: 'float32' })
    const sha256 = await storeContentBytes(options.store, bytes)
    const capture = await Capture.create({
      surveyId: survey.id, uploadedById: null, kind: 'impulse', receiverLabel: `Position ${position + 1}`,
      positionXM: null, positionYM: null, positionZM: null, sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null,
      originalName: `p${position}.wav`, sha256, byteSize: bytes.length, sampleRateHz: 48_000, bitDepth: 32, channelCount: 1,
      durationS: impulse.length / 48_000, statusMessage: null,
    })
    await processAnalysisJob({ data: { captureId: capture.id }, attemptsMade: 0, opts: { attempts: 1 }, updateProgress: async () => {} }, { store: options.store })
  }
  return survey
}
