import { fftConvolve } from './shared/acoustics/fft/fftConvolve'
import { computeFrequencyResponse } from './shared/acoustics/response/computeFrequencyResponse'
import { deconvolveSweep } from './shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from './shared/acoustics/sweep/generateSweep'
import { synthesizeRoomImpulse } from './shared/acoustics/synthetic/synthesizeRoomImpulse'
const fs = 48000
const so = { f1Hz: 20, f2Hz: 20000, durationS: 3, leadingSilenceS: 0.2 }
const { samples: sweep, parameters } = generateSweep({ ...so, trailingSilenceS: 1, sampleRateHz: fs })
const room = synthesizeRoomImpulse({ sampleRateHz: fs, durationS: 0.6, seed: 3, noiseFloorDb: -100, directDelayMs: 4, reflections: [{ delayMs: 6, gainDb: -6 }],
  bandDecays: [125, 250, 500, 1000, 2000, 4000].map((centreHz) => ({ centreHz, T60S: 0.3 })) })
const rec = fftConvolve(sweep, room).slice(0, sweep.length)
const r = deconvolveSweep(rec, { sampleRateHz: fs, sweep: so })
const al = r.impulse.slice(r.timeZeroSample, r.timeZeroSample + room.length)
const o = { sampleRateHz: fs, smoothingFraction: 6 as const, pointCount: 60 }
const g = computeFrequencyResponse(al, o), w = computeFrequencyResponse(room, o)
console.log(g.frequencyHz.map((f, i) => `${f.toFixed(0)}:${(g.magnitudeDb[i]! - w.magnitudeDb[i]!).toFixed(2)}`).join(' '))
const a = 0.1
const delta = new Float64Array(2400); delta[192] = 1
const dist = fftConvolve(sweep.map((x) => x + a * x * x), delta).slice(0, sweep.length)
const d = deconvolveSweep(dist, { sampleRateHz: fs, sweep: so })
for (const b of d.distortion) console.log(b.centreHz, b.harmonicsDb.map((h) => h.levelDb?.toFixed(2)).join(' '), b.thdPercent?.toFixed(2))
console.log(d.harmonicImpulses.map((h) => h.impulse.length))
{
  const pre = 480
  const al2 = r.impulse.slice(r.timeZeroSample - pre, r.timeZeroSample + room.length)
  const padded = new Float64Array(room.length + pre); padded.set(room, pre)
  const g2 = computeFrequencyResponse(al2, o), w2 = computeFrequencyResponse(padded, o)
  console.log('with preroll', g2.frequencyHz.map((f, i) => `${f.toFixed(0)}:${(g2.magnitudeDb[i]! - w2.magnitudeDb[i]!).toFixed(2)}`).join(' '))
}
import { inverseSweep } from './shared/acoustics/sweep/inverseSweep'
{
  const y = fftConvolve(rec, inverseSweep({ ...so, sampleRateHz: fs }))
  const zero = Math.round(0.2 * fs) + 3 * fs - 1
  for (const preS of [0.01, 0.05, 0.15]) {
    const pre = Math.round(preS * fs)
    for (const postS of [0.6, 1.0]) {
      const post = Math.round(postS * fs)
      const seg = y.slice(zero - pre, zero + post)
      const padded = new Float64Array(pre + post); padded.set(room, pre)
      const g2 = computeFrequencyResponse(seg, o), w2 = computeFrequencyResponse(padded, o)
      let worst = 0
      g2.frequencyHz.forEach((f, i) => { if (f >= 30 && f <= 10000) worst = Math.max(worst, Math.abs(g2.magnitudeDb[i]! - w2.magnitudeDb[i]!)) })
      console.log('pre', preS, 'post', postS, 'worst dB 30Hz-10k', worst.toFixed(2))
    }
  }
}
