/**
 * `pointCount` frequencies spaced evenly in log f from minHz to maxHz (both included):
 * f_i = minHz·(maxHz/minHz)^(i/(pointCount − 1)).
 */
export function logFrequencyGrid(minHz: number, maxHz: number, pointCount: number): number[] {
  const grid: number[] = new Array(pointCount)
  const logRatio = Math.log(maxHz / minHz)
  for (let i = 0; i < pointCount; i++) grid[i] = minHz * Math.exp((logRatio * i) / (pointCount - 1))
  return grid
}
