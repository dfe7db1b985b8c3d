import { renderSweep } from './renderSweep'
import { resolveSweepOptions, type SweepOptions } from './sweepOptions'
import { sweepRateS } from './sweepRate'

/**
 * Inverse filter of the exponential sweep (Farina 2000; ISO 18233:2006 B.5, Fig. B.2): the
 * time-reversed sweep times the amplitude envelope e^(−t/L) — equal to f/f2, f the instantaneous
 * frequency of the reversed sweep, i.e. +6 dB/octave — so that sweep ⊗ inverse is a band-limited
 * delta at index N − 1 (N = sweep length in samples).
 *
 * Normalisation: by the stationary-phase approximation the sweep's spectrum is
 * |X(f)| = (A·fs/2)·√(L/f) and the inverse's |V(f)| = (s·fs/2)·√(L/f)·f/f2, so
 * s = 4·f2/(A·L·fs²) gives |X·V| = 1 (unit gain) over the band between the fades.
 * Silences in the options are ignored; the level is the level of the sweep that was played.
 * @returns N samples
 */
export function inverseSweep(options: SweepOptions): Float64Array {
  const resolved = resolveSweepOptions(options)
  const { f1Hz, f2Hz, durationS, sampleRateHz, levelDb } = resolved
  const sweep = renderSweep(resolved)
  const rateS = sweepRateS(f1Hz, f2Hz, durationS)
  const amplitude = Math.pow(10, levelDb / 20)
  const scale = (4 * f2Hz) / (amplitude * rateS * sampleRateHz * sampleRateHz)
  const last = sweep.length - 1
  const inverse = new Float64Array(sweep.length)
  // Sample n of the inverse is sweep sample last − n, played at t = (last − n)/fs; f/f2 = e^((t − T)/L).
  const envelopeAt = (n: number) => Math.exp(((last - n) / sampleRateHz - durationS) / rateS)
  const decayPerSample = Math.exp(-1 / (rateS * sampleRateHz))
  let envelope = 1
  for (let n = 0; n <= last; n++) {
    // A recurrence instead of one exp per sample, re-seeded now and then against drift.
    if ((n & 4095) === 0) envelope = envelopeAt(n)
    inverse[n] = scale * envelope * (sweep[last - n] as number)
    envelope *= decayPerSample
  }
  return inverse
}
