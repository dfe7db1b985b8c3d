import type { ComparisonDto, SurveySummaryDto } from '@shared/api'
import type { BandResolution } from '@shared/types/analysis'
import type { ExportFormat } from './captures'
import { apiUrl, request, toQuery } from './http'

export function getSurveySummary(surveyId: number, bands: BandResolution = 'octave'): Promise<SurveySummaryDto> {
  return request<SurveySummaryDto>('GET', `/surveys/${surveyId}/summary${toQuery({ bands })}`)
}

export function getComparison(roomId: number, surveyIds: readonly number[], bands: BandResolution = 'octave'): Promise<ComparisonDto> {
  return request<ComparisonDto>('GET', `/rooms/${roomId}/comparison${toQuery({ surveys: surveyIds.join(','), bands })}`)
}

export function surveyExportUrl(surveyId: number, format: ExportFormat, bands: BandResolution = 'octave'): string {
  return apiUrl(`/surveys/${surveyId}/export${toQuery({ format, bands })}`)
}

export function comparisonExportUrl(roomId: number, surveyIds: readonly number[], format: ExportFormat, bands: BandResolution = 'octave'): string {
  return apiUrl(`/rooms/${roomId}/comparison/export${toQuery({ surveys: surveyIds.join(','), format, bands })}`)
}
