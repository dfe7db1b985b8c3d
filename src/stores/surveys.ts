import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { CreateSurveyInput, SurveyDto, UpdateSurveyBody } from '@shared/api'
import * as surveysApi from '@/api/surveys'

/** Date order, then creation order for two surveys on the same day. */
function byDate(a: SurveyDto, b: SurveyDto): number {
  return a.measuredOn.localeCompare(b.measuredOn) || a.id - b.id
}

/** The surveys of each room opened, in date order. */
export const useSurveysStore = defineStore('surveys', () => {
  const byRoomId = ref<Record<number, SurveyDto[]>>({})

  function put(roomId: number, surveys: SurveyDto[]): void {
    byRoomId.value[roomId] = [...surveys].sort(byDate)
  }

  async function fetchSurveys(roomId: number): Promise<SurveyDto[]> {
    put(roomId, await surveysApi.listSurveys(roomId))
    return byRoomId.value[roomId] ?? []
  }

  async function createSurvey(roomId: number, body: CreateSurveyInput): Promise<SurveyDto> {
    const survey = await surveysApi.createSurvey(roomId, body)
    put(roomId, [...(byRoomId.value[roomId] ?? []), survey])
    return survey
  }

  async function updateSurvey(survey: SurveyDto, body: UpdateSurveyBody): Promise<SurveyDto> {
    const updated = await surveysApi.updateSurvey(survey.id, body)
    put(survey.roomId, (byRoomId.value[survey.roomId] ?? []).map((s) => (s.id === updated.id ? updated : s)))
    return updated
  }

  async function deleteSurvey(survey: SurveyDto): Promise<void> {
    await surveysApi.deleteSurvey(survey.id)
    put(survey.roomId, (byRoomId.value[survey.roomId] ?? []).filter((s) => s.id !== survey.id))
  }

  return { byRoomId, fetchSurveys, createSurvey, updateSurvey, deleteSurvey }
})
