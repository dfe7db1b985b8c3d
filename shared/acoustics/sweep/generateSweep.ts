import { renderSweep } from './renderSweep'
import { resolveSweepOptions, type SweepOptions } from './sweepOptions'
import { sweepRateS } from './sweepRate'

/** Everything needed to deconvolve a recording of the sweep later. */
export interface SweepParameters {
  f1Hz: number
  f2Hz: number
  durationS: number
  sampleRateHz: number
  /** Peak level, dBFS, and the same as an amplitude (1 = full scale). */
  levelDb: number
  amplitude: number
  fadeInS: number
  fadeOutS: number
  leadingSilenceS: number
  trailingSilenceS: number
  /** L = T/ln(f2/f1), s. */
  sweepRateS: number
  /** Index of the sweep's first sample in `samples` (= the leading silence in samples). */
  sweepStartSample: number
  sweepSampleCount: number
  totalSampleCount: number
}

/**
 * Exponential sine sweep test signal (Farina 2000; ISO 18233:2006 Annex B):
 * x(t) = A·sin(2π·f1·L·(e^(t/L) − 1)), L = T/ln(f2/f1), A = 10^(levelDb/20), with half-Hann fades,
 * after `leadingSilenceS` of silence and followed by `trailingSilenceS` (record long enough for the
 * room to decay by more than 30 dB in every band, ISO 18233 6.3.2).
 * Play it at a low volume first and raise it slowly: sweeps are loud and can damage hearing and
 * loudspeakers.
 * @throws DspInputError 'bad-sweep-options' for invalid options
 */
export function generateSweep(options: SweepOptions): { samples: Float64Array; parameters: SweepParameters } {
  const resolved = resolveSweepOptions(options)
  const { sampleRateHz, levelDb } = resolved
  const sweep = renderSweep(resolved)
  const amplitude = Math.pow(10, levelDb / 20)
  const sweepStartSample = Math.round(resolved.leadingSilenceS * sampleRateHz)
  const totalSampleCount = sweepStartSample + sweep.length + Math.round(resolved.trailingSilenceS * sampleRateHz)
  const samples = new Float64Array(totalSampleCount)
  for (let n = 0; n < sweep.length; n++) samples[sweepStartSample + n] = amplitude * (sweep[n] as number)
  return {
    samples,
    parameters: {
      ...resolved,
      amplitude,
      sweepRateS: sweepRateS(resolved.f1Hz, resolved.f2Hz, resolved.durationS),
      sweepStartSample,
      sweepSampleCount: sweep.length,
      totalSampleCount,
    },
  }
}
