import { z } from 'zod'
import type { AnalysisStatus, CaptureStatus } from '../jobs/analysisJob'
import type { AnalysisHeadline } from '../jobs/analysisHeadline'
import type { AnalysisResult, CaptureKind } from '../types/analysis'

/** Multipart form fields arrive as strings: numbers are coerced, blanks become null. */
const optionalNumber = (label: string, min: number, max: number) =>
  z.preprocess(
    (value) => (value === '' || value === undefined || value === null ? null : value),
    z.coerce.number({ error: `${label} must be a number.` }).min(min, `${label} must be at least ${min}.`).max(max, `${label} must be at most ${max}.`).nullable(),
  )

export const createCaptureFieldsSchema = z
  .object({
    kind: z.enum(['impulse', 'sweep'], { error: 'Say whether the file is an impulse response or a sweep recording.' }),
    channel: z.coerce.number().int('Channel must be a whole number.').min(0, 'Channels are numbered from 0.').max(63).default(0),
    sourceLabel: z.string().trim().max(120).default(''),
    receiverLabel: z.string().trim().max(120).default(''),
    positionXM: optionalNumber('Position x', -200, 200).default(null),
    positionYM: optionalNumber('Position y', -200, 200).default(null),
    positionZM: optionalNumber('Position z', -200, 200).default(null),
    sweepF1Hz: optionalNumber('Sweep start frequency', 1, 96_000).default(null),
    sweepF2Hz: optionalNumber('Sweep end frequency', 1, 96_000).default(null),
    sweepDurationS: optionalNumber('Sweep duration', 0.1, 600).default(null),
  })
  .superRefine((fields, ctx) => {
    if (fields.kind !== 'sweep') return
    if (fields.sweepF1Hz !== null && fields.sweepF2Hz !== null && fields.sweepF1Hz >= fields.sweepF2Hz) {
      ctx.addIssue({ code: 'custom', path: ['sweepF2Hz'], message: 'The sweep must end above its start frequency.' })
    }
  })
export type CreateCaptureFields = z.infer<typeof createCaptureFieldsSchema>

/** Mid-band values of the analysis a capture shows, for tables (stored as columns of the analysis). */
export type CaptureHeadline = AnalysisHeadline

/** How the survey captures list can be ordered: upload order, labels, kind or a headline figure. */
export const CAPTURE_SORT_KEYS = ['uploaded', 'receiver', 'source', 'kind', 'T30', 'EDT', 'C80'] as const
export type CaptureSortKey = (typeof CAPTURE_SORT_KEYS)[number]
export const CAPTURES_PAGE_SIZE_MAX = 200

export const listCapturesQuerySchema = z.object({
  page: z.coerce.number({ error: 'The page is a whole number from 1.' }).int('The page is a whole number from 1.').min(1, 'The page is a whole number from 1.').default(1),
  pageSize: z.coerce.number().int('The page size is a whole number.').min(1, 'Show at least one capture a page.').max(CAPTURES_PAGE_SIZE_MAX, `Show at most ${CAPTURES_PAGE_SIZE_MAX} captures a page.`).default(50),
  sort: z.enum(CAPTURE_SORT_KEYS, { error: `Sort by one of: ${CAPTURE_SORT_KEYS.join(', ')}.` }).default('uploaded'),
  order: z.enum(['asc', 'desc'], { error: 'Order is asc or desc.' }).default('asc'),
  /** Only captures with (true) or without (false) a finished analysis. */
  analysed: z.enum(['true', 'false'], { error: 'analysed is true or false.' }).transform((value) => value === 'true').optional(),
})
export type ListCapturesQuery = z.infer<typeof listCapturesQuerySchema>

/** One page of a survey's captures and how many there are in all. */
export interface CapturePageDto {
  items: CaptureDto[]
  total: number
  page: number
  pageSize: number
}

export interface CaptureDto {
  id: number
  surveyId: number
  /** Who uploaded it (null for demo data): a client may delete their own captures. */
  uploadedById: number | null
  kind: CaptureKind
  channel: number
  sourceLabel: string
  receiverLabel: string
  positionXM: number | null
  positionYM: number | null
  positionZM: number | null
  sweepF1Hz: number | null
  sweepF2Hz: number | null
  sweepDurationS: number | null
  hasReferenceSweep: boolean
  originalName: string
  sha256: string
  byteSize: number
  sampleRateHz: number
  bitDepth: number
  channelCount: number
  durationS: number
  /** Derived from the capture's analyses (shared/jobs/captureState.ts). */
  status: CaptureStatus
  statusMessage: string | null
  /** An excluded capture stays visible but counts in no average, verdict or export. */
  isExcluded: boolean
  exclusionReason: string | null
  excludedAt: string | null
  /** The analysis an owner or engineer pinned for reporting; null = the default rule. */
  pinnedAnalysisId: number | null
  /** The analysis that counts for this capture at the survey's settings (pinned or default); null if none yet. */
  countingAnalysisId: number | null
  /** The analysis whose figures the capture shows (the counting one, else the newest done); null before the first is done. */
  shownAnalysisId: number | null
  headline: CaptureHeadline | null
  createdAt: string
  updatedAt: string
}

export const captureInclusionBodySchema = z
  .object({
    isIncluded: z.boolean({ error: 'Say whether the capture counts in the average.' }),
    reason: z.string().trim().max(300, 'Keep the reason under 300 characters.').default(''),
  })
  .refine((body) => body.isIncluded || body.reason.length >= 3, { message: 'Give a reason for leaving this position out (at least 3 characters).', path: ['reason'] })
export type CaptureInclusionBody = z.infer<typeof captureInclusionBodySchema>

export const pinAnalysisBodySchema = z.object({
  /** null = back to the default rule (the first successful analysis with the survey's settings). */
  analysisId: z.number().int().positive().nullable(),
})
export type PinAnalysisBody = z.infer<typeof pinAnalysisBodySchema>

/** A finished analysis with its result. */
export interface AnalysisDto {
  id: number
  captureId: number
  settingsKey: string
  engineVersion: string
  createdAt: string
  /** True when this is the analysis that counts for the capture (pinned, or the default rule). */
  isCounting: boolean
  /** True when an owner or engineer pinned it explicitly. */
  isPinned: boolean
  finishedAt: string | null
  result: AnalysisResult
}

/** One analysis's job state, as the live stream and the analyses list report it. */
export interface AnalysisStateDto {
  id: number
  status: AnalysisStatus
  statusMessage: string | null
  error: string | null
}

/** The event a survey's live stream sends when one of its captures changes (`event: capture`). */
export interface SurveyCaptureEvent {
  capture: CaptureDto
  /** The analysis whose change caused the event. */
  analysis: AnalysisStateDto
}

/** `event: capture-deleted`. */
export interface SurveyCaptureDeletedEvent {
  captureId: number
}
