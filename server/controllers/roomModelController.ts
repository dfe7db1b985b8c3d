import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as roomModel from '../services/roomModelService'
import * as materials from '../services/materialsService'
import type { CustomMaterialBody, LayoutDto, TreatmentDto } from '../../shared/api/roomModel'

type RoomParams = { roomId: number }
type WorkspaceParams = { workspaceId: number; materialId: number }

export async function show(req: Request, res: Response) {
  res.json(await roomModel.getRoomModel(currentUserId(req), (req.params as unknown as RoomParams).roomId))
}

export async function saveLayout(req: Request, res: Response) {
  res.json(await roomModel.saveLayout(currentUserId(req), (req.params as unknown as RoomParams).roomId, req.body as LayoutDto))
}

export async function saveTreatment(req: Request, res: Response) {
  res.json(await roomModel.saveTreatment(currentUserId(req), (req.params as unknown as RoomParams).roomId, req.body as TreatmentDto))
}

export async function listMaterials(req: Request, res: Response) {
  res.json(await materials.listMaterials(currentUserId(req), (req.params as unknown as WorkspaceParams).workspaceId))
}

export async function createMaterial(req: Request, res: Response) {
  res.status(201).json(await materials.createMaterial(currentUserId(req), (req.params as unknown as WorkspaceParams).workspaceId, req.body as CustomMaterialBody))
}

export async function deleteMaterial(req: Request, res: Response) {
  const { workspaceId, materialId } = req.params as unknown as WorkspaceParams
  await materials.deleteMaterial(currentUserId(req), workspaceId, materialId)
  res.status(204).end()
}
