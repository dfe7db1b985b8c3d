import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { CreateRoomBody, RoomDto, UpdateRoomBody } from '@shared/api'
import * as roomsApi from '@/api/rooms'

/** Rooms the user has seen: the last list loaded and every room opened, by id. */
export const useRoomsStore = defineStore('rooms', () => {
  const list = ref<RoomDto[]>([])
  const listWorkspaceId = ref<number | null>(null)
  const byId = ref<Record<number, RoomDto>>({})

  function remember(room: RoomDto): RoomDto {
    byId.value[room.id] = room
    const index = list.value.findIndex((r) => r.id === room.id)
    if (index >= 0) list.value[index] = room
    return room
  }

  async function fetchRooms(workspaceId: number, search?: string): Promise<RoomDto[]> {
    const rooms = await roomsApi.listRooms(workspaceId, search?.trim() || undefined)
    list.value = rooms
    listWorkspaceId.value = workspaceId
    for (const room of rooms) byId.value[room.id] = room
    return rooms
  }

  async function fetchRoom(roomId: number): Promise<RoomDto> {
    return remember(await roomsApi.getRoom(roomId))
  }

  async function createRoom(workspaceId: number, body: CreateRoomBody): Promise<RoomDto> {
    const room = remember(await roomsApi.createRoom(workspaceId, body))
    if (listWorkspaceId.value === workspaceId) list.value.push(room)
    return room
  }

  async function updateRoom(roomId: number, body: UpdateRoomBody): Promise<RoomDto> {
    return remember(await roomsApi.updateRoom(roomId, body))
  }

  async function deleteRoom(roomId: number): Promise<void> {
    await roomsApi.deleteRoom(roomId)
    delete byId.value[roomId]
    list.value = list.value.filter((room) => room.id !== roomId)
  }

  return { list, listWorkspaceId, byId, remember, fetchRooms, fetchRoom, createRoom, updateRoom, deleteRoom }
})
