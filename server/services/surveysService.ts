import { fn, col } from 'sequelize'
import { Capture, Survey } from '../models'
import { NotFoundError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import type { RoomAction } from '../policy/policy'
import type { CreateSurveyBody, SurveyDto, UpdateSurveyBody } from '../../shared/api/surveys'
import { recordActivity } from './activityService'
import { releaseQueuedContent } from '../storage/releaseContent'
import type { ObjectStore } from '../storage/createObjectStore'
import { surveyAnalysisSettings } from './countingAnalyses'

function toSurveyDto(survey: Survey, captureCount: number): SurveyDto {
  return {
    id: survey.id,
    roomId: survey.roomId,
    name: survey.name,
    measuredOn: survey.measuredOn,
    temperatureC: survey.temperatureC,
    humidityPercent: survey.humidityPercent,
    treatmentDescription: survey.treatmentDescription,
    analysisSettings: surveyAnalysisSettings(survey),
    equipment: { microphone: '', loudspeaker: '', audioInterface: '', ...(survey.equipment ?? {}) },
    captureCount,
    createdAt: survey.createdAt.toISOString(),
    updatedAt: survey.updatedAt.toISOString(),
  }
}

async function captureCounts(surveyIds: number[]): Promise<Map<number, number>> {
  const rows = (await Capture.findAll({
    attributes: ['surveyId', [fn('COUNT', col('id')), 'count']],
    where: { surveyId: surveyIds },
    group: ['surveyId'],
    raw: true,
  })) as unknown as { surveyId: number; count: string }[]
  return new Map(rows.map((row) => [row.surveyId, Number(row.count)]))
}

/** Loads a survey and checks the caller's right on its room; an invisible room makes it a 404. */
export async function requireSurveyAccess(userId: number, surveyId: number, action: RoomAction) {
  const survey = await Survey.findByPk(surveyId)
  if (!survey) throw new NotFoundError('That survey')
  try {
    const access = await requireRoomAccess(userId, survey.roomId, action)
    return { survey, ...access }
  } catch (error) {
    if (error instanceof NotFoundError) throw new NotFoundError('That survey')
    throw error
  }
}

/** Surveys of a room in date order (the survey timeline). */
export async function listSurveys(userId: number, roomId: number): Promise<SurveyDto[]> {
  await requireRoomAccess(userId, roomId, 'room:read')
  const surveys = await Survey.findAll({ where: { roomId }, order: [['measuredOn', 'ASC'], ['id', 'ASC']] })
  const counts = await captureCounts(surveys.map((s) => s.id))
  return surveys.map((survey) => toSurveyDto(survey, counts.get(survey.id) ?? 0))
}

export async function createSurvey(userId: number, roomId: number, body: CreateSurveyBody): Promise<SurveyDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'survey:create')
  const survey = await Survey.create({ ...body, roomId })
  await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'survey.created', summary: `added the survey "${survey.name}"` })
  return toSurveyDto(survey, 0)
}

/** The DTO of a survey already authorised by the caller. */
export async function describeSurvey(survey: Survey): Promise<SurveyDto> {
  return toSurveyDto(survey, (await captureCounts([survey.id])).get(survey.id) ?? 0)
}

export async function getSurvey(userId: number, surveyId: number): Promise<SurveyDto> {
  const { survey } = await requireSurveyAccess(userId, surveyId, 'room:read')
  return describeSurvey(survey)
}

export async function updateSurvey(userId: number, surveyId: number, body: UpdateSurveyBody): Promise<SurveyDto> {
  const { survey } = await requireSurveyAccess(userId, surveyId, 'survey:update')
  await survey.update(body)
  return toSurveyDto(survey, (await captureCounts([survey.id])).get(survey.id) ?? 0)
}

/** Deletes the survey with its captures, and the stored files no other row uses. */
export async function deleteSurvey(userId: number, surveyId: number, store: ObjectStore): Promise<void> {
  const { survey, room } = await requireSurveyAccess(userId, surveyId, 'survey:delete')
  await survey.destroy()
  await releaseQueuedContent(store)
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'survey.deleted', summary: `deleted the survey "${survey.name}" and its captures` })
}
