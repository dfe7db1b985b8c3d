import { ref, watch, type Ref } from 'vue'
import type { WorkspaceProfileBody, WorkspaceProfileDto } from '@shared/api'
import * as profileApi from '@/api/workspaceProfile'
import { useAsyncState } from './useAsyncState'

/** The consultancy block printed on the first page of every new report, and its logo. */
export function useWorkspaceProfile(workspaceId: Ref<number | null>) {
  const profile = ref<WorkspaceProfileDto | null>(null)
  const load = useAsyncState(async (id: number) => (profile.value = await profileApi.getWorkspaceProfile(id)))
  const save = useAsyncState(async (body: WorkspaceProfileBody) => (profile.value = await profileApi.updateWorkspaceProfile(workspaceId.value!, body)))
  const uploadLogo = useAsyncState(async (file: File) => (profile.value = await profileApi.uploadWorkspaceLogo(workspaceId.value!, file)))
  const removeLogo = useAsyncState(async () => (profile.value = await profileApi.removeWorkspaceLogo(workspaceId.value!)))
  watch(workspaceId, (id) => {
    if (id) void load.run(id)
  }, { immediate: true })
  return { profile, load, save, uploadLogo, removeLogo }
}
