import type { CreateSurveyInput, SurveyDto, UpdateSurveyBody } from '@shared/api'
import { request } from './http'

export function listSurveys(roomId: number): Promise<SurveyDto[]> {
  return request<SurveyDto[]>('GET', `/rooms/${roomId}/surveys`)
}

export function createSurvey(roomId: number, body: CreateSurveyInput): Promise<SurveyDto> {
  return request<SurveyDto>('POST', `/rooms/${roomId}/surveys`, body)
}

export function updateSurvey(surveyId: number, body: UpdateSurveyBody): Promise<SurveyDto> {
  return request<SurveyDto>('PATCH', `/surveys/${surveyId}`, body)
}

export function deleteSurvey(surveyId: number): Promise<void> {
  return request<void>('DELETE', `/surveys/${surveyId}`)
}

export function getSurvey(surveyId: number): Promise<SurveyDto> {
  return request<SurveyDto>('GET', `/surveys/${surveyId}`)
}
