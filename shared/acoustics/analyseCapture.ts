import { ANALYSIS_SCHEMA_VERSION, type AnalysisResult, type AnalysisSettings, type AnalysisWarning, type CaptureKind, type DistortionBand } from '../types/analysis'
import { analyseBandDecays } from './analyseBandDecays'
import { analyseDecay } from './decay/analyseDecay'
import { ENGINE_VERSION } from './engineVersion'
import { DspInputError } from './errors'
import { findImpulseOnset } from './onset'
import { computeEnergyTimeCurve } from './response/computeEnergyTimeCurve'
import { computeFrequencyResponse } from './response/computeFrequencyResponse'
import { computeWaterfall } from './response/computeWaterfall'
import { deconvolveSweep } from './sweep/deconvolveSweep'
import { validateSignal } from './validateSignal'

export interface AnalyseCaptureOptions {
  sampleRateHz: number
  kind: CaptureKind
  settings: AnalysisSettings
  /** Parameters of the exponential sweep played (kind 'sweep'). */
  sweep?: { f1Hz: number; f2Hz: number; durationS: number }
  /** Or the sweep itself, as played (kind 'sweep'). */
  referenceSweep?: Float64Array
  /** Warnings found earlier (e.g. by decodeWav: clipping, DC offset), passed through. */
  inputWarnings?: AnalysisWarning[]
}

/** Shortest capture analysed, s: a 35 dB decay of a 0.2 s room takes 0.12 s. */
export const MIN_ANALYSIS_DURATION_S = 0.1
/** Shortest response after the onset, s. */
const MIN_DECAY_DURATION_S = 0.05

export const DEFAULT_ANALYSIS_SETTINGS: AnalysisSettings = { bands: 'octave', smoothing: 6, channel: 0, gateMs: null, timeReversedFiltering: true }

function toImpulse(samples: Float64Array, options: AnalyseCaptureOptions): { impulse: Float64Array; distortion: DistortionBand[] | null } {
  if (options.kind === 'impulse') return { impulse: samples, distortion: null }
  if (!options.sweep && !options.referenceSweep) {
    throw new DspInputError('missing-sweep', 'A sweep recording needs the sweep parameters (f1, f2, duration) or the reference sweep.')
  }
  return deconvolveSweep(samples, { sampleRateHz: options.sampleRateHz, sweep: options.sweep, referenceSweep: options.referenceSweep })
}

/** Waterfall 20–300 Hz when the response is long enough to slice; otherwise none. */
function lowFrequencyWaterfall(impulse: Float64Array, sampleRateHz: number, onsetSample: number) {
  try {
    return computeWaterfall(impulse, { sampleRateHz, onsetSample })
  } catch (error) {
    if (error instanceof DspInputError) return null
    throw error
  }
}

/**
 * The whole analysis of one capture: (deconvolve a sweep recording) → ISO 3382-1 onset on the
 * broadband response → frequency response, energy-time curve, low-frequency waterfall →
 * per-band and broadband decay parameters with validity flags. Curves are decimated for charts.
 * @param samples the impulse response, or the sweep recording (kind 'sweep')
 * @throws DspInputError for unusable input (empty, silent, non-finite, too short, missing sweep)
 */
export function analyseCapture(samples: Float64Array, options: AnalyseCaptureOptions): AnalysisResult {
  const { sampleRateHz, kind, settings } = options
  validateSignal(samples, { sampleRateHz, minDurationS: MIN_ANALYSIS_DURATION_S, label: kind === 'sweep' ? 'sweep recording' : 'impulse response' })
  const { impulse, distortion } = toImpulse(samples, options)
  validateSignal(impulse, { sampleRateHz, label: 'impulse response' })
  const { onsetSample } = findImpulseOnset(impulse)
  if ((impulse.length - onsetSample) / sampleRateHz < MIN_DECAY_DURATION_S) {
    throw new DspInputError('too-short', `The response lasts less than ${MIN_DECAY_DURATION_S * 1000} ms after its onset; record longer after the sound stops.`)
  }
  const isTimeReversed = settings.timeReversedFiltering
  const broadband = analyseDecay(impulse.subarray(onsetSample), { sampleRateHz, centreHz: null, isTimeReversed })
  const perBand = analyseBandDecays(impulse, { sampleRateHz, onsetSample, bands: settings.bands, isTimeReversed })
  const frequencyResponse = computeFrequencyResponse(impulse, { sampleRateHz, smoothingFraction: settings.smoothing, gateMs: settings.gateMs, onsetSample })
  return {
    schemaVersion: ANALYSIS_SCHEMA_VERSION,
    engineVersion: ENGINE_VERSION,
    settings,
    sampleRate: sampleRateHz,
    kind,
    onsetSample,
    onsetMs: (1000 * onsetSample) / sampleRateHz,
    durationS: impulse.length / sampleRateHz,
    bands: perBand.bands,
    broadband: broadband.parameters,
    frequencyResponse,
    energyTime: computeEnergyTimeCurve(impulse, { sampleRateHz, onsetSample }),
    decays: [broadband.curve, ...perBand.decays],
    waterfall: lowFrequencyWaterfall(impulse, sampleRateHz, onsetSample),
    distortion,
    warnings: [...(options.inputWarnings ?? []), ...broadband.parameters.warnings.filter((warning) => warning.code === 'low-snr')],
  }
}
