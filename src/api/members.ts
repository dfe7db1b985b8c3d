import type { AddMemberBody, MemberDto, UpdateMemberBody } from '@shared/api'
import { request } from './http'

export function listMembers(workspaceId: number): Promise<MemberDto[]> {
  return request<MemberDto[]>('GET', `/workspaces/${workspaceId}/members`)
}

export function addMember(workspaceId: number, body: AddMemberBody): Promise<MemberDto> {
  return request<MemberDto>('POST', `/workspaces/${workspaceId}/members`, body)
}

export function updateMember(workspaceId: number, userId: number, body: UpdateMemberBody): Promise<MemberDto> {
  return request<MemberDto>('PATCH', `/workspaces/${workspaceId}/members/${userId}`, body)
}

export function removeMember(workspaceId: number, userId: number): Promise<void> {
  return request<void>('DELETE', `/workspaces/${workspaceId}/members/${userId}`)
}
