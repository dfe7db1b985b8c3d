import type { Transaction } from 'sequelize'
import { Capture, type Survey } from '../models'
import type { ObjectStore } from '../storage/createObjectStore'
import { storeContentBytes } from '../storage/storeContentBytes'
import { recordAnalysisRequest } from '../services/analysisJobsService'
import { defaultSettingsOf } from '../services/capturesService'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'

/**
 * The invented demo room's measured conditions, made by the engine's synthetic room model: per
 * octave the reverberation time of an untreated small room with a bass build-up, and the same
 * room after panels, a ceiling cloud and corner traps. Invented figures, not a measurement.
 */
const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000]
export const DEMO_CONDITIONS = {
  bare: { t60S: [0.95, 0.85, 0.62, 0.55, 0.5, 0.46, 0.42, 0.36], sideWallReflectionDb: -4 },
  treated: { t60S: [0.5, 0.36, 0.27, 0.22, 0.2, 0.19, 0.19, 0.18], sideWallReflectionDb: -14 },
} as const

const POSITIONS = [
  { receiverLabel: 'Mix position', x: 1.75, y: 1.7, z: 1.2, sideWallDelayMs: 3.1 },
  { receiverLabel: 'Mix position, 40 cm left', x: 1.75, y: 1.3, z: 1.2, sideWallDelayMs: 2.2 },
  { receiverLabel: 'Producer desk', x: 2.9, y: 1.7, z: 1.2, sideWallDelayMs: 4.6 },
]

const SAMPLE_RATE_HZ = 48_000

/** Writes one synthetic capture per position into storage and the database, a queued analysis (`uploaded`). */
export async function createDemoCaptures(survey: Survey, condition: keyof typeof DEMO_CONDITIONS, store: ObjectStore, transaction: Transaction): Promise<void> {
  for (const [index, position] of POSITIONS.entries()) {
    const { t60S, sideWallReflectionDb } = DEMO_CONDITIONS[condition]
    const impulse = synthesizeRoomImpulse({
      sampleRateHz: SAMPLE_RATE_HZ,
      durationS: 2.5,
      bandDecays: OCTAVES_HZ.map((centreHz, band) => ({ centreHz, T60S: t60S[band]! })),
      noiseFloorDb: -88,
      seed: 1000 + index + (condition === 'bare' ? 0 : 100),
      directDelayMs: 8,
      reflections: [{ delayMs: position.sideWallDelayMs, gainDb: sideWallReflectionDb }, { delayMs: 6.8, gainDb: sideWallReflectionDb - 3 }],
    })
    const bytes = encodeWav(impulse, { sampleRateHz: SAMPLE_RATE_HZ, encoding: 'pcm24' })
    const sha256 = await storeContentBytes(store, bytes, transaction)
    const capture = await Capture.create(
      {
        surveyId: survey.id,
        uploadedById: null,
        kind: 'impulse',
        sourceLabel: 'Left speaker',
        receiverLabel: position.receiverLabel,
        positionXM: position.x,
        positionYM: position.y,
        positionZM: position.z,
        sweepF1Hz: null,
        sweepF2Hz: null,
        sweepDurationS: null,
        referenceSha256: null,
        originalName: `demo-${condition}-position-${index + 1}.wav`,
        sha256,
        byteSize: bytes.length,
        sampleRateHz: SAMPLE_RATE_HZ,
        bitDepth: 24,
        channelCount: 1,
        durationS: impulse.length / SAMPLE_RATE_HZ,
      },
      { transaction },
    )
    // Its job record, not yet in the queue: the server's queue pass sends it once it runs.
    await recordAnalysisRequest(capture.id, defaultSettingsOf(capture), { transaction })
  }
}
