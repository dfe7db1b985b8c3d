import { computed, watch, type Ref } from 'vue'
import * as shareLinksApi from '@/api/shareLinks'
import { isApiError } from '@/api/ApiError'
import { isLinkToken } from '@/utils/linkToken'
import { useAsyncState } from './useAsyncState'

/** The comparison behind a read-only link, and whether the link is gone (revoked, expired, unknown). */
export function useSharedComparison(token: Ref<string>) {
  const load = useAsyncState(shareLinksApi.getSharedComparison)
  watch(token, (value) => {
    if (isLinkToken(value)) void load.run(value)
  }, { immediate: true })
  const isGone = computed(() => !isLinkToken(token.value) || (isApiError(load.error.value) && (load.error.value.status === 410 || load.error.value.status === 404)))
  return { ...load, isGone }
}
