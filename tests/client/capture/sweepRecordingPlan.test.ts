import { describe, expect, it } from 'vitest'
import { LATENCY_MARGIN_S, SWEEP_LEAD_SILENCE_S, SWEEP_TAIL_SILENCE_S, sweepRecordingPlan } from '@/capture/sweepRecordingPlan'

const choice = { f1Hz: 20, f2Hz: 20_000, durationS: 6, levelDb: -12 }

describe('sweepRecordingPlan', () => {
  it('returns the context rate for the sweep when the endpoint serves that rate', () => {
    expect(sweepRecordingPlan(choice, 44_100).parameters.sampleRateHz).toBe(44_100)
    expect(sweepRecordingPlan(choice, 96_000).parameters.sampleRateHz).toBe(96_000)
  })

  it('returns 48 kHz for the sweep when the context runs at a rate the endpoint does not serve', () => {
    expect(sweepRecordingPlan(choice, 32_000).parameters.sampleRateHz).toBe(48_000)
  })

  it('returns a recording as long as the lead silence, the sweep, the tail silence and the latency margin', () => {
    const plan = sweepRecordingPlan(choice, 48_000)

    expect(plan.recordDurationS).toBeCloseTo(SWEEP_LEAD_SILENCE_S + 6 + SWEEP_TAIL_SILENCE_S + LATENCY_MARGIN_S, 12)
    expect(plan.recordDurationS).toBeCloseTo(9, 12)
    expect(plan.recordSampleCount).toBe(9 * 48_000)
  })

  it('returns the chosen f1, f2, duration and level unchanged when f2 is below half the rate', () => {
    expect(sweepRecordingPlan(choice, 48_000).parameters).toEqual({ ...choice, sampleRateHz: 48_000 })
  })

  it('returns f2 just below Nyquist when the chosen end lies above half the rate', () => {
    expect(sweepRecordingPlan({ ...choice, f2Hz: 24_000 }, 44_100).parameters.f2Hz).toBe(22_049)
  })
})
