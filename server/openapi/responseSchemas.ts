import { z } from 'zod'
import { roleSchema } from '../../shared/api/common'
import { CAPTURE_STATUSES } from '../../shared/jobs/analysisJob'
import type { ApiErrorBody } from '../../shared/api/common'
import type { MeResponse } from '../../shared/api/auth'
import { surveyAnalysisSettingsSchema, surveyEquipmentSchema, type SurveyDto } from '../../shared/api/surveys'
import type { CaptureDto } from '../../shared/api/captures'

/*
 * Response bodies described for the API document. The wire types are TypeScript interfaces in
 * shared/api; `satisfies` makes the type check fail here when one of them changes shape.
 */

const nullableNumber = z.number().nullable()

export const errorResponseSchema = z
  .object({
    error: z.object({
      code: z.string().meta({ description: 'Stable machine-readable reason, e.g. "validation", "not-found", "token-expired".' }),
      message: z.string().meta({ description: 'What went wrong and what to do next, in plain words.' }),
      fields: z.record(z.string(), z.string()).optional().meta({ description: 'Field path → message, for validation errors.' }),
    }) satisfies z.ZodType<ApiErrorBody>,
  })
  .meta({ id: 'Error' })

export const meResponseSchema = z
  .object({
    user: z.object({ id: z.number().int(), name: z.string(), email: z.string() }),
    memberships: z.array(z.object({ workspaceId: z.number().int(), workspaceName: z.string(), role: roleSchema })),
  })
  .meta({ id: 'Me' }) satisfies z.ZodType<MeResponse>

export const surveyResponseSchema = z
  .object({
    id: z.number().int(),
    roomId: z.number().int(),
    name: z.string(),
    measuredOn: z.string().meta({ description: 'Date of the measurement, YYYY-MM-DD.' }),
    temperatureC: nullableNumber,
    humidityPercent: nullableNumber,
    treatmentDescription: z.string(),
    analysisSettings: surveyAnalysisSettingsSchema.meta({ description: 'The settings its captures are analysed with.' }),
    equipment: surveyEquipmentSchema.required(),
    captureCount: z.number().int(),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .meta({ id: 'Survey' }) satisfies z.ZodType<SurveyDto>

export const captureResponseSchema = z
  .object({
    id: z.number().int(),
    surveyId: z.number().int(),
    uploadedById: z.number().int().nullable(),
    kind: z.enum(['impulse', 'sweep']),
    channel: z.number().int(),
    sourceLabel: z.string(),
    receiverLabel: z.string(),
    positionXM: nullableNumber,
    positionYM: nullableNumber,
    positionZM: nullableNumber,
    sweepF1Hz: nullableNumber,
    sweepF2Hz: nullableNumber,
    sweepDurationS: nullableNumber,
    hasReferenceSweep: z.boolean(),
    originalName: z.string(),
    sha256: z.string(),
    byteSize: z.number().int(),
    sampleRateHz: z.number(),
    bitDepth: z.number().int(),
    channelCount: z.number().int(),
    durationS: z.number(),
    status: z.enum(CAPTURE_STATUSES).meta({ description: 'uploaded → queued → analysing → done | failed' }),
    statusMessage: z.string().nullable().meta({ description: 'What is happening, or why the analysis failed.' }),
    isExcluded: z.boolean().meta({ description: 'Left out of the survey average (it stays listed).' }),
    exclusionReason: z.string().nullable(),
    excludedAt: z.string().nullable(),
    pinnedAnalysisId: z.number().int().nullable().meta({ description: 'The analysis pinned for reporting; null = the default rule.' }),
    countingAnalysisId: z.number().int().nullable().meta({ description: 'The finished analysis that counts in averages, verdicts and reports.' }),
    shownAnalysisId: z.number().int().nullable().meta({ description: 'The analysis whose figures the capture shows.' }),
    headline: z.object({ T30S: nullableNumber, T20S: nullableNumber, EDTS: nullableNumber, C80Db: nullableNumber }).nullable().meta({ description: 'Mid-band values of the analysis shown.' }),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .meta({ id: 'Capture' }) satisfies z.ZodType<CaptureDto>

const bandResultSchema = z.looseObject({
  centreHz: z.number().meta({ description: 'Nominal band centre, Hz.' }),
  T20: nullableNumber.meta({ description: 's' }),
  T30: nullableNumber.meta({ description: 's' }),
  EDT: nullableNumber.meta({ description: 's' }),
  C50: nullableNumber.meta({ description: 'dB' }),
  C80: nullableNumber.meta({ description: 'dB' }),
  D50: nullableNumber.meta({ description: '0..1' }),
  Ts: nullableNumber.meta({ description: 's' }),
})

/** The analysis is large (curves, decays, waterfall); the document spells out the band table only. */
export const analysisResponseSchema = z
  .object({
    id: z.number().int(),
    captureId: z.number().int(),
    settingsKey: z.string(),
    engineVersion: z.string(),
    createdAt: z.string(),
    result: z.looseObject({ bands: z.array(bandResultSchema).meta({ description: 'One row per octave or third-octave band (ISO 3382-2 parameters).' }) }),
  })
  .meta({ id: 'Analysis' })
