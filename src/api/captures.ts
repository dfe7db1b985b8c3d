import type { AnalysisDto, AnalysisListItemDto, CaptureDto, CaptureInclusionBody, CapturePageDto, CaptureSortKey, ReanalysisDto } from '@shared/api'
import type { AnalysisSettings } from '@shared/types/analysis'
import { apiUrl, request, toQuery } from './http'
import { uploadForm, type UploadOptions } from './upload'

/** A capture as listed and shown: the DTO, with its mid-band headline once analysed. */
export type CaptureListItem = CaptureDto

export type ExportFormat = 'csv' | 'json'

export interface CapturePageQuery {
  page?: number
  pageSize?: number
  sort?: CaptureSortKey
  order?: 'asc' | 'desc'
  /** Only captures with a finished analysis (true) or without one (false). */
  analysed?: boolean
}

/** One page of a survey's captures, ordered on the server. */
export function listCaptures(surveyId: number, query: CapturePageQuery = {}): Promise<CapturePageDto> {
  const params = {
    page: query.page?.toString(),
    pageSize: query.pageSize?.toString(),
    sort: query.sort,
    order: query.order,
    analysed: query.analysed === undefined ? undefined : String(query.analysed),
  }
  return request<CapturePageDto>('GET', `/surveys/${surveyId}/captures${toQuery(params)}`)
}

/** Multipart upload of one WAV (and optional reference sweep) with byte progress; 202 on success. */
export function uploadCapture(surveyId: number, form: FormData, options?: UploadOptions): Promise<CaptureListItem> {
  return uploadForm<CaptureListItem>(`/surveys/${surveyId}/captures`, form, options)
}

export function getCapture(captureId: number): Promise<CaptureListItem> {
  return request<CaptureListItem>('GET', `/captures/${captureId}`)
}

export function deleteCapture(captureId: number): Promise<void> {
  return request<void>('DELETE', `/captures/${captureId}`)
}

/** The latest analysis, or the one asked for; 404 `analysis-not-ready` until the worker is done. */
export function getAnalysis(captureId: number, analysisId?: number): Promise<AnalysisDto> {
  return request<AnalysisDto>('GET', `/captures/${captureId}/analysis${toQuery({ analysisId: analysisId?.toString() })}`)
}

export function listAnalyses(captureId: number): Promise<AnalysisListItemDto[]> {
  return request<AnalysisListItemDto[]>('GET', `/captures/${captureId}/analyses`)
}

/** Asks for an analysis with these settings (queued once; earlier analyses are kept). */
export function requestAnalysis(captureId: number, settings: AnalysisSettings): Promise<ReanalysisDto> {
  return request<ReanalysisDto>('POST', `/captures/${captureId}/analyses`, settings)
}

/** The export of the analysis shown (by id), or of the one that counts when none is given. */
export function captureExportUrl(captureId: number, format: ExportFormat, analysisId?: number): string {
  return apiUrl(`/captures/${captureId}/export${toQuery({ format, analysisId: analysisId?.toString() })}`)
}

/** Includes the capture in its survey's average, or leaves it out with a reason (owners, engineers). */
export function setCaptureInclusion(captureId: number, body: CaptureInclusionBody): Promise<CaptureListItem> {
  return request<CaptureListItem>('PUT', `/captures/${captureId}/inclusion`, body)
}

/** Pins the analysis used for reporting; null goes back to the default rule. */
export function pinAnalysis(captureId: number, analysisId: number | null): Promise<CaptureListItem> {
  return request<CaptureListItem>('PUT', `/captures/${captureId}/pinned-analysis`, { analysisId })
}
