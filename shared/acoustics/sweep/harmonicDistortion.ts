import type { DistortionBand } from '../../types/analysis'
import { fractionalOctaveBands } from '../bands/fractionalOctaveBands'
import { forwardRealFft } from '../fft/forwardRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'
import type { HarmonicWindow } from './separateHarmonics'

/** Mean |H|² over the bins from lowHz to highHz (the nearest bin when the range holds none). */
function meanPower(re: Float64Array, im: Float64Array, binHz: number, lowHz: number, highHz: number): number {
  const low = Math.ceil(lowHz / binHz)
  const high = Math.min(re.length - 1, Math.floor(highHz / binHz))
  if (high < low) {
    const k = Math.min(re.length - 1, Math.round((0.5 * (lowHz + highHz)) / binHz))
    return (re[k] as number) ** 2 + (im[k] as number) ** 2
  }
  let sum = 0
  for (let k = low; k <= high; k++) sum += (re[k] as number) ** 2 + (im[k] as number) ** 2
  return sum / (high - low + 1)
}

/**
 * Harmonic distortion per octave band of the fundamental (IEC 61260-1 octave edges). The k-th
 * order response evaluated at k·f carries the k-th harmonic of an excitation at f, with the same
 * sweep rate as the fundamental at k·f, so its level re the fundamental is
 * L_k = 10·lg( mean|H_k|² over [k·f_lo, k·f_hi] / mean|H_1|² over [f_lo, f_hi] ) dB
 * (Farina 2000; Novák et al., JAES 63(10), 2015). THD = 100·√(Σ_k 10^(L_k/10)) %, relative to the
 * fundamental, over the orders whose band lies inside the sweep.
 * A level is null where k·f_hi exceeds the sweep's top (or 0.45·fs): the sweep never excited it.
 * Bands whose fundamental lies outside f1…f2 are left out.
 */
export function harmonicDistortion(
  windows: readonly HarmonicWindow[],
  options: { sampleRateHz: number; f1Hz: number; f2Hz: number },
): DistortionBand[] {
  const { sampleRateHz, f1Hz, f2Hz } = options
  const bands = fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 31.5, maxNominalHz: 16000, sampleRateHz })
    .filter((band) => band.lowerEdgeHz >= f1Hz && band.upperEdgeHz <= f2Hz)
  const spectra = windows.map((window) => {
    const size = Math.max(4, nextPowerOfTwo(Math.max(window.impulse.length, window.linear.length)))
    return { order: window.order, binHz: sampleRateHz / size, harmonic: forwardRealFft(window.impulse, { size }), linear: forwardRealFft(window.linear, { size }) }
  })
  return bands.map((band) => {
    let sumRatio = 0
    let hasAny = false
    const harmonicsDb = spectra.map(({ order, binHz, harmonic, linear }) => {
      if (order * band.upperEdgeHz > Math.min(f2Hz, 0.45 * sampleRateHz)) return { order, levelDb: null }
      const fundamental = meanPower(linear.re, linear.im, binHz, band.lowerEdgeHz, band.upperEdgeHz)
      const product = meanPower(harmonic.re, harmonic.im, binHz, order * band.lowerEdgeHz, order * band.upperEdgeHz)
      if (!(fundamental > 0)) return { order, levelDb: null }
      const ratio = product / fundamental
      sumRatio += ratio
      hasAny = true
      return { order, levelDb: ratio > 0 ? 10 * Math.log10(ratio) : null }
    })
    return { centreHz: band.nominalHz, harmonicsDb, thdPercent: hasAny ? 100 * Math.sqrt(sumRatio) : null }
  })
}
