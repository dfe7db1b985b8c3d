import { z } from 'zod'
import type { AnalysisSettings } from '../types/analysis'

/** A survey's analysis settings: every capture is analysed with them (each on its own channel). */
export type SurveyAnalysisSettings = Omit<AnalysisSettings, 'channel'>

export const surveyAnalysisSettingsSchema = z.object({
  bands: z.enum(['octave', 'third'], { error: 'Choose octave or third-octave bands.' }),
  smoothing: z.union([z.literal(1), z.literal(3), z.literal(6), z.literal(12), z.literal(24), z.literal(48)], { error: 'Smoothing is 1/1, 1/3, 1/6, 1/12, 1/24 or 1/48 octave.' }),
  gateMs: z.number().positive('A gate is more than 0 ms.').max(2000, 'A gate is at most 2000 ms.').nullable(),
  timeReversedFiltering: z.boolean(),
}) satisfies z.ZodType<SurveyAnalysisSettings>

/** What the consultant measured with, printed in the report's method notes. */
export const surveyEquipmentSchema = z.object({
  microphone: z.string().trim().max(200).default(''),
  loudspeaker: z.string().trim().max(200).default(''),
  audioInterface: z.string().trim().max(200).default(''),
})
export type SurveyEquipment = z.infer<typeof surveyEquipmentSchema>

const isoDate = z.iso.date('Use a date like 2026-03-14.')

const surveyFields = {
  name: z.string().trim().min(1, 'Name the survey, e.g. "Bare room".').max(120),
  measuredOn: isoDate,
  temperatureC: z.number().min(-20, 'Temperature must be at least −20 °C.').max(50, 'Temperature must be at most 50 °C.').nullable(),
  humidityPercent: z.number().min(0, 'Humidity is 0–100 %.').max(100, 'Humidity is 0–100 %.').nullable(),
  treatmentDescription: z.string().max(2000),
  equipment: surveyEquipmentSchema,
}

export const createSurveyBodySchema = z.object({
  name: surveyFields.name,
  measuredOn: surveyFields.measuredOn,
  temperatureC: surveyFields.temperatureC.default(null),
  humidityPercent: surveyFields.humidityPercent.default(null),
  treatmentDescription: surveyFields.treatmentDescription.default(''),
  equipment: surveyFields.equipment.default({ microphone: '', loudspeaker: '', audioInterface: '' }),
})
export type CreateSurveyBody = z.infer<typeof createSurveyBodySchema>
/** What a client sends (fields with defaults may be left out). */
export type CreateSurveyInput = z.input<typeof createSurveyBodySchema>

export const updateSurveyBodySchema = z
  .object(surveyFields)
  .partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change.' })
export type UpdateSurveyBody = z.infer<typeof updateSurveyBodySchema>

export interface SurveyDto {
  id: number
  roomId: number
  name: string
  measuredOn: string
  temperatureC: number | null
  humidityPercent: number | null
  treatmentDescription: string
  /** The settings its captures are analysed with (the engine defaults unless changed). */
  analysisSettings: SurveyAnalysisSettings
  equipment: SurveyEquipment
  captureCount: number
  createdAt: string
  updatedAt: string
}
