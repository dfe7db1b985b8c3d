import { z } from 'zod'

const isoDate = z.iso.date('Use a date like 2026-03-14.')

const surveyFields = {
  name: z.string().trim().min(1, 'Name the survey, e.g. "Bare room".').max(120),
  measuredOn: isoDate,
  temperatureC: z.number().min(-20, 'Temperature must be at least −20 °C.').max(50, 'Temperature must be at most 50 °C.').nullable(),
  humidityPercent: z.number().min(0, 'Humidity is 0–100 %.').max(100, 'Humidity is 0–100 %.').nullable(),
  treatmentDescription: z.string().max(2000),
}

export const createSurveyBodySchema = z.object({
  name: surveyFields.name,
  measuredOn: surveyFields.measuredOn,
  temperatureC: surveyFields.temperatureC.default(null),
  humidityPercent: surveyFields.humidityPercent.default(null),
  treatmentDescription: surveyFields.treatmentDescription.default(''),
})
export type CreateSurveyBody = z.infer<typeof createSurveyBodySchema>

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
  captureCount: number
  createdAt: string
  updatedAt: string
}
