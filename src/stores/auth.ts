import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { MeResponse, MembershipDto, RegisterBody, Role, SignInBody, UserDto } from '@shared/api'
import * as authApi from '@/api/auth'
import { isApiError } from '@/api/ApiError'
import { onUnauthenticated } from '@/api/http'
import { STORAGE_KEYS, readStorage, writeStorage } from '@/utils/storage'

/** Who is signed in, their workspaces, and which workspace they are working in. */
export const useAuthStore = defineStore('auth', () => {
  const user = ref<UserDto | null>(null)
  const memberships = ref<MembershipDto[]>([])
  const selectedWorkspaceId = ref<number | null>(Number(readStorage(STORAGE_KEYS.workspaceId)) || null)
  const hasLoaded = ref(false)
  /** True when the server said the session is gone while the user was working. */
  const sessionExpired = ref(false)
  let loading: Promise<void> | null = null

  const isSignedIn = computed(() => user.value !== null)
  const currentMembership = computed<MembershipDto | null>(
    () => memberships.value.find((m) => m.workspaceId === selectedWorkspaceId.value) ?? memberships.value[0] ?? null,
  )
  const currentWorkspaceId = computed(() => currentMembership.value?.workspaceId ?? null)
  const currentRole = computed<Role | null>(() => currentMembership.value?.role ?? null)
  const canManageRooms = computed(() => currentRole.value === 'owner' || currentRole.value === 'engineer')

  function apply(me: MeResponse | null): void {
    user.value = me?.user ?? null
    memberships.value = me?.memberships ?? []
    hasLoaded.value = true
    sessionExpired.value = false
  }

  /** Asks the server once who is signed in; later calls reuse the answer. */
  function ensureLoaded(): Promise<void> {
    if (hasLoaded.value) return Promise.resolve()
    loading ??= authApi
      .getMe()
      .then(apply, (error: unknown) => {
        if (isApiError(error) && error.status === 401) apply(null)
        else throw error
      })
      .finally(() => (loading = null))
    return loading
  }

  async function signIn(body: SignInBody): Promise<void> {
    apply(await authApi.signIn(body))
  }

  async function register(body: RegisterBody): Promise<void> {
    apply(await authApi.register(body))
  }

  async function signOut(): Promise<void> {
    try {
      await authApi.signOut()
    } finally {
      apply(null)
    }
  }

  function selectWorkspace(workspaceId: number): void {
    selectedWorkspaceId.value = workspaceId
    writeStorage(STORAGE_KEYS.workspaceId, String(workspaceId))
  }

  onUnauthenticated(() => {
    if (!user.value) return
    apply(null)
    sessionExpired.value = true
  })

  return {
    user, memberships, hasLoaded, sessionExpired, isSignedIn, currentMembership, currentWorkspaceId, currentRole, canManageRooms,
    ensureLoaded, signIn, register, signOut, selectWorkspace,
  }
})
