import { analyseBandDecays } from './shared/acoustics/analyseBandDecays'
import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
import { findImpulseOnset } from './shared/acoustics/onset'
for (const fs of [48000, 96000]) {
  const T = 0.8
  const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 10, bandDecays: [63,125,250,500,1000,2000,4000,8000,16000].map(c => ({centreHz: c, T60S: T})), noiseFloorDb: -90, seed: 3, directDelayMs: 5 })
  const { onsetSample } = findImpulseOnset(ir)
  for (const bands of ['octave', 'third'] as const) for (const tr of [false, true]) {
    const t0 = performance.now()
    const r = analyseBandDecays(ir, { sampleRateHz: fs, onsetSample, bands, isTimeReversed: tr })
    const dt = performance.now() - t0
    console.log(fs, bands, tr, dt.toFixed(0), 'ms', r.bands.map(b => `${b.centreHz}:${b.T20?.toFixed(3)}/${b.T30?.toFixed(3)}/${b.EDT?.toFixed(3)} C50=${b.C50?.toFixed(2)}`).join(' '))
  }
}
