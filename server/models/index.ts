import type { Sequelize } from 'sequelize'
import { User } from './User'
import { Workspace } from './Workspace'
import { Membership } from './Membership'
import { Room } from './Room'
import { RoomShare } from './RoomShare'
import { Invitation } from './Invitation'
import { Survey } from './Survey'
import { Capture } from './Capture'
import { Analysis } from './Analysis'
import { RoomModel } from './RoomModel'
import { CustomMaterial } from './CustomMaterial'
import { PasswordReset } from './PasswordReset'
import { ShareLink } from './ShareLink'
import { Activity } from './Activity'
import { CustomTarget } from './CustomTarget'
import { WorkspaceProfile } from './WorkspaceProfile'
import { ReportRevision } from './ReportRevision'

import { ApiToken } from './ApiToken'

export { User, Workspace, Membership, Room, RoomShare, Invitation, Survey, Capture, Analysis, RoomModel, CustomMaterial, PasswordReset, ShareLink, Activity, CustomTarget, WorkspaceProfile, ReportRevision, ApiToken }

let initialisedFor: Sequelize | null = null

/** Initialises every model on one Sequelize instance and wires the associations (once). */
export function initModels(sequelize: Sequelize): void {
  if (initialisedFor === sequelize) return
  for (const model of [User, Workspace, Membership, Room, RoomShare, Invitation, Survey, Capture, Analysis, RoomModel, CustomMaterial, PasswordReset, ShareLink, Activity, CustomTarget, WorkspaceProfile, ReportRevision, ApiToken]) {
    model.initModel(sequelize)
  }
  Workspace.hasMany(Membership, { foreignKey: 'workspaceId', as: 'memberships' })
  Membership.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' })
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' })
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' })
  Workspace.hasMany(Room, { foreignKey: 'workspaceId', as: 'rooms' })
  Room.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' })
  Room.hasMany(RoomShare, { foreignKey: 'roomId', as: 'shares' })
  RoomShare.belongsTo(Room, { foreignKey: 'roomId', as: 'room' })
  RoomShare.belongsTo(User, { foreignKey: 'userId', as: 'user' })
  Room.hasMany(Survey, { foreignKey: 'roomId', as: 'surveys' })
  Survey.belongsTo(Room, { foreignKey: 'roomId', as: 'room' })
  Survey.hasMany(Capture, { foreignKey: 'surveyId', as: 'captures' })
  Capture.belongsTo(Survey, { foreignKey: 'surveyId', as: 'survey' })
  Capture.hasMany(Analysis, { foreignKey: 'captureId', as: 'analyses' })
  Analysis.belongsTo(Capture, { foreignKey: 'captureId', as: 'capture' })
  Activity.belongsTo(User, { foreignKey: 'userId', as: 'user' })
  Workspace.hasMany(CustomTarget, { foreignKey: 'workspaceId', as: 'customTargets' })
  ShareLink.belongsTo(ReportRevision, { foreignKey: 'reportRevisionId', as: 'reportRevision' })
  Room.hasMany(ReportRevision, { foreignKey: 'roomId', as: 'reportRevisions' })
  Workspace.hasMany(Invitation, { foreignKey: 'workspaceId', as: 'invitations' })
  ApiToken.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' })
  initialisedFor = sequelize
}
