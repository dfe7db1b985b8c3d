import type { ComparisonDto, CreateShareLinkBody, ShareLinkDto } from '@shared/api'
import { apiUrl, request } from './http'

/** The answer carries `url` (with its token) this once: the server keeps only a hash. */
export function createShareLink(roomId: number, body: CreateShareLinkBody): Promise<ShareLinkDto> {
  return request<ShareLinkDto>('POST', `/rooms/${roomId}/share-links`, body)
}

export function listShareLinks(roomId: number): Promise<ShareLinkDto[]> {
  return request<ShareLinkDto[]>('GET', `/rooms/${roomId}/share-links`)
}

export function revokeShareLink(roomId: number, linkId: number): Promise<void> {
  return request<void>('DELETE', `/rooms/${roomId}/share-links/${linkId}`)
}

/** Public, read-only; 410 'share-revoked' / 'share-expired'. */
export function getSharedComparison(token: string): Promise<ComparisonDto> {
  return request<ComparisonDto>('GET', `/shared/${encodeURIComponent(token)}`)
}

export function sharedReportPdfUrl(token: string): string {
  return apiUrl(`/shared/${encodeURIComponent(token)}/report.pdf`)
}
