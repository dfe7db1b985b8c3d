import type { CustomMaterialBody, LayoutDto, MaterialDto, RoomModelDto, TreatmentDto } from '@shared/api'
import { request } from './http'

export function getRoomModel(roomId: number): Promise<RoomModelDto> {
  return request<RoomModelDto>('GET', `/rooms/${roomId}/model`)
}

/** 400 with `fields` when a position lies outside the room; 403 for clients and viewers. */
export function saveLayout(roomId: number, layout: LayoutDto): Promise<RoomModelDto> {
  return request<RoomModelDto>('PUT', `/rooms/${roomId}/model/layout`, layout)
}

/** 400 for unknown material ids. */
export function saveTreatment(roomId: number, treatment: TreatmentDto): Promise<RoomModelDto> {
  return request<RoomModelDto>('PUT', `/rooms/${roomId}/model/treatment`, treatment)
}

/** The built-in handbook rows (each with its source) and the workspace's own materials ('custom-N'). */
export function listMaterials(workspaceId: number): Promise<MaterialDto[]> {
  return request<MaterialDto[]>('GET', `/workspaces/${workspaceId}/materials`)
}

export function createMaterial(workspaceId: number, body: CustomMaterialBody): Promise<MaterialDto> {
  return request<MaterialDto>('POST', `/workspaces/${workspaceId}/materials`, body)
}

/** Deletes a custom material by its DTO id ('custom-7' → DELETE …/materials/7). */
export function deleteMaterial(workspaceId: number, materialId: string): Promise<void> {
  const numericId = materialId.replace(/^custom-/, '')
  return request<void>('DELETE', `/workspaces/${workspaceId}/materials/${numericId}`)
}
