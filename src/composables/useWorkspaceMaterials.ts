import { ref, watch, type Ref } from 'vue'
import type { CustomMaterialBody, MaterialDto } from '@shared/api'
import { MATERIALS } from '@shared/room'
import * as roomModelApi from '@/api/roomModel'
import { useAsyncState } from './useAsyncState'

/** The built-in library as DTOs: what the page uses until (or unless) the workspace list loads. */
export function builtInMaterials(): MaterialDto[] {
  return MATERIALS.map((m) => ({ ...m, coefficients: [...m.coefficients], isBuiltIn: true }))
}

/** The workspace's material library (built-in handbook rows plus its own), with add and delete. */
export function useWorkspaceMaterials(workspaceId: Ref<number | null>) {
  const materials = ref<MaterialDto[]>(builtInMaterials())
  const load = useAsyncState(roomModelApi.listMaterials)
  watch(workspaceId, async (id) => {
    if (id === null) return
    const list = await load.run(id)
    if (list) materials.value = list
  }, { immediate: true })

  const create = useAsyncState(async (body: CustomMaterialBody) => {
    if (workspaceId.value === null) throw new Error('The room’s workspace is not known yet.')
    const material = await roomModelApi.createMaterial(workspaceId.value, body)
    materials.value = [...materials.value, material]
    return material
  })
  const remove = useAsyncState(async (materialId: string) => {
    if (workspaceId.value === null) throw new Error('The room’s workspace is not known yet.')
    await roomModelApi.deleteMaterial(workspaceId.value, materialId)
    materials.value = materials.value.filter((m) => m.id !== materialId)
  })
  return { materials, load, create, remove }
}
