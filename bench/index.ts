import { resourceUsage } from 'node:process'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../shared/acoustics/analyseCapture'
import { deconvolveSweep } from '../shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from '../shared/acoustics/sweep/generateSweep'
import { synthesizeRoomImpulse } from '../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { fftConvolve } from '../shared/acoustics/fft/fftConvolve'
import { measure, type Measurement } from './measure'

// Targets from issue #3 (2-core machine): 10 s 48 kHz IR full analysis < 400 ms,
// 10 s 48 kHz sweep deconvolution < 300 ms, peak memory < 250 MB.
const OCTAVE_CENTRES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000]

function roomImpulse(sampleRateHz: number, durationS: number): Float64Array {
  const bandDecays = OCTAVE_CENTRES_HZ.map((centreHz) => ({ centreHz, T60S: centreHz < 250 ? 0.9 : 0.6 }))
  return synthesizeRoomImpulse({ sampleRateHz, durationS, bandDecays, noiseFloorDb: -85, seed: 7, directDelayMs: 3 })
}

const results: Measurement[] = []
for (const sampleRateHz of [48000, 96000]) {
  for (const durationS of [1, 5, 10]) {
    const impulse = roomImpulse(sampleRateHz, durationS)
    for (const bands of ['octave', 'third'] as const) {
      const settings = { ...DEFAULT_ANALYSIS_SETTINGS, bands }
      results.push(measure(`IR ${durationS} s ${sampleRateHz / 1000} kHz ${bands}`, () => analyseCapture(impulse, { sampleRateHz, kind: 'impulse', settings })))
    }
  }
}

const sampleRateHz = 48000
const sweep = generateSweep({ sampleRateHz, f1Hz: 20, f2Hz: 20000, durationS: 10, trailingSilenceS: 1 })
const recording = fftConvolve(sweep.samples, roomImpulse(sampleRateHz, 1)).subarray(0, sweep.samples.length)
const sweepParameters = { f1Hz: 20, f2Hz: 20000, durationS: 10 }
results.push(measure('sweep 10 s 48 kHz deconvolution', () => deconvolveSweep(recording, { sampleRateHz, sweep: sweepParameters })))
results.push(
  measure('sweep 10 s 48 kHz deconvolve + analyse (octave)', () =>
    analyseCapture(recording, { sampleRateHz, kind: 'sweep', sweep: sweepParameters, settings: DEFAULT_ANALYSIS_SETTINGS }),
  ),
)

const width = Math.max(...results.map((result) => result.label.length))
console.log(`${'case'.padEnd(width)}  median ms  best ms  runs`)
for (const result of results) {
  console.log(`${result.label.padEnd(width)}  ${result.medianMs.toFixed(0).padStart(9)}  ${result.minMs.toFixed(0).padStart(7)}  ${result.runs}`)
}
// maxRSS is in kilobytes (Node docs, process.resourceUsage).
console.log(`peak memory (max RSS): ${(resourceUsage().maxRSS / 1024).toFixed(0)} MB; heap used now ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(0)} MB`)
