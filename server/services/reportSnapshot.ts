import { createHash } from 'node:crypto'
import { Capture, User, Workspace, WorkspaceProfile, type Room } from '../models'
import { compareSurveysOfRoom } from './comparisonService'
import type { ComparisonDto } from '../../shared/api/results'
import type { ReportSnapshot, ReportSurveyMethod } from '../../shared/api/reportRevisions'
import type { BandResolution } from '../../shared/types/analysis'

/** The consultancy block of a workspace's reports; an empty name falls back to the workspace's. */
export async function reportProfileOf(workspaceId: number): Promise<{ profile: ReportSnapshot['profile']; logo: Buffer | null }> {
  const [profile, workspace] = await Promise.all([WorkspaceProfile.findOne({ where: { workspaceId } }), Workspace.findByPk(workspaceId, { attributes: ['name'] })])
  return {
    profile: {
      consultancyName: profile?.consultancyName || workspace?.name || '',
      address: profile?.address ?? '',
      contact: profile?.contact ?? '',
      hasLogo: profile?.logo != null,
    },
    logo: profile?.logo ?? null,
  }
}

async function methodsOf(comparison: ComparisonDto): Promise<ReportSurveyMethod[]> {
  const methods: ReportSurveyMethod[] = []
  for (const { summary } of comparison.surveys) {
    const usedIds = summary.positions.filter((p) => p.isIncluded).map((p) => p.captureId)
    const captures = await Capture.findAll({ where: { id: usedIds }, attributes: ['kind', 'sweepF1Hz', 'sweepF2Hz', 'sweepDurationS', 'referenceSha256'] })
    const sweeps = new Set(
      captures
        .filter((c) => c.kind === 'sweep')
        .map((c) => (c.sweepF1Hz !== null && c.sweepF2Hz !== null && c.sweepDurationS !== null ? `exponential sine sweep ${c.sweepF1Hz}–${c.sweepF2Hz} Hz, ${c.sweepDurationS} s` : 'sweep deconvolved with its recorded reference')),
    )
    methods.push({
      surveyId: summary.survey.id,
      name: summary.survey.name,
      measuredOn: summary.survey.measuredOn,
      temperatureC: summary.survey.temperatureC,
      humidityPercent: summary.survey.humidityPercent,
      equipment: summary.survey.equipment,
      analysisSettings: summary.analysisSettings,
      impulseCount: captures.filter((c) => c.kind === 'impulse').length,
      sweepCount: captures.filter((c) => c.kind === 'sweep').length,
      sweeps: [...sweeps],
    })
  }
  return methods
}

/** Everything a report shows, computed from the live data (a draft) or to be frozen (a revision). */
export async function buildReportSnapshot(room: Room, surveyIds: number[], bands: BandResolution, meta: { userId: number; revisionNumber: number; frozenAt: Date }): Promise<{ snapshot: ReportSnapshot; logo: Buffer | null }> {
  const comparison = await compareSurveysOfRoom(room, surveyIds, bands)
  const [{ profile, logo }, user] = await Promise.all([reportProfileOf(room.workspaceId), User.findByPk(meta.userId, { attributes: ['name'] })])
  const engineVersions = [...new Set(comparison.surveys.flatMap((s) => s.summary.positions.filter((p) => p.isIncluded && p.engineVersion).map((p) => p.engineVersion!)))].sort()
  return {
    snapshot: { revisionNumber: meta.revisionNumber, frozenAt: meta.frozenAt.toISOString(), preparedBy: user?.name ?? null, profile, comparison, methods: await methodsOf(comparison), engineVersions },
    logo,
  }
}

/**
 * A fingerprint of what a verdict rests on: the surveys and bands, the captures used and left out
 * (with reasons), the analysis that counted for each, the target and the verdicts. Two sends with
 * the same fingerprint are the same revision.
 */
export function reportInputsSha256(comparison: ComparisonDto): string {
  const inputs = {
    bands: comparison.bandResolution,
    target: comparison.target,
    surveys: comparison.surveys.map(({ summary, verdicts }) => ({
      id: summary.survey.id,
      name: summary.survey.name,
      positions: summary.positions.map((p) => [p.captureId, p.isIncluded, p.exclusionReason, p.analysisId]),
      verdicts,
    })),
  }
  return createHash('sha256').update(JSON.stringify(inputs)).digest('hex')
}
