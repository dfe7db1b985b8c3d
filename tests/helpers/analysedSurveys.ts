import { Capture, Survey, type Room } from '../../server/models'
import type { ObjectStore } from '../../server/storage/createObjectStore'
import { storeContentBytes } from '../../server/storage/storeContentBytes'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'
import { readWavFacts } from '../../shared/acoustics/wav/readWavFacts'

const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000]

/** Runs the worker's processor in-process for one capture (no Redis), as the worker would. */
export async function analyseInProcess(captureId: number, store: ObjectStore, settingsKey?: string): Promise<void> {
  await processAnalysisJob({ data: { captureId, ...(settingsKey ? { settingsKey } : {}) }, attemptsMade: 0, opts: { attempts: 1 }, updateProgress: async () => {} }, { store })
}

/** The WAV bytes of a synthetic room with one T60 in every octave band (seeded). */
export function synthesizedRoomWav(options: { t60S: number; seed: number }): Uint8Array {
  const impulse = synthesizeRoomImpulse({
    sampleRateHz: 48_000,
    durationS: Math.max(1.5, options.t60S * 2.5),
    bandDecays: OCTAVES_HZ.map((centreHz) => ({ centreHz, T60S: options.t60S })),
    noiseFloorDb: -95,
    seed: options.seed,
    directDelayMs: 5,
  })
  return encodeWav(impulse, { sampleRateHz: 48_000, encoding: 'float32' })
}

/** Adds one synthetic position to a survey and analyses it in-process with the default settings. */
export async function addAnalysedCapture(survey: Survey, options: { t60S: number; seed: number; store: ObjectStore; label: string; uploadedById?: number | null }): Promise<Capture> {
  const bytes = synthesizedRoomWav(options)
  const sha256 = await storeContentBytes(options.store, bytes)
  const capture = await Capture.create({
    surveyId: survey.id, uploadedById: options.uploadedById ?? null, kind: 'impulse', receiverLabel: options.label,
    positionXM: null, positionYM: null, positionZM: null, sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null,
    originalName: `${options.label.replace(/\W+/g, '-').toLowerCase()}.wav`, sha256, byteSize: bytes.length, sampleRateHz: 48_000, bitDepth: 32, channelCount: 1,
    durationS: readWavFacts(bytes).durationS,
  })
  await analyseInProcess(capture.id, options.store)
  return capture
}

/** A survey whose positions are synthetic rooms with one T60 in every band, analysed in-process. */
export async function createAnalysedSurvey(room: Room, options: { name: string; t60S: number; positions: number; store: ObjectStore; seed: number }): Promise<Survey> {
  const survey = await Survey.create({ roomId: room.id, name: options.name, measuredOn: '2026-05-01', temperatureC: 20, humidityPercent: 50 })
  for (let position = 0; position < options.positions; position++) {
    await addAnalysedCapture(survey, { t60S: options.t60S, seed: options.seed + position, store: options.store, label: `Position ${position + 1}` })
  }
  return survey
}
