import type { CreateRoomBody, RoomDto, UpdateRoomBody } from '@shared/api'
import { request, toQuery } from './http'

export function listRooms(workspaceId: number, search?: string): Promise<RoomDto[]> {
  return request<RoomDto[]>('GET', `/workspaces/${workspaceId}/rooms${toQuery({ search })}`)
}

export function createRoom(workspaceId: number, body: CreateRoomBody): Promise<RoomDto> {
  return request<RoomDto>('POST', `/workspaces/${workspaceId}/rooms`, body)
}

export function getRoom(roomId: number): Promise<RoomDto> {
  return request<RoomDto>('GET', `/rooms/${roomId}`)
}

export function updateRoom(roomId: number, body: UpdateRoomBody): Promise<RoomDto> {
  return request<RoomDto>('PATCH', `/rooms/${roomId}`, body)
}

export function deleteRoom(roomId: number): Promise<void> {
  return request<void>('DELETE', `/rooms/${roomId}`)
}
