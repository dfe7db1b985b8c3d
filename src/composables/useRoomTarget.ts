import { computed, ref, watch, type Ref } from 'vue'
import type { CustomTargetBody, RoomDto, TargetOptionDto } from '@shared/api'
import * as reportInputsApi from '@/api/reportInputs'
import { useRoomsStore } from '@/stores/rooms'
import { useAsyncState } from './useAsyncState'

/** The room's target: the choices (published and the workspace's own), choosing one, defining a custom one. */
export function useRoomTarget(room: Ref<RoomDto | null>) {
  const roomsStore = useRoomsStore()
  const options = ref<TargetOptionDto[]>([])
  const canEdit = computed(() => room.value?.permissions.canEdit === true)
  const load = useAsyncState(async (workspaceId: number) => (options.value = await reportInputsApi.listTargetOptions(workspaceId)))
  const choose = useAsyncState(async (targetProfile: string) => {
    const updated = await reportInputsApi.setRoomTarget(room.value!.id, targetProfile)
    roomsStore.remember(updated)
    return updated
  })
  const create = useAsyncState(async (body: CustomTargetBody) => {
    const created = await reportInputsApi.createCustomTarget(room.value!.workspaceId, body)
    await load.run(room.value!.workspaceId)
    await choose.run(`custom:${created.id}`)
    return created
  })
  watch(() => (canEdit.value ? room.value?.workspaceId : undefined), (workspaceId) => {
    if (workspaceId) void load.run(workspaceId)
  }, { immediate: true })
  return { options, load, choose, create, canEdit }
}
