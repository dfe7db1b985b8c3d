import { Op, type WhereOptions } from 'sequelize'
import { Analysis } from '../models'
import type { BandResolution } from '../../shared/types/analysis'

/**
 * The newest finished analysis of each capture at a band resolution (keyed by capture id), with
 * its result. Settings are matched as JSONB (`settings @> {"bands": …}`, GIN-indexed).
 */
export async function latestAnalysesByCapture(captureIds: number[], bands?: BandResolution): Promise<Map<number, Analysis>> {
  if (captureIds.length === 0) return new Map()
  const analyses = await Analysis.findAll({
    where: {
      captureId: { [Op.in]: captureIds },
      status: 'done',
      ...(bands ? { settings: { [Op.contains]: { bands } } } : {}),
    } as WhereOptions<Analysis>,
    order: [['finishedAt', 'ASC NULLS FIRST'], ['id', 'ASC']],
  })
  return new Map(analyses.map((analysis) => [analysis.captureId, analysis]))
}
