import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS, synthesizeRoomImpulse, generateSweep } from './shared/acoustics/index'
import { fftConvolve } from './shared/acoustics/fft/fftConvolve'
const fs = 48000
const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 10, bandDecays: [63,125,250,500,1000,2000,4000,8000].map(c => ({centreHz: c, T60S: 0.6})), noiseFloorDb: -90, seed: 3, directDelayMs: 5 })
for (let i = 0; i < 4; i++) { const t = performance.now(); const r = analyseCapture(ir, { sampleRateHz: fs, kind: 'impulse', settings: { ...DEFAULT_ANALYSIS_SETTINGS, bands: i%2 ? 'third':'octave' } }); console.log(performance.now()-t, JSON.stringify(r).length, r.bands.map(b=>b.T30?.toFixed(2)).join(' ')) }
const sw = generateSweep({ sampleRateHz: fs, f1Hz: 20, f2Hz: 20000, durationS: 10 } as any)
console.log(sw.parameters)
