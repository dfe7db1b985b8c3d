import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import { getSurveySummary } from '../services/surveySummaryService'
import { compareSurveys } from '../services/comparisonService'
import { analysisToCsv, comparisonToCsv, surveySummaryToCsv } from '../services/exportService'
import { getLatestAnalysis } from '../services/capturesService'
import { listAnalyses, requestReanalysis } from '../services/reanalysisService'
import { renderSweepWav, type SweepRequest } from '../services/testSignalService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisSettings, BandResolution } from '../../shared/types/analysis'

type ExportQuery = { format: 'csv' | 'json'; bands: BandResolution }

/** Sends a download: CSV as text/csv, JSON pretty-printed, both as attachments. */
function sendExport(res: Response, format: 'csv' | 'json', baseName: string, json: unknown, csv: () => string) {
  const fileName = `${baseName.replace(/[^a-z0-9-]+/gi, '-').toLowerCase()}.${format}`
  res.attachment(fileName)
  if (format === 'csv') res.type('text/csv; charset=utf-8').send(csv())
  else res.type('application/json').send(JSON.stringify(json, null, 2))
}

export async function surveySummary(req: Request, res: Response) {
  const { surveyId } = req.params as unknown as { surveyId: number }
  res.json(await getSurveySummary(currentUserId(req), surveyId, (req.query as unknown as { bands: BandResolution }).bands))
}

export async function comparison(req: Request, res: Response) {
  const { roomId } = req.params as unknown as { roomId: number }
  const { surveys, bands } = req.query as unknown as { surveys: number[]; bands: BandResolution }
  res.json(await compareSurveys(currentUserId(req), roomId, surveys, bands))
}

export async function exportCapture(req: Request, res: Response) {
  const { captureId } = req.params as unknown as { captureId: number }
  const { format, analysisId } = req.query as unknown as ExportQuery & { analysisId?: number }
  // The export follows the analysis shown on the capture page; without one, the analysis that counts.
  const analysis = await getLatestAnalysis(currentUserId(req), captureId, analysisId)
  sendExport(res, format, `ringdown-capture-${captureId}-analysis-${analysis.id}`, analysis, () => analysisToCsv(analysis.result))
}

export async function exportSurvey(req: Request, res: Response) {
  const { surveyId } = req.params as unknown as { surveyId: number }
  const { format, bands } = req.query as unknown as ExportQuery
  const summary = await getSurveySummary(currentUserId(req), surveyId, bands)
  sendExport(res, format, `ringdown-survey-${surveyId}-${summary.survey.name}`, summary, () => surveySummaryToCsv(summary))
}

export async function exportComparison(req: Request, res: Response) {
  const { roomId } = req.params as unknown as { roomId: number }
  const { surveys, bands, format } = req.query as unknown as ExportQuery & { surveys: number[] }
  const result = await compareSurveys(currentUserId(req), roomId, surveys, bands)
  sendExport(res, format, `ringdown-comparison-${roomId}-${surveys.join('-')}`, result, () => comparisonToCsv(result))
}

export async function analyses(req: Request, res: Response) {
  res.json(await listAnalyses(currentUserId(req), (req.params as unknown as { captureId: number }).captureId))
}

export function reanalyse(queue: AnalysisQueue) {
  return async (req: Request, res: Response) => {
    const { captureId } = req.params as unknown as { captureId: number }
    const outcome = await requestReanalysis(currentUserId(req), captureId, req.body as AnalysisSettings, queue)
    res.status(outcome.status === 'done' ? 200 : 202).json(outcome)
  }
}

export function sweepWav(req: Request, res: Response) {
  const { bytes, fileName } = renderSweepWav(req.query as unknown as SweepRequest)
  res.attachment(fileName).type('audio/wav').send(Buffer.from(bytes))
}
