import { forwardRealFft } from '../fft/forwardRealFft'
import { inverseRealFft } from '../fft/inverseRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'

/**
 * Low-pass filters a signal by FFT (unity gain up to `passHz`, a raised-cosine roll-off to zero at
 * `stopHz`, zero above) and keeps every `factor`-th sample. Zero-phase and circular: meant for a
 * segment that is zero-padded well past its end, as the waterfall uses it. stopHz must be below
 * half the new rate fs/factor so nothing aliases.
 * @returns ⌈length/factor⌉ samples at fs/factor
 */
export function lowPassDecimate(
  signal: Float64Array,
  options: { sampleRateHz: number; factor: number; passHz: number; stopHz: number },
): Float64Array {
  const { sampleRateHz, factor, passHz, stopHz } = options
  const size = Math.max(4, nextPowerOfTwo(signal.length))
  const spectrum = forwardRealFft(signal, { size })
  const binHz = sampleRateHz / size
  for (let k = 0; k < spectrum.re.length; k++) {
    const f = k * binHz
    if (f <= passHz) continue
    const gain = f >= stopHz ? 0 : 0.5 * (1 + Math.cos((Math.PI * (f - passHz)) / (stopHz - passHz)))
    spectrum.re[k] = (spectrum.re[k] as number) * gain
    spectrum.im[k] = (spectrum.im[k] as number) * gain
  }
  const filtered = inverseRealFft(spectrum)
  const decimated = new Float64Array(Math.ceil(signal.length / factor))
  for (let i = 0; i < decimated.length; i++) decimated[i] = filtered[i * factor] as number
  return decimated
}
