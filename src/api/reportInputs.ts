import type {
  CustomTargetBody,
  CustomTargetDto,
  ReportRevisionDetailDto,
  ReportRevisionDto,
  RoomDto,
  SurveyAnalysisProgressDto,
  SurveyAnalysisRunDto,
  SurveyAnalysisSettings,
  TargetOptionDto,
} from '@shared/api'
import { apiUrl, request } from './http'

export function listTargetOptions(workspaceId: number): Promise<TargetOptionDto[]> {
  return request<TargetOptionDto[]>('GET', `/workspaces/${workspaceId}/target-options`)
}

export function createCustomTarget(workspaceId: number, body: CustomTargetBody): Promise<CustomTargetDto> {
  return request<CustomTargetDto>('POST', `/workspaces/${workspaceId}/custom-targets`, body)
}

/** Chooses the room's target: "auto", a published target id or "custom:<id>". */
export function setRoomTarget(roomId: number, targetProfile: string): Promise<RoomDto> {
  return request<RoomDto>('PUT', `/rooms/${roomId}/target`, { targetProfile })
}

export function listReportRevisions(roomId: number): Promise<ReportRevisionDto[]> {
  return request<ReportRevisionDto[]>('GET', `/rooms/${roomId}/report-revisions`)
}

export function getReportRevision(roomId: number, revisionId: number): Promise<ReportRevisionDetailDto> {
  return request<ReportRevisionDetailDto>('GET', `/rooms/${roomId}/report-revisions/${revisionId}`)
}

export function reportRevisionPdfUrl(roomId: number, revisionId: number): string {
  return apiUrl(`/rooms/${roomId}/report-revisions/${revisionId}/report.pdf`)
}

/** "Analyse the whole survey with these settings": every capture, through the re-analysis queue. */
export function analyseWholeSurvey(surveyId: number, settings: SurveyAnalysisSettings): Promise<SurveyAnalysisRunDto> {
  return request<SurveyAnalysisRunDto>('POST', `/surveys/${surveyId}/analyses`, settings)
}

export function getSurveyAnalysisProgress(surveyId: number): Promise<SurveyAnalysisProgressDto> {
  return request<SurveyAnalysisProgressDto>('GET', `/surveys/${surveyId}/analysis-progress`)
}
