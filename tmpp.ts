import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
import { fractionalOctaveBands } from './shared/acoustics/bands/fractionalOctaveBands'
import { designBandFilter } from './shared/acoustics/filters/designBandFilter'
import { applySos } from './shared/acoustics/filters/applySos'
import { analyseDecay } from './shared/acoustics/decay/analyseDecay'
import { toEnergy } from './shared/acoustics/decay/toEnergy'
import { suffixEnergySums } from './shared/acoustics/decay/schroederIntegral'
import { lundebyTruncation } from './shared/acoustics/decay/lundebyTruncation'
const fs = 48000
const ir = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 10, bandDecays: [125,1000].map(c => ({centreHz: c, T60S: 0.8})), noiseFloorDb: -90, seed: 3 })
const bands = fractionalOctaveBands({ bandsPerOctave: 3, sampleRateHz: fs })
const out = new Float64Array(ir.length), e = new Float64Array(ir.length), s = new Float64Array(ir.length+1)
for (let rep = 0; rep < 3; rep++) {
  let tD=0,tF=0,tA=0,tE=0,tL=0
  for (const b of bands) {
    let t=performance.now(); const f = designBandFilter(b, 3, fs); tD += performance.now()-t
    t=performance.now(); applySos(f.filter, ir, { output: out, timeReversed: true }); tF += performance.now()-t
    t=performance.now(); toEnergy(out, e); suffixEnergySums(e, s); tE += performance.now()-t
    t=performance.now(); lundebyTruncation(e, s, { sampleRateHz: fs, initialWindowS: 0.02 }); tL += performance.now()-t
    t=performance.now(); analyseDecay(out, { sampleRateHz: fs, centreHz: b.nominalHz, isTimeReversed: true, workspace: { energy: e, suffix: s } }); tA += performance.now()-t
  }
  console.log({tD,tF,tE,tL,tA})
}
