import type { SweepParameters } from '@/api/testSignal'

/** Silence the sweep endpoint puts before and after the sweep, s (server/routes: sweep.wav). */
export const SWEEP_LEAD_SILENCE_S = 0.5
export const SWEEP_TAIL_SILENCE_S = 2
/** Extra recording for output and input latency of the sound card, s (common practice). */
export const LATENCY_MARGIN_S = 0.5

/** Rates the sweep endpoint serves (shared/api/results.ts sweepQuerySchema). */
const SERVED_RATES_HZ = [44_100, 48_000, 88_200, 96_000]

export interface SweepChoice {
  f1Hz: number
  f2Hz: number
  durationS: number
  levelDb: number
}

export interface SweepRecordingPlan {
  /** What to ask GET /api/test-signal/sweep.wav for. */
  parameters: SweepParameters
  /** How long to record, s: lead silence + sweep + tail silence + latency margin. */
  recordDurationS: number
  /** Samples to record at the context's rate. */
  recordSampleCount: number
}

/**
 * Plans one sweep capture: fetch the sweep at the audio context's own rate where the endpoint
 * serves it (no resampling on decode), else at 48 kHz (the browser resamples; the sweep's
 * f1, f2 and duration, which the analysis uses, do not change with the rate).
 */
export function sweepRecordingPlan(choice: SweepChoice, contextSampleRateHz: number): SweepRecordingPlan {
  const rateHz = SERVED_RATES_HZ.includes(contextSampleRateHz) ? contextSampleRateHz : 48_000
  const recordDurationS = SWEEP_LEAD_SILENCE_S + choice.durationS + SWEEP_TAIL_SILENCE_S + LATENCY_MARGIN_S
  return {
    parameters: { ...choice, f2Hz: Math.min(choice.f2Hz, Math.floor(rateHz / 2) - 1), sampleRateHz: rateHz },
    recordDurationS,
    recordSampleCount: Math.ceil(recordDurationS * contextSampleRateHz),
  }
}
