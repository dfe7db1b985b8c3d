import { generateSweep } from './shared/acoustics/sweep/generateSweep'
import { deconvolveSweep } from './shared/acoustics/sweep/deconvolveSweep'
import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
import { fftConvolve } from './shared/acoustics/fft'
const fs = 48000
let t = performance.now()
const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 1, seed: 7, noiseFloorDb: -90, directDelayMs: 3,
  bandDecays: [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((c) => ({ centreHz: c, T60S: 0.4 })) })
console.log('synth ms', performance.now() - t)
const sweepO = { f1Hz: 20, f2Hz: 20000, durationS: 10, sampleRateHz: fs, leadingSilenceS: 0.5, trailingSilenceS: 1.5 }
const { samples, parameters } = generateSweep(sweepO)
const a = 0.2
const distorted = samples.map((x) => x + a * x * x)
t = performance.now()
const rec = fftConvolve(distorted, ir).slice(0, samples.length)
console.log('conv ms', performance.now() - t, rec.length)
for (let r = 0; r < 4; r++) {
  t = performance.now()
  const d = deconvolveSweep(rec, { sampleRateHz: fs, sweep: { f1Hz: 20, f2Hz: 20000, durationS: 10, leadingSilenceS: 0.5 } })
  console.log('deconv ms', (performance.now() - t).toFixed(0), d.impulse.length, d.timeZeroSample, d.harmonicImpulses.map((h) => h.impulse.length), d.notes)
  if (r === 3) {
    // correlation with ir
    const z = d.timeZeroSample
    let sxy = 0, sxx = 0, syy = 0
    for (let i = 0; i < ir.length; i++) { const x = ir[i]!, y = d.impulse[z + i]!; sxy += x * y; sxx += x * x; syy += y * y }
    console.log('corr', sxy / Math.sqrt(sxx * syy), 'gain', Math.sqrt(syy / sxx))
    let pk = 0; for (let i = 0; i < d.impulse.length; i++) if (Math.abs(d.impulse[i]!) > Math.abs(d.impulse[pk]!)) pk = i
    console.log('peak at', pk - z, 'expected', 0.003 * fs)
    for (const b of d.distortion) console.log(b.centreHz, b.harmonicsDb.map((h) => h.levelDb?.toFixed(1)), b.thdPercent?.toFixed(2), 'expect', (20 * Math.log10(a * parameters.amplitude / 2)).toFixed(1))
  }
}
const ref = deconvolveSweep(rec, { sampleRateHz: fs, referenceSweep: samples })
console.log('ref', ref.sweepRateS, ref.notes, ref.timeZeroSample)
for (const b of ref.distortion) console.log(b.centreHz, b.harmonicsDb.map((h) => h.levelDb?.toFixed(1)), b.thdPercent?.toFixed(2))
