import { computed, watch, type Ref } from 'vue'
import { useRouter, type RouteLocationRaw } from 'vue-router'
import type { InvitationPreviewDto } from '@shared/api'
import * as authApi from '@/api/auth'
import * as invitationsApi from '@/api/invitations'
import * as roomsApi from '@/api/rooms'
import { isApiError } from '@/api/ApiError'
import { useAuthStore } from '@/stores/auth'
import { isLinkToken } from '@/utils/linkToken'
import { useAsyncState } from './useAsyncState'

export type InvitationProblem = 'invalid' | 'used' | 'expired' | null

/** Where an accepted invitation lands: its room, or the rooms list of its workspace. */
function landing(roomId: number | null): RouteLocationRaw {
  return roomId === null ? { name: 'rooms' } : { name: 'room', params: { roomId } }
}

/**
 * One invitation link: its preview, and joining by accepting (signed in) or by registering with
 * the token (the server then accepts it); both end in the invited room or the rooms list.
 */
export function useInvitation(token: Ref<string>) {
  const auth = useAuthStore()
  const router = useRouter()
  const preview = useAsyncState(invitationsApi.getInvitationPreview)
  watch(token, (value) => void (isLinkToken(value) && preview.run(value)), { immediate: true })

  const problem = computed<InvitationProblem>(() => {
    const error = preview.error.value
    if (!isLinkToken(token.value) || (isApiError(error) && error.status === 404)) return 'invalid'
    if (isApiError(error) && error.code === 'invitation-used') return 'used'
    if (isApiError(error) && error.code === 'invitation-expired') return 'expired'
    return null
  })
  const isForOtherAccount = computed(() => auth.user !== null && preview.data.value !== null && auth.user.email !== preview.data.value.email)

  const accept = useAsyncState(async () => {
    const accepted = await invitationsApi.acceptInvitation(token.value)
    // The session now has one more membership: read it before switching to that workspace.
    const me = await authApi.getMe()
    auth.$patch({ user: me.user, memberships: me.memberships })
    auth.selectWorkspace(accepted.workspaceId)
    await router.replace(landing(accepted.roomId))
    return accepted
  })

  const register = useAsyncState(async (name: string, password: string, invitation: InvitationPreviewDto) => {
    await auth.register({ name, email: invitation.email, password, workspaceName: '', invitationToken: token.value })
    const membership = auth.memberships.find((m) => m.workspaceName === invitation.workspaceName)
    if (membership) auth.selectWorkspace(membership.workspaceId)
    // Registration answers with the account only, so the invited room is found by its name.
    const rooms = membership && invitation.roomName ? await roomsApi.listRooms(membership.workspaceId).catch(() => []) : []
    const matches = rooms.filter((room) => room.name === invitation.roomName)
    await router.replace(landing(matches.length === 1 ? (matches[0]?.id ?? null) : null))
  })

  return { preview, problem, isForOtherAccount, accept, register }
}
