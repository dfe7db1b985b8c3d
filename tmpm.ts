import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from './shared/acoustics/analyseCapture'
import { analyseBandDecays } from './shared/acoustics/analyseBandDecays'
import { computeFrequencyResponse } from './shared/acoustics/response/computeFrequencyResponse'
import { computeEnergyTimeCurve } from './shared/acoustics/response/computeEnergyTimeCurve'
import { computeWaterfall } from './shared/acoustics/response/computeWaterfall'
import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
const fs = 96000
const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 10, bandDecays: [125, 1000].map(c => ({centreHz: c, T60S: 0.6})), noiseFloorDb: -85, seed: 7, directDelayMs: 3 })
const rss = () => (process.resourceUsage().maxRSS/1024).toFixed(0)
console.log('after synth', rss())
const which = process.argv[2]
for (let i=0;i<3;i++){
if (which==='bands') analyseBandDecays(ir, { sampleRateHz: fs, onsetSample: 288, bands: 'third', isTimeReversed: true })
if (which==='fr') computeFrequencyResponse(ir, { sampleRateHz: fs, smoothingFraction: 6, onsetSample: 288 })
if (which==='etc') computeEnergyTimeCurve(ir, { sampleRateHz: fs, onsetSample: 288 })
if (which==='wf') computeWaterfall(ir, { sampleRateHz: fs, onsetSample: 288 })
if (which==='all') analyseCapture(ir, { sampleRateHz: fs, kind:'impulse', settings: {...DEFAULT_ANALYSIS_SETTINGS, bands:'third'} })
}
console.log(which, rss())
