import { ref, watch, type Ref } from 'vue'
import type { ReportRevisionDto } from '@shared/api'
import * as reportInputsApi from '@/api/reportInputs'
import { useAsyncState } from './useAsyncState'

/** A room's report revisions, newest first (sent ones for everyone, the draft for owners and engineers). */
export function useReportRevisions(roomId: Ref<number>) {
  const revisions = ref<ReportRevisionDto[]>([])
  const load = useAsyncState(async (id: number) => (revisions.value = await reportInputsApi.listReportRevisions(id)))
  watch(roomId, (id) => void load.run(id), { immediate: true })
  return { revisions, load, reload: () => load.run(roomId.value) }
}
