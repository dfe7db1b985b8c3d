import { ref } from 'vue'
import type { ApiTokenActivityDto, ApiTokenDto, CreateApiTokenBody, CreatedApiTokenDto } from '@shared/api'
import * as apiTokensApi from '@/api/apiTokens'
import { useAsyncState } from './useAsyncState'

/** The signed-in person's API tokens: list, create (the secret is kept only until dismissed), revoke. */
export function useApiTokens() {
  const tokens = ref<ApiTokenDto[]>([])
  const created = ref<CreatedApiTokenDto | null>(null)
  const activity = ref<{ tokenId: number; lines: ApiTokenActivityDto[] } | null>(null)

  function replace(token: ApiTokenDto): void {
    tokens.value = tokens.value.map((t) => (t.id === token.id ? token : t))
  }

  const load = useAsyncState(async () => (tokens.value = await apiTokensApi.listApiTokens()))
  const create = useAsyncState(async (body: CreateApiTokenBody) => {
    const answer = await apiTokensApi.createApiToken(body)
    tokens.value = [answer.token, ...tokens.value]
    created.value = answer
    return answer
  })
  const revoke = useAsyncState(async (tokenId: number) => {
    const token = await apiTokensApi.revokeApiToken(tokenId)
    replace(token)
    if (created.value?.token.id === tokenId) created.value = null
    return token
  })
  const loadActivity = useAsyncState(async (tokenId: number) => {
    activity.value = { tokenId, lines: await apiTokensApi.listApiTokenActivity(tokenId) }
    return activity.value
  })

  function forgetSecret(): void {
    created.value = null
  }

  void load.run()
  return { tokens, created, activity, load, create, revoke, loadActivity, forgetSecret }
}
