import { z } from 'zod'
import type { SpatialAverageBand } from '../acoustics/spatialAverage'
import type { BandVerdict } from '../room/targets/bandVerdict'
import type { TargetMask } from '../room/targets/targetMask'
import type { AnalysisSettings, BandResolution, DecayCurve } from '../types/analysis'
import type { SurveyAnalysisSettings, SurveyDto } from './surveys'
import type { AnalysisStatus } from '../jobs/analysisJob'

export const bandResolutionQuerySchema = z.object({
  bands: z.enum(['octave', 'third']).default('octave'),
})

/** One band of a survey as judged against a target: which T was used and whether it is trustworthy. */
export interface SurveyBandReading {
  centreHz: number
  /** The reverberation time judged: mean T30, or mean T20 where T30 is not usable. */
  reverberationTimeS: number | null
  parameter: 'T30' | 'T20' | null
  isReliable: boolean
  /** False when no included position has an analysis in this band at this resolution. */
  isAnalysed: boolean
  /** Positions whose value of the judged parameter went into the mean. */
  positionCount: number
  /** ISO 3382-2 Annex A standard uncertainty σ of the judged mean, s (N = positionCount). */
  uncertaintyS: number | null
  /** Why a band is not reliable or not analysed, in plain words; null when it is judged. */
  reliabilityNote: string | null
}

/** One capture of a survey as the average used it (or left it out). */
export interface SurveyPositionDto {
  captureId: number
  receiverLabel: string
  sourceLabel: string
  originalName: string
  kind: 'impulse' | 'sweep'
  isIncluded: boolean
  exclusionReason: string | null
  /** analysed: has the analysis that counts at this resolution; pending: still queued or analysing. */
  state: 'analysed' | 'not-analysed' | 'pending' | 'failed'
  analysisId: number | null
  analysisSettings: AnalysisSettings | null
  engineVersion: string | null
  /** Per-band values of that analysis (empty when not analysed). */
  bands: { centreHz: number; T20: number | null; T30: number | null; EDT: number | null; uncertaintyT30: number | null; isFlagged: boolean }[]
}

export interface SurveySummaryDto {
  survey: SurveyDto
  bandResolution: BandResolution
  /** The survey's analysis settings (the band resolution of the summary may differ). */
  analysisSettings: SurveyAnalysisSettings
  captureCount: number
  /** Captures that count in the average (not excluded). */
  includedCount: number
  excludedCount: number
  /** Included captures with an analysis that counts at this band resolution. */
  analysedCount: number
  /** Included captures still queued or being analysed, and those whose analysis failed. */
  pendingCount: number
  failedCount: number
  /** Every capture, included or not, with the analysis used and its per-band values. */
  positions: SurveyPositionDto[]
  /** Spatial average over positions (mean, spread, count per parameter). */
  bands: SpatialAverageBand[]
  readings: SurveyBandReading[]
  /** Power average of the positions' magnitude responses, dB; null before any analysis. */
  averagedResponse: { frequencyHz: number[]; magnitudeDb: number[] } | null
  /** Energy average of the positions' Schroeder decays per band (no fits), dB re start vs ms. */
  averagedDecays: DecayCurve[]
}

export const comparisonQuerySchema = z.object({
  surveys: z
    .string({ error: 'Choose at least two surveys to compare.' })
    .transform((value) => value.split(',').filter(Boolean).map(Number))
    .pipe(z.array(z.number().int().positive('Survey ids are positive whole numbers.')).min(2, 'Choose at least two surveys to compare.').max(6, 'Compare at most six surveys at once.')),
  bands: z.enum(['octave', 'third']).default('octave'),
})

export interface ComparisonDifference {
  centreHz: number
  beforeS: number | null
  afterS: number | null
  /** after − before, s. */
  changeS: number | null
  changePercent: number | null
}

export interface ComparisonDto {
  roomId: number
  roomName: string
  roomClientName: string
  roomAddress: string
  volumeM3: number | null
  bandResolution: BandResolution
  target: TargetMask | null
  /** Surveys in the order asked for (first = before, last = after). */
  surveys: { summary: SurveySummaryDto; verdicts: { centreHz: number; verdict: BandVerdict }[] }[]
  /** First survey against the last, per band. */
  differences: ComparisonDifference[]
  /** One line on what the treatment achieved; null without a target or volume. */
  summaryLine: string | null
  /** The one general caution shown with every verdict. */
  targetCaution: string
  /** Why this comparison cannot be sent as a report yet (empty when it can). */
  reportBlockers: string[]
  /** Set when this is a frozen report revision (a share link). */
  revision?: { number: number; frozenAt: string; preparedBy: string | null; consultancyName: string }
}

export const reanalyseBodySchema = z.object({
  bands: z.enum(['octave', 'third']),
  smoothing: z.union([z.literal(1), z.literal(3), z.literal(6), z.literal(12), z.literal(24), z.literal(48)]),
  channel: z.number().int().min(0).max(63),
  gateMs: z.number().positive().max(2000).nullable(),
  timeReversedFiltering: z.boolean(),
}) satisfies z.ZodType<AnalysisSettings>

/** The outcome of "analyse the whole survey with these settings". */
export interface SurveyAnalysisRunDto {
  settings: SurveyAnalysisSettings
  queued: number
  alreadyAnalysed: number
  total: number
}

/** How far the captures of a survey are analysed with its settings. */
export interface SurveyAnalysisProgressDto {
  settings: SurveyAnalysisSettings
  total: number
  done: number
  pending: number
  failed: number
}

export interface AnalysisListItemDto {
  id: number
  /** True for the analysis that counts for the capture (pinned or default rule). */
  isCounting: boolean
  isPinned: boolean
  settings: AnalysisSettings
  status: AnalysisStatus
  statusMessage: string | null
  error: string | null
  attempts: number
  /** Null until the analysis is done. */
  engineVersion: string | null
  createdAt: string
  queuedAt: string
  finishedAt: string | null
}

/** The answer to a re-analysis request: the row (new, queued again, or as it was). */
export interface ReanalysisDto {
  captureId: number
  analysisId: number
  settingsKey: string
  status: AnalysisStatus
  /** True when this request started a run; false when the settings were already done or under way. */
  isNewRun: boolean
}

export const sweepQuerySchema = z
  .object({
    f1: z.coerce.number().min(10, 'Start at 10 Hz or above.').max(1000, 'Start at 1 kHz or below.').default(20),
    f2: z.coerce.number().min(1000, 'End at 1 kHz or above.').max(96_000).default(20_000),
    seconds: z.coerce.number().min(1, 'Sweeps last at least 1 s.').max(60, 'Sweeps last at most 60 s.').default(6),
    rate: z.coerce.number().refine((r) => [44_100, 48_000, 88_200, 96_000].includes(r), 'Use 44100, 48000, 88200 or 96000 Hz.').default(48_000),
    levelDb: z.coerce.number().min(-60, 'Level is −60 to −1 dBFS.').max(-1, 'Level is −60 to −1 dBFS.').default(-12),
  })
  .refine((q) => q.f2 < q.rate / 2, { message: 'The end frequency must be below half the sample rate.', path: ['f2'] })
