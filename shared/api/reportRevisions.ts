import type { BandResolution } from '../types/analysis'
import type { ComparisonDto } from './results'
import type { SurveyAnalysisSettings, SurveyEquipment } from './surveys'
import type { WorkspaceProfileBody } from './workspaceProfile'

/** How one survey was measured and analysed, for the report's method notes. */
export interface ReportSurveyMethod {
  surveyId: number
  name: string
  measuredOn: string
  temperatureC: number | null
  humidityPercent: number | null
  equipment: SurveyEquipment
  analysisSettings: SurveyAnalysisSettings
  impulseCount: number
  sweepCount: number
  /** Distinct sweep ranges used, e.g. "20 Hz–20 kHz, 6 s". */
  sweeps: string[]
}

/** Everything a frozen revision shows, kept as it was when it was sent or shared. */
export interface ReportSnapshot {
  revisionNumber: number
  frozenAt: string
  preparedBy: string | null
  profile: WorkspaceProfileBody & { hasLogo: boolean }
  comparison: ComparisonDto
  methods: ReportSurveyMethod[]
  engineVersions: string[]
}

export interface ReportRevisionDto {
  id: number
  number: number
  status: 'draft' | 'sent'
  surveyIds: number[]
  bands: BandResolution
  /** Names of the surveys as they were frozen (drafts: as they are now). */
  surveyNames: string[]
  /** What changed since the previous sent revision. */
  changeNotes: string[]
  frozenAt: string | null
  recipients: { email: string; sentAt: string }[]
  /** The frozen verdict line (sent revisions only). */
  summaryLine: string | null
  createdAt: string
}

/** A sent revision as the share link and the room page open it. */
export interface ReportRevisionDetailDto extends ReportRevisionDto {
  snapshot: ReportSnapshot
}
