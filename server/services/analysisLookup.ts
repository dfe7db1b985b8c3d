import { Op } from 'sequelize'
import { Analysis } from '../models'
import type { BandResolution } from '../../shared/types/analysis'

/** The newest analysis of each capture at a band resolution (keyed by capture id). */
export async function latestAnalysesByCapture(captureIds: number[], bands?: BandResolution): Promise<Map<number, Analysis>> {
  if (captureIds.length === 0) return new Map()
  const analyses = await Analysis.findAll({
    where: {
      captureId: { [Op.in]: captureIds },
      ...(bands ? { settingsKey: { [Op.like]: `%"bands":"${bands}"%` } } : {}),
    },
    order: [['updatedAt', 'ASC']],
  })
  return new Map(analyses.map((analysis) => [analysis.captureId, analysis]))
}
