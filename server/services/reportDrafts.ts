import { ReportRevision } from '../models'
import { logger } from '../logger'

const MAX_NOTES = 30

/**
 * Records that an input of the room's report changed after its last sent revision (an upload, a
 * re-analysis, an exclusion, a new pin, a new target): the first such change opens a draft
 * revision, later ones add to its notes. A change to a survey the sent revision does not compare
 * is not noted. Sent revisions themselves never change. Never fails the action it describes.
 */
export async function noteReportChange(roomId: number, surveyId: number | null, note: string): Promise<void> {
  try {
    const latest = await ReportRevision.findOne({ where: { roomId }, order: [['number', 'DESC']], attributes: ['id', 'number', 'surveyIds', 'bands', 'frozenAt', 'changeNotes'] })
    if (!latest) return
    if (surveyId !== null && !latest.surveyIds.includes(surveyId)) return
    if (latest.frozenAt === null) {
      if (latest.changeNotes.length < MAX_NOTES) await latest.update({ changeNotes: [...latest.changeNotes, note] })
      return
    }
    await ReportRevision.create({
      roomId, number: latest.number + 1, surveyIds: latest.surveyIds, bands: latest.bands, changeNotes: [note],
      frozenAt: null, frozenById: null, inputsSha256: null, snapshot: null, pdf: null,
    })
  } catch (error) {
    logger.warn({ err: error, roomId }, 'could not note a report change')
  }
}
