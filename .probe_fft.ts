import { forwardRealFft, inverseRealFft, fftConvolve } from './shared/acoustics/fft'
const N = 16
const x = new Float64Array(N).map((_, i) => Math.sin(i * 0.7) + 0.3 * i)
const s = forwardRealFft(x, { size: N })
let err = 0
for (let k = 0; k <= N / 2; k++) {
  let r = 0, im = 0
  for (let n = 0; n < N; n++) { r += x[n]! * Math.cos(2 * Math.PI * k * n / N); im -= x[n]! * Math.sin(2 * Math.PI * k * n / N) }
  err = Math.max(err, Math.abs(r - s.re[k]!), Math.abs(im - s.im[k]!))
}
const back = inverseRealFft(s)
let e2 = 0; for (let n = 0; n < N; n++) e2 = Math.max(e2, Math.abs(back[n]! - x[n]!))
console.log('fwd err', err, 'inv err', e2)
const c = fftConvolve(new Float64Array([1, 2, 3]), new Float64Array([0, 1, 0.5]))
console.log(Array.from(c))
for (const size of [1 << 20, 1 << 21]) {
  const big = new Float64Array(size).map(() => Math.random())
  forwardRealFft(big, { size })
  let t = performance.now()
  for (let i = 0; i < 3; i++) forwardRealFft(big, { size })
  console.log(size, 'fwd ms', (performance.now() - t) / 3)
  const sp = forwardRealFft(big, { size })
  t = performance.now()
  for (let i = 0; i < 3; i++) inverseRealFft(sp)
  console.log(size, 'inv ms', (performance.now() - t) / 3)
}
