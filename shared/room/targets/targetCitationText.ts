import type { TargetMask } from './targetMask'

/**
 * The one general caution every verdict carries: the product cites the edition and clause it
 * follows, and the reader checks them against the current edition and local rules.
 */
export const TARGET_GENERAL_CAUTION =
  'Targets follow the standard, edition and clause named; check the current edition and any local regulations or project requirements before relying on a verdict.'

/**
 * How a target is named to a client: "EBU Tech 3276 and ITU-R BS.1116, edition BS.1116-3, Fig. 3 …",
 * "Common practice of the trade (no published standard)" or "Custom target — source: …".
 */
export function targetCitationText(mask: Pick<TargetMask, 'kind' | 'citation' | 'sourceNote'>): string {
  if (mask.kind === 'custom') return `Custom target of this workspace; source: ${mask.sourceNote ?? 'not given'}`
  if (!mask.citation) return 'Common practice of the trade (no published standard)'
  const { standard, edition, clause } = mask.citation
  return `${standard}, edition ${edition}, ${clause}`
}
