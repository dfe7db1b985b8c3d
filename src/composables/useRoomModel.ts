import { computed, ref, shallowRef, watch, type Ref } from 'vue'
import type { LayoutDto, RoomModelDto, TreatmentDto } from '@shared/api'
import type { RoomDimensions } from '@shared/room'
import * as roomModelApi from '@/api/roomModel'
import { clampToRoom } from '@/roomModel/clampToRoom'
import { defaultLayout } from '@/roomModel/defaultLayout'
import { defaultTreatment } from '@/roomModel/defaultTreatment'
import { useAsyncState } from './useAsyncState'

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b)

/** A saved layout moved inside the room, should the room have been made smaller since. */
function layoutInside(layout: LayoutDto, room: RoomDimensions): LayoutDto {
  return { ...layout, listener: clampToRoom(layout.listener, room), speakers: layout.speakers.map((s) => clampToRoom(s, room)) }
}

/**
 * The room model's saved inputs and the drafts being edited: the layout and the treatment plan
 * each have their own draft, dirty flag and explicit save (no autosave: a drag is many moves).
 * Before anything is saved the drafts hold a default layout and a bare-room plan.
 */
export function useRoomModel(roomId: Ref<number>, room: Ref<RoomDimensions | null>, airTemperatureC: Ref<number>) {
  const load = useAsyncState(roomModelApi.getRoomModel)
  const saved = shallowRef<RoomModelDto | null>(null)
  const layoutDraft = ref<LayoutDto | null>(null) as Ref<LayoutDto | null>
  const treatmentDraft = ref<TreatmentDto>(defaultTreatment()) as Ref<TreatmentDto>

  function adopt(model: RoomModelDto): void {
    saved.value = model
    resetLayout()
    treatmentDraft.value = structuredClone(model.treatment ?? defaultTreatment())
  }

  function resetLayout(): void {
    const dimensions = room.value
    if (!dimensions) return void (layoutDraft.value = null)
    const layout = saved.value?.layout
    layoutDraft.value = layout ? layoutInside(layout, dimensions) : defaultLayout(dimensions, airTemperatureC.value)
  }

  watch(roomId, async (id) => {
    const model = await load.run(id)
    if (model) adopt(model)
  }, { immediate: true })
  // Only a change of size resets the draft: a refetch of the same room must not drop unsaved edits.
  watch(() => (room.value ? `${room.value.lengthM}×${room.value.widthM}×${room.value.heightM}` : null), () => resetLayout())

  const hasSavedLayout = computed(() => saved.value?.layout != null)
  const hasSavedTreatment = computed(() => saved.value?.treatment != null)
  const isLayoutDirty = computed(() => layoutDraft.value !== null && !sameJson(layoutDraft.value, saved.value?.layout ?? null))
  const isTreatmentDirty = computed(() => !sameJson(treatmentDraft.value, saved.value?.treatment ?? null))

  const layoutSave = useAsyncState(async () => {
    if (!layoutDraft.value) throw new Error('Give the room its dimensions before placing speakers.')
    const model = await roomModelApi.saveLayout(roomId.value, layoutDraft.value)
    saved.value = model
    return model
  })
  const treatmentSave = useAsyncState(async () => {
    const model = await roomModelApi.saveTreatment(roomId.value, treatmentDraft.value)
    saved.value = model
    return model
  })

  return {
    load,
    saved,
    layoutDraft,
    treatmentDraft,
    hasSavedLayout,
    hasSavedTreatment,
    isLayoutDirty,
    isTreatmentDirty,
    layoutSave,
    treatmentSave,
    revertLayout: resetLayout,
    revertTreatment: () => (treatmentDraft.value = structuredClone(saved.value?.treatment ?? defaultTreatment())),
    reload: () => load.run(roomId.value).then((model) => model && adopt(model)),
  }
}
