import type { RoomShareDto, ShareRoomBody } from '@shared/api'
import { request } from './http'

export function listRoomShares(roomId: number): Promise<RoomShareDto[]> {
  return request<RoomShareDto[]>('GET', `/rooms/${roomId}/shares`)
}

export function shareRoom(roomId: number, body: ShareRoomBody): Promise<RoomShareDto> {
  return request<RoomShareDto>('POST', `/rooms/${roomId}/shares`, body)
}

export function unshareRoom(roomId: number, userId: number): Promise<void> {
  return request<void>('DELETE', `/rooms/${roomId}/shares/${userId}`)
}
