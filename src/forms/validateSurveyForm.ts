import { createSurveyBodySchema, type CreateSurveyBody, type SurveyDto } from '@shared/api'
import { parseNumberInput } from '@/utils/formatNumber'
import { todayIsoDate } from '@/utils/formatDate'

/** What the survey form holds: the text of each input. */
export interface SurveyFormValues {
  name: string
  measuredOn: string
  temperatureC: string
  humidityPercent: string
  treatmentDescription: string
  microphone: string
  loudspeaker: string
  audioInterface: string
}
export type SurveyFormErrors = Partial<Record<keyof SurveyFormValues, string>>

export function emptySurveyFormValues(now?: Date): SurveyFormValues {
  return { name: '', measuredOn: todayIsoDate(now), temperatureC: '', humidityPercent: '', treatmentDescription: '', microphone: '', loudspeaker: '', audioInterface: '' }
}

export function surveyToFormValues(survey: SurveyDto): SurveyFormValues {
  return {
    name: survey.name,
    measuredOn: survey.measuredOn.slice(0, 10),
    temperatureC: survey.temperatureC === null ? '' : String(survey.temperatureC),
    humidityPercent: survey.humidityPercent === null ? '' : String(survey.humidityPercent),
    treatmentDescription: survey.treatmentDescription,
    microphone: survey.equipment.microphone,
    loudspeaker: survey.equipment.loudspeaker,
    audioInterface: survey.equipment.audioInterface,
  }
}

const NUMBER_EXAMPLES = { temperatureC: 'Temperature must be a number of °C, e.g. 21.5.', humidityPercent: 'Humidity must be a number of %, e.g. 45.' }

/**
 * Checks the survey form against the API's own schema (shared/api/surveys.ts), so the messages
 * are the server's; empty temperature and humidity mean "not recorded".
 */
export function validateSurveyForm(values: SurveyFormValues): { body: CreateSurveyBody | null; errors: SurveyFormErrors } {
  const errors: SurveyFormErrors = {}
  const numbers = { temperatureC: parseNumberInput(values.temperatureC), humidityPercent: parseNumberInput(values.humidityPercent) }
  for (const field of ['temperatureC', 'humidityPercent'] as const) {
    if (Number.isNaN(numbers[field])) errors[field] = NUMBER_EXAMPLES[field]
  }
  const parsed = createSurveyBodySchema.safeParse({
    name: values.name,
    measuredOn: values.measuredOn.trim(),
    temperatureC: Number.isNaN(numbers.temperatureC) ? null : numbers.temperatureC,
    humidityPercent: Number.isNaN(numbers.humidityPercent) ? null : numbers.humidityPercent,
    treatmentDescription: values.treatmentDescription.trim(),
    equipment: { microphone: values.microphone, loudspeaker: values.loudspeaker, audioInterface: values.audioInterface },
  })
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = (issue.path[0] === 'equipment' ? issue.path[1] : issue.path[0]) as keyof SurveyFormValues | undefined
      if (!field || errors[field]) continue
      // The schema's own words for an over-long text are generic; say it plainly.
      const isLongText = issue.code === 'too_big' && issue.origin === 'string'
      errors[field] = isLongText ? `Keep this under ${Number(issue.maximum).toLocaleString('en-GB')} characters.` : issue.message
    }
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { body: null, errors }
  return { body: parsed.data, errors }
}

/** Server field messages keyed by body field; the survey form uses the same names. */
export function serverFieldsToSurveyForm(fields: Record<string, string>): SurveyFormErrors {
  const known: (keyof SurveyFormValues)[] = ['name', 'measuredOn', 'temperatureC', 'humidityPercent', 'treatmentDescription']
  return Object.fromEntries(Object.entries(fields).filter(([key]) => known.includes(key as keyof SurveyFormValues)))
}
