import { deconvolveSweep } from './shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from './shared/acoustics/sweep/generateSweep'
import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
import { computeEnergyTimeCurve } from './shared/acoustics/response/computeEnergyTimeCurve'
import { computeFrequencyResponse } from './shared/acoustics/response/computeFrequencyResponse'
import { computeWaterfall } from './shared/acoustics/response/computeWaterfall'
const fs = 48000
const bands = [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((c) => ({ centreHz: c, T60S: 0.4 }))
for (let r = 0; r < 3; r++) {
  let t = performance.now()
  const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 10, seed: r, noiseFloorDb: -90, bandDecays: bands })
  const ts = performance.now() - t
  t = performance.now(); computeEnergyTimeCurve(ir, { sampleRateHz: fs, onsetSample: 0 }); const te = performance.now() - t
  t = performance.now(); computeFrequencyResponse(ir, { sampleRateHz: fs, onsetSample: 0, smoothingFraction: 6 }); const tf = performance.now() - t
  t = performance.now(); computeWaterfall(ir, { sampleRateHz: fs, onsetSample: 0 }); const tw = performance.now() - t
  console.log('synth10s', ts.toFixed(0), 'etc', te.toFixed(0), 'fr', tf.toFixed(0), 'wf', tw.toFixed(0))
}
const { samples } = generateSweep({ f1Hz: 20, f2Hz: 20000, durationS: 10, sampleRateHz: fs, trailingSilenceS: 2 })
for (let r = 0; r < 4; r++) {
  const t = performance.now()
  deconvolveSweep(samples, { sampleRateHz: fs, sweep: { f1Hz: 20 + r, f2Hz: 20000, durationS: 10 } })
  console.log('uncached deconv', (performance.now() - t).toFixed(0))
}
