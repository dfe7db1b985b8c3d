import { watch, type Ref } from 'vue'
import * as activityApi from '@/api/activity'
import { useAsyncState } from './useAsyncState'

/** The room's activity trail, newest first; `reload` after an action on the page adds to it. */
export function useRoomActivity(roomId: Ref<number>) {
  const load = useAsyncState(activityApi.listRoomActivity)
  watch(roomId, (id) => void load.run(id), { immediate: true })
  return { ...load, reload: () => load.run(roomId.value) }
}
