import type { ActivityDto } from '@shared/api'
import { request } from './http'

/** The room's trail, newest first. */
export function listRoomActivity(roomId: number): Promise<ActivityDto[]> {
  return request<ActivityDto[]>('GET', `/rooms/${roomId}/activity`)
}
