import type { ResolvedSweepOptions } from './sweepOptions'
import { sweepRateS } from './sweepRate'

/**
 * The exponential sweep itself, unit amplitude, without silences:
 * x[n] = w[n]·sin(2π·f1·L·(e^(t/L) − 1)), t = n/fs, n = 0 … round(T·fs) − 1, L = T/ln(f2/f1)
 * (Farina 2000; ISO 18233:2006 B.3.2), with w a half-Hann fade-in and fade-out (B.3.3).
 */
export function renderSweep(options: ResolvedSweepOptions): Float64Array {
  const { f1Hz, f2Hz, durationS, sampleRateHz, fadeInS, fadeOutS } = options
  const sampleCount = Math.round(durationS * sampleRateHz)
  const rateS = sweepRateS(f1Hz, f2Hz, durationS)
  const phaseScale = 2 * Math.PI * f1Hz * rateS
  // e^(t/L) by recurrence: one multiply per sample instead of one exp.
  const growthPerSample = Math.exp(1 / (rateS * sampleRateHz))
  const sweep = new Float64Array(sampleCount)
  let growth = 1
  for (let n = 0; n < sampleCount; n++) {
    // Re-seed the recurrence now and then so rounding cannot drift over millions of samples.
    if ((n & 4095) === 0) growth = Math.exp(n / (rateS * sampleRateHz))
    sweep[n] = Math.sin(phaseScale * (growth - 1))
    growth *= growthPerSample
  }
  applyHalfHannFades(sweep, Math.round(fadeInS * sampleRateHz), Math.round(fadeOutS * sampleRateHz))
  return sweep
}

/** Half-Hann rise over the first `fadeInSamples` and fall over the last `fadeOutSamples`, in place. */
function applyHalfHannFades(signal: Float64Array, fadeInSamples: number, fadeOutSamples: number): void {
  for (let n = 0; n < fadeInSamples; n++) {
    signal[n] = (signal[n] as number) * 0.5 * (1 - Math.cos((Math.PI * n) / fadeInSamples))
  }
  const last = signal.length - 1
  for (let m = 0; m < fadeOutSamples; m++) {
    signal[last - m] = (signal[last - m] as number) * 0.5 * (1 - Math.cos((Math.PI * m) / fadeOutSamples))
  }
}
