import { Capture, type Analysis, type Survey } from '../models'
import { spatialAverage, type SpatialAverageBand } from '../../shared/acoustics/spatialAverage'
import type { SurveyBandReading, SurveyPositionDto, SurveySummaryDto } from '../../shared/api/results'
import type { AnalysisResult, BandResolution } from '../../shared/types/analysis'
import { countingAnalyses, surveyAnalysisSettings } from './countingAnalyses'
import { keyToSettings } from '../../shared/jobs/analysisSettingsKey'
import { getSurvey, requireSurveyAccess } from './surveysService'
import { averageDecayCurves } from './averageDecayCurves'
import { loadCaptureViews } from './captureStates'
import type { CaptureStatus } from '../../shared/jobs/analysisJob'

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
  const uncertaintyOf = (parameter: 'T30' | 'T20') => (parameter === 'T30' ? band.uncertaintyT30 : band.uncertaintyT20)
  for (const parameter of ['T30', 'T20'] as const) {
    const spread = band.parameters[parameter]
    if (spread.mean !== null && !isFlagged(results, band.centreHz, parameter)) {
      return { centreHz: band.centreHz, reverberationTimeS: spread.mean, parameter, isReliable: true, isAnalysed: true, positionCount: spread.count, uncertaintyS: uncertaintyOf(parameter), reliabilityNote: null }
    }
  }
  const parameter = band.parameters.T30.mean !== null ? 'T30' : band.parameters.T20.mean !== null ? 'T20' : null
  const anyValue = band.parameters.T30.mean ?? band.parameters.T20.mean
  return {
    centreHz: band.centreHz,
    reverberationTimeS: anyValue,
    parameter,
    isReliable: false,
    isAnalysed: true,
    positionCount: parameter ? band.parameters[parameter].count : 0,
    uncertaintyS: parameter ? uncertaintyOf(parameter) : null,
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

/** Power average of the positions' magnitude responses (averaging power, not dB: facts §6; common practice). */
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

function positionOf(capture: Capture, status: CaptureStatus, analysis: Analysis | undefined): SurveyPositionDto {
  const isPending = status === 'uploaded' || status === 'queued' || status === 'analysing'
  const state = analysis ? 'analysed' : isPending ? 'pending' : status === 'failed' ? 'failed' : 'not-analysed'
  return {
    captureId: capture.id,
    receiverLabel: capture.receiverLabel,
    sourceLabel: capture.sourceLabel,
    originalName: capture.originalName,
    kind: capture.kind,
    isIncluded: capture.excludedAt === null,
    exclusionReason: capture.exclusionReason,
    state,
    analysisId: analysis?.id ?? null,
    analysisSettings: analysis ? keyToSettings(analysis.settingsKey) : null,
    engineVersion: analysis?.engineVersion ?? null,
    bands: (analysis?.result?.bands ?? []).map((band) => ({
      centreHz: band.centreHz,
      T20: band.T20,
      T30: band.T30,
      EDT: band.EDT,
      uncertaintyT30: band.uncertaintyT30,
      isFlagged: band.warnings.some((w) => w.parameters.includes('T30') || w.parameters.includes('T20') || w.parameters.length === 0),
    })),
  }
}

/**
 * A survey's spatial average at a band resolution: only included captures count, each with the
 * one analysis that counts for it ({@link countingAnalyses}); excluded captures are listed with
 * their reason. With no included analysis every band is "not analysed".
 */
export async function summariseSurvey(survey: Survey, bands: BandResolution): Promise<Omit<SurveySummaryDto, 'survey'>> {
  const captures = await Capture.findAll({ where: { surveyId: survey.id }, order: [['id', 'ASC']] })
  const analyses = await countingAnalyses(captures, survey, bands)
  const views = await loadCaptureViews(captures)
  const positions = captures.map((capture) => positionOf(capture, views.get(capture.id)!.state.status, analyses.get(capture.id)))
  const included = captures.filter((capture) => capture.excludedAt === null)
  const results = included.flatMap((capture) => {
    const analysis = analyses.get(capture.id)
    return analysis?.result ? [analysis.result] : []
  })
  const averaged = spatialAverage(results.map((result) => result.bands), { bandsPerOctave: bands === 'octave' ? 1 : 3 })
  const includedPositions = positions.filter((p) => p.isIncluded)
  return {
    bandResolution: bands,
    analysisSettings: surveyAnalysisSettings(survey),
    captureCount: captures.length,
    includedCount: included.length,
    excludedCount: captures.length - included.length,
    analysedCount: results.length,
    pendingCount: includedPositions.filter((p) => p.state === 'pending').length,
    failedCount: includedPositions.filter((p) => p.state === 'failed').length,
    positions,
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
