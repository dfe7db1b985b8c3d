import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as rooms from '../services/roomsService'
import * as shares from '../services/sharesService'
import type { CreateRoomBody, ShareRoomBody, UpdateRoomBody } from '../../shared/api/rooms'
import type { ObjectStore } from '../storage/createObjectStore'

type WorkspaceParams = { workspaceId: number }
type RoomParams = { roomId: number }

export async function list(req: Request, res: Response) {
  const { workspaceId } = req.params as unknown as WorkspaceParams
  const { search } = req.query as { search?: string }
  res.json(await rooms.listRooms(currentUserId(req), workspaceId, search))
}

export async function create(req: Request, res: Response) {
  const { workspaceId } = req.params as unknown as WorkspaceParams
  res.status(201).json(await rooms.createRoom(currentUserId(req), workspaceId, req.body as CreateRoomBody))
}

export async function show(req: Request, res: Response) {
  const { roomId } = req.params as unknown as RoomParams
  res.json(await rooms.getRoom(currentUserId(req), roomId))
}

export async function update(req: Request, res: Response) {
  const { roomId } = req.params as unknown as RoomParams
  res.json(await rooms.updateRoom(currentUserId(req), roomId, req.body as UpdateRoomBody))
}

export function remove(store: ObjectStore) {
  return async (req: Request, res: Response) => {
    const { roomId } = req.params as unknown as RoomParams
    await rooms.deleteRoom(currentUserId(req), roomId, store)
    res.status(204).end()
  }
}

export async function listShares(req: Request, res: Response) {
  const { roomId } = req.params as unknown as RoomParams
  res.json(await shares.listShares(currentUserId(req), roomId))
}

export async function share(req: Request, res: Response) {
  const { roomId } = req.params as unknown as RoomParams
  res.status(201).json(await shares.shareRoom(currentUserId(req), roomId, req.body as ShareRoomBody))
}

export async function unshare(req: Request, res: Response) {
  const { roomId, userId } = req.params as unknown as RoomParams & { userId: number }
  await shares.unshareRoom(currentUserId(req), roomId, userId)
  res.status(204).end()
}
