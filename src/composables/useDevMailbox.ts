import { onMounted } from 'vue'
import * as devMailboxApi from '@/api/devMailbox'
import { useAsyncState } from './useAsyncState'

/** The local fake inbox, loaded on mount and on demand. */
export function useDevMailbox() {
  const load = useAsyncState(devMailboxApi.listDevMailbox)
  onMounted(() => void load.run())
  return load
}
