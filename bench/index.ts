import { resourceUsage } from 'node:process'
import { execFileSync } from 'node:child_process'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../shared/acoustics/analyseCapture'
import { deconvolveSweep } from '../shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from '../shared/acoustics/sweep/generateSweep'
import { fftConvolve } from '../shared/acoustics/fft/fftConvolve'
import { benchImpulse } from './benchImpulse'
import { measure, type Measurement } from './measure'

// Targets from issue #3 (2-core machine): 10 s 48 kHz IR full analysis < 400 ms,
// 10 s 48 kHz sweep deconvolution < 300 ms, peak memory < 250 MB.
const maxRssMb = () => resourceUsage().maxRSS / 1024 // kilobytes (Node docs, process.resourceUsage)

const results: Measurement[] = []
for (const sampleRateHz of [48000, 96000]) {
  for (const durationS of [1, 5, 10]) {
    const impulse = benchImpulse(sampleRateHz, durationS)
    for (const bands of ['octave', 'third'] as const) {
      const settings = { ...DEFAULT_ANALYSIS_SETTINGS, bands }
      results.push(measure(`IR ${durationS} s ${sampleRateHz / 1000} kHz ${bands}`, () => analyseCapture(impulse, { sampleRateHz, kind: 'impulse', settings })))
    }
  }
}

const impulseCasesPeakMb = maxRssMb()
const sampleRateHz = 48000
const sweep = generateSweep({ sampleRateHz, f1Hz: 20, f2Hz: 20000, durationS: 10, trailingSilenceS: 1 })
const recording = fftConvolve(sweep.samples, benchImpulse(sampleRateHz, 1)).subarray(0, sweep.samples.length)
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
console.log(`peak memory (max RSS) after the impulse cases: ${impulseCasesPeakMb.toFixed(0)} MB; after the sweep cases: ${maxRssMb().toFixed(0)} MB`)

// Peak memory of single analyses, each in its own process (the figure the 250 MB target is about).
for (const [rate, seconds, bands] of [['48000', '10', 'octave'], ['48000', '10', 'third'], ['96000', '10', 'third']] as const) {
  const peakMb = execFileSync(process.execPath, ['--import', 'tsx', 'bench/peakMemory.ts', rate, seconds, bands], { encoding: 'utf8' }).trim()
  console.log(`peak memory (max RSS) of one ${seconds} s ${Number(rate) / 1000} kHz ${bands} analysis in a fresh process: ${peakMb} MB`)
}
