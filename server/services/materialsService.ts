import { CustomMaterial } from '../models'
import { NotFoundError } from '../errors'
import { requireWorkspaceRole } from '../policy/roomAccess'
import { requireMembershipRole } from './membershipLookup'
import { MATERIALS } from '../../shared/room/materials'
import type { CustomMaterialBody, MaterialDto } from '../../shared/api/roomModel'

const CUSTOM_PREFIX = 'custom-'

function customToDto(material: CustomMaterial): MaterialDto {
  return { id: `${CUSTOM_PREFIX}${material.id}`, name: material.name, kind: material.kind, coefficients: material.coefficients, source: material.source, isBuiltIn: false }
}

/** The built-in handbook library plus the workspace's own materials. */
export async function workspaceMaterials(workspaceId: number): Promise<MaterialDto[]> {
  const custom = await CustomMaterial.findAll({ where: { workspaceId }, order: [['name', 'ASC']] })
  return [...MATERIALS.map((m) => ({ ...m, coefficients: [...m.coefficients], isBuiltIn: true })), ...custom.map(customToDto)]
}

export async function listMaterials(userId: number, workspaceId: number): Promise<MaterialDto[]> {
  await requireMembershipRole(userId, workspaceId)
  return workspaceMaterials(workspaceId)
}

export async function createMaterial(userId: number, workspaceId: number, body: CustomMaterialBody): Promise<MaterialDto> {
  await requireWorkspaceRole(userId, workspaceId, 'room:create')
  return customToDto(await CustomMaterial.create({ ...body, workspaceId }))
}

export async function deleteMaterial(userId: number, workspaceId: number, materialId: number): Promise<void> {
  await requireWorkspaceRole(userId, workspaceId, 'room:create')
  const removed = await CustomMaterial.destroy({ where: { id: materialId, workspaceId } })
  if (removed === 0) throw new NotFoundError('That material')
}
