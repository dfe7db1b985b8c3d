import { ref, watch, type Ref } from 'vue'
import type { CreateShareLinkBody, ShareLinkDto } from '@shared/api'
import * as shareLinksApi from '@/api/shareLinks'
import { useAsyncState } from './useAsyncState'

/** A room's read-only links: list (when allowed), create (its URL is kept only until dismissed), revoke. */
export function useShareLinks(roomId: Ref<number>, isEnabled: Ref<boolean>) {
  const links = ref<ShareLinkDto[]>([])
  const createdUrl = ref<string | null>(null)
  const load = useAsyncState(async (id: number) => (links.value = await shareLinksApi.listShareLinks(id)))
  const create = useAsyncState(async (body: CreateShareLinkBody) => {
    const link = await shareLinksApi.createShareLink(roomId.value, body)
    createdUrl.value = link.url ?? null
    const { url: _url, ...stored } = link
    links.value = [stored, ...links.value]
    return link
  })
  const revoke = useAsyncState(async (linkId: number) => {
    await shareLinksApi.revokeShareLink(roomId.value, linkId)
    const revokedAt = new Date().toISOString()
    links.value = links.value.map((link) => (link.id === linkId ? { ...link, revokedAt } : link))
    return linkId
  })

  watch([roomId, isEnabled], ([id, enabled]) => {
    createdUrl.value = null
    if (enabled) void load.run(id)
  }, { immediate: true })

  return { links, createdUrl, load, create, revoke }
}
