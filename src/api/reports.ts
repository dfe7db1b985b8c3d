import type { SendReportBody, ShareLinkDto } from '@shared/api'
import type { BandResolution } from '@shared/types/analysis'
import { apiUrl, request, toQuery } from './http'

/** The PDF report of a comparison, for a plain download link (session cookie, GET). */
export function roomReportPdfUrl(roomId: number, surveyIds: readonly number[], bands: BandResolution = 'octave'): string {
  return apiUrl(`/rooms/${roomId}/report.pdf${toQuery({ surveys: surveyIds.join(','), bands })}`)
}

/** Mails the recipient a read-only link to the comparison; answers with that link (without its URL). */
export function sendReport(roomId: number, body: SendReportBody): Promise<ShareLinkDto> {
  return request<ShareLinkDto>('POST', `/rooms/${roomId}/reports`, body)
}
