import { Capture, Survey, type Room } from '../../server/models'
import { storeUploadedFile } from '../../server/storage/storeUploadedFile'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { recordAnalysisRequest } from '../../server/services/analysisJobsService'
import { defaultSettingsOf } from '../../server/services/capturesService'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'
import { writeFile, mkdtemp } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000]

/** A survey whose positions are synthetic rooms with one T60 in every band, analysed in-process. */
export async function createAnalysedSurvey(room: Room, options: { name: string; t60S: number; positions: number; storageDir: string; seed: number }): Promise<Survey> {
  const survey = await Survey.create({ roomId: room.id, name: options.name, measuredOn: '2026-05-01', temperatureC: 20, humidityPercent: 50 })
  const scratch = await mkdtemp(path.join(tmpdir(), 'ringdown-synth-'))
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
    const tempPath = path.join(scratch, `p${position}.wav`)
    await writeFile(tempPath, bytes)
    const { sha256 } = await storeUploadedFile(options.storageDir, tempPath)
    const capture = await Capture.create({
      surveyId: survey.id, uploadedById: null, kind: 'impulse', receiverLabel: `Position ${position + 1}`,
      positionXM: null, positionYM: null, positionZM: null, sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null,
      originalName: `p${position}.wav`, sha256, byteSize: bytes.length, sampleRateHz: 48_000, bitDepth: 32, channelCount: 1,
      durationS: impulse.length / 48_000,
    })
    const { analysis } = await recordAnalysisRequest(capture.id, defaultSettingsOf(capture))
    await processAnalysisJob({ data: { analysisId: analysis.id, captureId: capture.id }, attemptsMade: 0, opts: { attempts: 1 }, updateProgress: async () => {} }, { storageDir: options.storageDir })
  }
  return survey
}
