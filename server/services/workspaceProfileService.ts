import { WorkspaceProfile } from '../models'
import { NotFoundError, ValidationError } from '../errors'
import { requireWorkspaceRole } from '../policy/roomAccess'
import { recordActivity } from './activityService'
import { LOGO_MAX_BYTES, type WorkspaceProfileBody, type WorkspaceProfileDto } from '../../shared/api/workspaceProfile'

function toDto(workspaceId: number, profile: WorkspaceProfile | null): WorkspaceProfileDto {
  return {
    workspaceId,
    consultancyName: profile?.consultancyName ?? '',
    address: profile?.address ?? '',
    contact: profile?.contact ?? '',
    hasLogo: profile?.logo != null,
    updatedAt: profile?.updatedAt.toISOString() ?? null,
  }
}

async function profileRow(workspaceId: number): Promise<WorkspaceProfile> {
  const [profile] = await WorkspaceProfile.findOrCreate({ where: { workspaceId }, defaults: { workspaceId, logo: null, logoContentType: null } })
  return profile
}

export async function getWorkspaceProfile(userId: number, workspaceId: number): Promise<WorkspaceProfileDto> {
  await requireWorkspaceRole(userId, workspaceId, 'profile:read')
  return toDto(workspaceId, await WorkspaceProfile.findOne({ where: { workspaceId } }))
}

/** Name, address and contact printed on the first page of every new report (sent revisions keep theirs). */
export async function updateWorkspaceProfile(userId: number, workspaceId: number, body: WorkspaceProfileBody): Promise<WorkspaceProfileDto> {
  await requireWorkspaceRole(userId, workspaceId, 'profile:manage')
  const profile = await profileRow(workspaceId)
  await profile.update(body)
  await recordActivity({ workspaceId, roomId: null, userId, action: 'profile.updated', summary: 'updated the consultancy profile printed on reports' })
  return toDto(workspaceId, profile)
}

/** The image type by its first bytes: PNG (89 50 4E 47) or JPEG (FF D8 FF); anything else is refused. */
function imageTypeOf(bytes: Buffer): 'image/png' | 'image/jpeg' | null {
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png'
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg'
  return null
}

export async function setWorkspaceLogo(userId: number, workspaceId: number, bytes: Buffer | undefined): Promise<WorkspaceProfileDto> {
  await requireWorkspaceRole(userId, workspaceId, 'profile:manage')
  if (!bytes || bytes.length === 0) throw new ValidationError('Choose a PNG or JPEG image for the logo.', { logo: 'Choose a PNG or JPEG image for the logo.' })
  if (bytes.length > LOGO_MAX_BYTES) throw new ValidationError('The logo must be at most 1 MB.', { logo: 'The logo must be at most 1 MB.' })
  const type = imageTypeOf(bytes)
  if (!type) throw new ValidationError('The logo must be a PNG or JPEG image.', { logo: 'The logo must be a PNG or JPEG image.' })
  const profile = await profileRow(workspaceId)
  await profile.update({ logo: bytes, logoContentType: type })
  await recordActivity({ workspaceId, roomId: null, userId, action: 'profile.logo', summary: 'changed the logo printed on reports' })
  return toDto(workspaceId, profile)
}

export async function removeWorkspaceLogo(userId: number, workspaceId: number): Promise<WorkspaceProfileDto> {
  await requireWorkspaceRole(userId, workspaceId, 'profile:manage')
  const profile = await profileRow(workspaceId)
  await profile.update({ logo: null, logoContentType: null })
  return toDto(workspaceId, profile)
}

export async function getWorkspaceLogo(userId: number, workspaceId: number): Promise<{ bytes: Buffer; contentType: string }> {
  await requireWorkspaceRole(userId, workspaceId, 'profile:read')
  const profile = await WorkspaceProfile.findOne({ where: { workspaceId } })
  if (!profile?.logo || !profile.logoContentType) throw new NotFoundError('A logo')
  return { bytes: profile.logo, contentType: profile.logoContentType }
}
