import { ref, watch, type Ref } from 'vue'
import type { RoomShareDto } from '@shared/api'
import * as sharesApi from '@/api/roomShares'
import { useAsyncState } from './useAsyncState'

/** Who a room is shared with, and adding or removing people; loads only when `isEnabled`. */
export function useRoomShares(roomId: Ref<number>, isEnabled: Ref<boolean>) {
  const shares = ref<RoomShareDto[]>([])
  const load = useAsyncState(async (id: number) => (shares.value = await sharesApi.listRoomShares(id)))
  const add = useAsyncState(async (email: string) => {
    const share = await sharesApi.shareRoom(roomId.value, { email })
    shares.value = [...shares.value.filter((s) => s.userId !== share.userId), share]
    return share
  })
  const remove = useAsyncState(async (userId: number) => {
    await sharesApi.unshareRoom(roomId.value, userId)
    shares.value = shares.value.filter((s) => s.userId !== userId)
    return userId
  })

  watch([roomId, isEnabled], ([id, enabled]) => {
    if (enabled) void load.run(id)
  }, { immediate: true })

  return { shares, load, add, remove }
}
