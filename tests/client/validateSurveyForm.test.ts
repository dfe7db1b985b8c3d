// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { emptySurveyFormValues, validateSurveyForm, type SurveyFormValues } from '@/forms/validateSurveyForm'

function values(overrides: Partial<SurveyFormValues>): SurveyFormValues {
  return { name: 'Bare room', measuredOn: '2026-03-14', temperatureC: '', humidityPercent: '', treatmentDescription: '', microphone: '', loudspeaker: '', audioInterface: '', ...overrides }
}

describe('validateSurveyForm', () => {
  it('returns a body with null climate when temperature and humidity are left empty', () => {
    const { body, errors } = validateSurveyForm(values({}))

    expect(errors).toEqual({})
    expect(body).toEqual({ name: 'Bare room', measuredOn: '2026-03-14', temperatureC: null, humidityPercent: null, treatmentDescription: '', equipment: { microphone: '', loudspeaker: '', audioInterface: '' } })
  })

  it('returns numbers for temperature and humidity, accepting a decimal comma', () => {
    const { body } = validateSurveyForm(values({ temperatureC: '21,5', humidityPercent: '45' }))

    expect(body).toMatchObject({ temperatureC: 21.5, humidityPercent: 45 })
  })

  it('returns the schema messages for an empty name, a bad date and humidity over 100 %', () => {
    const { body, errors } = validateSurveyForm(values({ name: ' ', measuredOn: '14/03/2026', humidityPercent: '120' }))

    expect(body).toBeNull()
    expect(errors).toEqual({ name: 'Name the survey, e.g. "Bare room".', measuredOn: 'Use a date like 2026-03-14.', humidityPercent: 'Humidity is 0–100 %.' })
  })

  it('returns an error for a temperature that is not a number', () => {
    expect(validateSurveyForm(values({ temperatureC: 'warm' })).errors).toEqual({ temperatureC: 'Temperature must be a number of °C, e.g. 21.5.' })
  })

  it('returns a plain message when the treatment text is longer than 2000 characters', () => {
    expect(validateSurveyForm(values({ treatmentDescription: 'x'.repeat(2001) })).errors).toEqual({ treatmentDescription: 'Keep this under 2,000 characters.' })
  })

  it('starts a new survey on the given day', () => {
    expect(emptySurveyFormValues(new Date(2026, 2, 4, 23, 30)).measuredOn).toBe('2026-03-04')
  })
})
