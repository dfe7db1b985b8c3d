import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '@shared/acoustics/analyseCapture'
import { synthesizeRoomImpulse } from '@shared/acoustics/synthetic/synthesizeRoomImpulse'
import type { AnalysisResult } from '@shared/types/analysis'

/** Octave bands the teacher sets, Hz (ISO 3382-2 reports 63 Hz – 8 kHz octaves for small rooms). */
export const LEARN_BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const

export interface LearnDemoSettings {
  /** Reverberation time per band of LEARN_BANDS_HZ, s, in the same order. */
  T60S: number[]
  /** Background noise per sample re the peak², dB (e.g. −70). */
  noiseFloorDb: number
  seed: number
}

export const LEARN_SAMPLE_RATE_HZ = 48_000
/** Direct sound after this much pre-delay, ms, so the onset search has silence to find. */
const DIRECT_DELAY_MS = 5

/**
 * Length of the synthetic response, s: the longest T60 plus 40 % shows the decay reach the noise
 * floor in every band, within 0.8–5 s to keep the browser responsive.
 */
export function learnDemoDurationS(T60S: readonly number[]): number {
  return Math.min(5, Math.max(0.8, 1.4 * Math.max(...T60S) + 0.1))
}

/**
 * The teaching demo's impulse response: a seeded synthetic room (exponentially decaying noise per octave band, the
 * classic diffuse-decay model), at 48 kHz.
 */
export function synthesizeLearnImpulse(settings: LearnDemoSettings): Float64Array {
  const bandDecays = LEARN_BANDS_HZ.map((centreHz, i) => ({ centreHz, T60S: settings.T60S[i] ?? 0.5 }))
  return synthesizeRoomImpulse({
    sampleRateHz: LEARN_SAMPLE_RATE_HZ,
    durationS: learnDemoDurationS(bandDecays.map((b) => b.T60S)),
    bandDecays,
    noiseFloorDb: settings.noiseFloorDb,
    seed: settings.seed,
    directDelayMs: DIRECT_DELAY_MS,
  })
}

/** The demo's response (synthesizeLearnImpulse) through the capture analysis, octave bands. */
export function runLearnDemo(settings: LearnDemoSettings): AnalysisResult {
  return analyseCapture(synthesizeLearnImpulse(settings), { sampleRateHz: LEARN_SAMPLE_RATE_HZ, kind: 'impulse', settings: { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'octave' } })
}
