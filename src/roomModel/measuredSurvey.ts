import type { SurveyBandReading, SurveySummaryDto } from '@shared/api'

/** What the room model needs of a measured survey: its name, date, air state and per-band T. */
export interface MeasuredSurvey {
  surveyId: number
  name: string
  measuredOn: string
  temperatureC: number | null
  humidityPercent: number | null
  readings: SurveyBandReading[]
}

export function summaryToMeasuredSurvey(summary: SurveySummaryDto): MeasuredSurvey {
  const { survey } = summary
  return { surveyId: survey.id, name: survey.name, measuredOn: survey.measuredOn, temperatureC: survey.temperatureC, humidityPercent: survey.humidityPercent, readings: summary.readings }
}

/** Surveys with at least one band value, oldest first (ties by id, the order they were made). */
export function measuredInDateOrder(surveys: readonly MeasuredSurvey[]): MeasuredSurvey[] {
  return surveys
    .filter((s) => s.readings.some((r) => r.reverberationTimeS !== null))
    .sort((a, b) => a.measuredOn.localeCompare(b.measuredOn) || a.surveyId - b.surveyId)
}
