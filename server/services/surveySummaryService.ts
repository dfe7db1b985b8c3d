import { Capture, type Survey } from '../models'
import { spatialAverage, type SpatialAverageBand } from '../../shared/acoustics/spatialAverage'
import type { SurveyBandReading, SurveySummaryDto } from '../../shared/api/results'
import type { AnalysisResult, BandResolution } from '../../shared/types/analysis'
import { latestAnalysesByCapture } from './analysisLookup'
import { getSurvey, requireSurveyAccess } from './surveysService'
import { averageDecayCurves } from './averageDecayCurves'

function isFlagged(results: AnalysisResult[], centreHz: number, parameter: 'T20' | 'T30'): boolean {
  return results.some((result) =>
    result.bands.some((band) => band.centreHz === centreHz && band[parameter] !== null && band.warnings.some((w) => w.parameters.includes(parameter))),
  )
}

/**
 * Which reverberation time a band is judged by: the mean T30 when every position's T30 is
 * unflagged, else the mean T20 on the same condition, else the band is not reliable.
 */
function readingOf(band: SpatialAverageBand, results: AnalysisResult[]): SurveyBandReading {
  for (const parameter of ['T30', 'T20'] as const) {
    const spread = band.parameters[parameter]
    if (spread.mean !== null && !isFlagged(results, band.centreHz, parameter)) {
      return { centreHz: band.centreHz, reverberationTimeS: spread.mean, parameter, isReliable: true, reliabilityNote: null }
    }
  }
  const anyValue = band.parameters.T30.mean ?? band.parameters.T20.mean
  return {
    centreHz: band.centreHz,
    reverberationTimeS: anyValue,
    parameter: band.parameters.T30.mean !== null ? 'T30' : band.parameters.T20.mean !== null ? 'T20' : null,
    isReliable: false,
    reliabilityNote: anyValue === null ? 'No position gave a reverberation time in this band.' : 'At least one position flagged T20 and T30 here (decay range, B·T or fit): see the capture pages.',
  }
}

/** Linear interpolation in log frequency onto a grid (for responses analysed at other rates). */
function resampleLogFrequency(sourceHz: number[], valuesDb: number[], targetHz: number[]): number[] {
  return targetHz.map((f) => {
    if (f <= sourceHz[0]!) return valuesDb[0]!
    const last = sourceHz.length - 1
    if (f >= sourceHz[last]!) return valuesDb[last]!
    let i = 1
    while (sourceHz[i]! < f) i++
    const t = Math.log(f / sourceHz[i - 1]!) / Math.log(sourceHz[i]! / sourceHz[i - 1]!)
    return valuesDb[i - 1]! + t * (valuesDb[i]! - valuesDb[i - 1]!)
  })
}

/** Power average of the positions' magnitude responses (averaging power, not dB: facts §6). */
function averageResponses(results: AnalysisResult[]): SurveySummaryDto['averagedResponse'] {
  const first = results[0]?.frequencyResponse
  if (!first) return null
  const power = new Float64Array(first.frequencyHz.length)
  for (const result of results) {
    const levels = resampleLogFrequency(result.frequencyResponse.frequencyHz, result.frequencyResponse.magnitudeDb, first.frequencyHz)
    levels.forEach((levelDb, i) => (power[i]! += 10 ** (levelDb / 10)))
  }
  return { frequencyHz: first.frequencyHz, magnitudeDb: Array.from(power, (p) => 10 * Math.log10(p / results.length)) }
}

export async function summariseSurvey(survey: Survey, bands: BandResolution): Promise<Omit<SurveySummaryDto, 'survey'>> {
  const captures = await Capture.findAll({ where: { surveyId: survey.id }, attributes: ['id'] })
  const analyses = await latestAnalysesByCapture(captures.map((c) => c.id), bands)
  const results = [...analyses.values()].flatMap((analysis) => (analysis.result ? [analysis.result] : []))
  const averaged = spatialAverage(results.map((result) => result.bands), { bandsPerOctave: bands === 'octave' ? 1 : 3 })
  return {
    bandResolution: bands,
    captureCount: captures.length,
    analysedCount: results.length,
    bands: averaged,
    readings: averaged.map((band) => readingOf(band, results)),
    averagedResponse: averageResponses(results),
    averagedDecays: averageDecayCurves(results),
  }
}

/** A survey's spatial average over its analysed positions, for callers who may read the room. */
export async function getSurveySummary(userId: number, surveyId: number, bands: BandResolution): Promise<SurveySummaryDto> {
  const { survey } = await requireSurveyAccess(userId, surveyId, 'room:read')
  return { survey: await getSurvey(userId, surveyId), ...(await summariseSurvey(survey, bands)) }
}
