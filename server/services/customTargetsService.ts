import { CustomTarget, Room } from '../models'
import { ConflictError, NotFoundError } from '../errors'
import { requireWorkspaceRole } from '../policy/roomAccess'
import { requireMembershipRole } from './membershipLookup'
import { recordActivity } from './activityService'
import { targetOptions } from './roomTargetService'
import type { CustomTargetBody, CustomTargetDto, TargetOptionDto } from '../../shared/api/targets'

function toDto(target: CustomTarget): CustomTargetDto {
  return {
    id: target.id,
    workspaceId: target.workspaceId,
    name: target.name,
    sourceNote: target.sourceNote,
    octaveLimits: target.octaveLimits,
    createdAt: target.createdAt.toISOString(),
    updatedAt: target.updatedAt.toISOString(),
  }
}

export async function listCustomTargets(userId: number, workspaceId: number): Promise<CustomTargetDto[]> {
  await requireMembershipRole(userId, workspaceId)
  return (await CustomTarget.findAll({ where: { workspaceId }, order: [['name', 'ASC']] })).map(toDto)
}

/** The targets a room of this workspace can choose, for the picker on the room page. */
export async function listTargetOptions(userId: number, workspaceId: number): Promise<TargetOptionDto[]> {
  await requireMembershipRole(userId, workspaceId)
  return targetOptions(workspaceId)
}

export async function createCustomTarget(userId: number, workspaceId: number, body: CustomTargetBody): Promise<CustomTargetDto> {
  await requireWorkspaceRole(userId, workspaceId, 'targets:manage')
  const target = await CustomTarget.create({ ...body, workspaceId, createdById: userId })
  await recordActivity({ workspaceId, roomId: null, userId, action: 'target.created', summary: `defined the custom target "${target.name}"` })
  return toDto(target)
}

async function requireOwnTarget(userId: number, workspaceId: number, targetId: number): Promise<CustomTarget> {
  await requireWorkspaceRole(userId, workspaceId, 'targets:manage')
  const target = await CustomTarget.findOne({ where: { id: targetId, workspaceId } })
  if (!target) throw new NotFoundError('That target')
  return target
}

/** Rooms using the target are judged by the new limits from now on; sent reports keep theirs. */
export async function updateCustomTarget(userId: number, workspaceId: number, targetId: number, body: CustomTargetBody): Promise<CustomTargetDto> {
  const target = await requireOwnTarget(userId, workspaceId, targetId)
  await target.update(body)
  await recordActivity({ workspaceId, roomId: null, userId, action: 'target.updated', summary: `changed the limits of the custom target "${target.name}"` })
  return toDto(target)
}

/** A target that rooms still use cannot be deleted: choose another target for them first. */
export async function deleteCustomTarget(userId: number, workspaceId: number, targetId: number): Promise<void> {
  const target = await requireOwnTarget(userId, workspaceId, targetId)
  const users = await Room.findAll({ where: { workspaceId, targetProfile: `custom:${target.id}` }, attributes: ['name'] })
  if (users.length > 0) {
    throw new ConflictError('target-in-use', `Rooms still use this target: ${users.map((r) => `“${r.name}”`).join(', ')}. Choose another target for them first.`)
  }
  await target.destroy()
  await recordActivity({ workspaceId, roomId: null, userId, action: 'target.deleted', summary: `deleted the custom target "${target.name}"` })
}
