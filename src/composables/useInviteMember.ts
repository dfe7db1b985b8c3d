import type { CreateInvitationBody } from '@shared/api'
import * as invitationsApi from '@/api/invitations'
import { useAsyncState } from './useAsyncState'

/** Sends one invitation by e-mail to join a workspace (and, for clients and viewers, a room). */
export function useInviteMember() {
  return useAsyncState((workspaceId: number, body: CreateInvitationBody) => invitationsApi.createInvitation(workspaceId, body))
}
