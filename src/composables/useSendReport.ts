import type { SendReportBody } from '@shared/api'
import * as reportsApi from '@/api/reports'
import { useAsyncState } from './useAsyncState'

/** Sends the comparison report of a room to a client by e-mail (a read-only link to it). */
export function useSendReport() {
  return useAsyncState((roomId: number, body: SendReportBody) => reportsApi.sendReport(roomId, body))
}
