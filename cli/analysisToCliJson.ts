import type { AnalysisResult, AnalysisWarning, DecayParameters } from '../shared/types/analysis'

function decayFields(parameters: DecayParameters) {
  const { T20, T30, EDT, C50, C80, D50, Ts, decayRangeDb, peakToNoiseDb, curvaturePercent, uncertaintyT20, uncertaintyT30, fitR2, warnings } = parameters
  return { T20, T30, EDT, C50, C80, D50, Ts, decayRangeDb, peakToNoiseDb, curvaturePercent, uncertaintyT20, uncertaintyT30, fitR2, warnings }
}

/**
 * The CLI's JSON: the fields issue #3 promises (sampleRate, kind, bands[…], broadband,
 * frequencyResponse) first, then extras. Seconds, dB, D50 as 0..1, null where not computable.
 */
export function analysisToCliJson(result: AnalysisResult, extras: { file: string; channel: number; inputWarnings: AnalysisWarning[] }) {
  return {
    sampleRate: result.sampleRate,
    kind: result.kind,
    bands: result.bands.map((band) => ({ centreHz: band.centreHz, exactCentreHz: band.exactCentreHz, ...decayFields(band) })),
    broadband: decayFields(result.broadband),
    frequencyResponse: { frequencyHz: result.frequencyResponse.frequencyHz, magnitudeDb: result.frequencyResponse.magnitudeDb },
    file: extras.file,
    channel: extras.channel,
    durationS: result.durationS,
    onsetMs: result.onsetMs,
    settings: result.settings,
    engineVersion: result.engineVersion,
    distortion: result.distortion,
    warnings: result.warnings,
  }
}
