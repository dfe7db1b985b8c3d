import { generateSweep } from './shared/acoustics/sweep/generateSweep'
import { inverseSweep } from './shared/acoustics/sweep/inverseSweep'
import { fftConvolve, forwardRealFft, nextPowerOfTwo } from './shared/acoustics/fft'
const fs = 48000
for (const T of [10, 2, 0.5]) {
  const o = { f1Hz: 20, f2Hz: 20000, durationS: T, sampleRateHz: fs }
  const { samples } = generateSweep(o)
  const inv = inverseSweep(o)
  let t = performance.now()
  const y = fftConvolve(samples, inv)
  const ct = performance.now() - t
  let pk = 0; for (let i = 0; i < y.length; i++) if (Math.abs(y[i]!) > Math.abs(y[pk]!)) pk = i
  const size = nextPowerOfTwo(y.length)
  const s = forwardRealFft(y.subarray(0, y.length), { size })
  const df = fs / size
  let mn = 99, mx = -99
  for (const f of [40, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 10000]) {
    const k = Math.round(f / df)
    const db = 10 * Math.log10(s.re[k]! ** 2 + s.im[k]! ** 2)
    mn = Math.min(mn, db); mx = Math.max(mx, db)
  }
  console.log(T, 'peak', pk, 'expected', samples.length - 1, 'val', y[pk], 'band dB', mn.toFixed(3), mx.toFixed(3), 'conv ms', ct.toFixed(0))
}
