import { fftConvolve } from './shared/acoustics/fft/fftConvolve'
import { hilbertTransform } from './shared/acoustics/fft/hilbertTransform'
import { deconvolveSweep } from './shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from './shared/acoustics/sweep/generateSweep'
const fs = 48000
const so = { f1Hz: 20, f2Hz: 20000, durationS: 3, leadingSilenceS: 0.2 }
const { samples: sweep } = generateSweep({ ...so, trailingSilenceS: 1, sampleRateHz: fs })
const a = 0.1
const q = hilbertTransform(sweep)
const delta = new Float64Array(2400); delta[192] = 1
for (const variant of ['raw', 'nodc']) {
  const played = sweep.map((x, i) => x + a * (x * x - (variant === 'nodc' ? (x * x + q[i]! * q[i]!) / 2 : 0)))
  const dist = fftConvolve(played, delta).slice(0, sweep.length)
  const d = deconvolveSweep(dist, { sampleRateHz: fs, sweep: so })
  console.log(variant, d.distortion.map((b) => `${b.centreHz}:${b.harmonicsDb[0]?.levelDb?.toFixed(2)}`).join(' '))
}
