import type { AcceptedInvitationDto, CreateInvitationBody, InvitationDto, InvitationPreviewDto } from '@shared/api'
import { request } from './http'

/** Owners invite with any role; engineers only clients and viewers (403 otherwise). */
export function createInvitation(workspaceId: number, body: CreateInvitationBody): Promise<InvitationDto> {
  return request<InvitationDto>('POST', `/workspaces/${workspaceId}/invitations`, body)
}

/** The workspace's invitations not yet accepted. */
export function listInvitations(workspaceId: number): Promise<InvitationDto[]> {
  return request<InvitationDto[]>('GET', `/workspaces/${workspaceId}/invitations`)
}

/** Public: what the link invites to; 404 unknown, 410 'invitation-used' / 'invitation-expired'. */
export function getInvitationPreview(token: string): Promise<InvitationPreviewDto> {
  return request<InvitationPreviewDto>('GET', `/invitations/${encodeURIComponent(token)}`)
}

/** Signed in: joins the workspace (and room); 403 'invitation-other-email' for another address. */
export function acceptInvitation(token: string): Promise<AcceptedInvitationDto> {
  return request<AcceptedInvitationDto>('POST', `/invitations/${encodeURIComponent(token)}/accept`)
}
