import type { WorkspaceProfileBody, WorkspaceProfileDto } from '@shared/api'
import { ApiError } from './ApiError'
import { apiUrl, getCsrfToken, request, toApiError } from './http'

export function getWorkspaceProfile(workspaceId: number): Promise<WorkspaceProfileDto> {
  return request<WorkspaceProfileDto>('GET', `/workspaces/${workspaceId}/profile`)
}

export function updateWorkspaceProfile(workspaceId: number, body: WorkspaceProfileBody): Promise<WorkspaceProfileDto> {
  return request<WorkspaceProfileDto>('PUT', `/workspaces/${workspaceId}/profile`, body)
}

export function workspaceLogoUrl(workspaceId: number, version: string | null): string {
  return apiUrl(`/workspaces/${workspaceId}/profile/logo${version ? `?v=${encodeURIComponent(version)}` : ''}`)
}

/** Uploads a PNG or JPEG logo as the raw request body (the server checks its type and size). */
export async function uploadWorkspaceLogo(workspaceId: number, file: File): Promise<WorkspaceProfileDto> {
  const token = await getCsrfToken()
  let response: Response
  try {
    response = await fetch(apiUrl(`/workspaces/${workspaceId}/profile/logo`), {
      method: 'PUT',
      headers: { accept: 'application/json', 'content-type': file.type || 'application/octet-stream', 'x-csrf-token': token },
      credentials: 'same-origin',
      body: file,
    })
  } catch {
    throw new ApiError(0, { code: 'network', message: 'Ringdown cannot reach its server. Check your connection and try again.' })
  }
  const json: unknown = await response.json().catch(() => undefined)
  if (!response.ok) throw toApiError(response.status, json)
  return json as WorkspaceProfileDto
}

export function removeWorkspaceLogo(workspaceId: number): Promise<WorkspaceProfileDto> {
  return request<WorkspaceProfileDto>('DELETE', `/workspaces/${workspaceId}/profile/logo`)
}
