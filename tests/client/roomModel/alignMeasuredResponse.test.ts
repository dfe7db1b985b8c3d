import { describe, expect, it } from 'vitest'
import { alignMeasuredResponse } from '@/roomModel/alignMeasuredResponse'

describe('alignMeasuredResponse', () => {
  it('returns the measured curve cut to 20–300 Hz and shifted by the difference of the 30–200 Hz means', () => {
    const measured = { frequencyHz: [10, 20, 50, 100, 150, 300, 1000], magnitudeDb: [0, 80, 82, 78, 80, 70, 60] }
    const predicted = { frequencyHz: [50, 100, 150], levelDb: [5, -5, 0] }
    // Means over 30–200 Hz: measured (82 + 78 + 80)/3 = 80 dB, predicted 0 dB → offset −80 dB.
    expect(alignMeasuredResponse(measured, predicted)).toEqual({ frequencyHz: [20, 50, 100, 150, 300], magnitudeDb: [0, 2, -2, 0, -10], offsetDb: -80 })
  })

  it('returns null when the measured curve has no value in the band', () => {
    expect(alignMeasuredResponse({ frequencyHz: [1000], magnitudeDb: [0] }, { frequencyHz: [50], levelDb: [0] })).toBeNull()
  })
})
