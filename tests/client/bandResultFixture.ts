import type { BandResult } from '@shared/types/analysis'

/** A band result with every value set; override fields per test. Values are invented. */
export function bandResultFixture(overrides: Partial<BandResult> = {}): BandResult {
  return {
    centreHz: 1000,
    exactCentreHz: 1000,
    T20: 0.4712,
    T30: 0.5034,
    EDT: 0.5149,
    C50: 5.44,
    C80: -0.96,
    D50: 0.7812,
    Ts: 0.03249,
    decayRangeDb: 56.71,
    peakToNoiseDb: 60.2,
    curvaturePercent: 6.8,
    uncertaintyT20: 0.0213,
    uncertaintyT30: 0.0165,
    fitR2: { T20: 0.99, T30: 0.99, EDT: 0.98 },
    warnings: [],
    ...overrides,
  }
}
