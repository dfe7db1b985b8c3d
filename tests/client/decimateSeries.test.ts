import { describe, expect, it } from 'vitest'
import { decimateSeries } from '@/components/charts/decimateSeries'

describe('decimateSeries', () => {
  it('returns every point unchanged when the curve is short enough', () => {
    expect(decimateSeries([1, 2, 3], [10, 20, 30], 10)).toEqual([
      [1, 10],
      [2, 20],
      [3, 30],
    ])
  })

  it('returns at most maxPoints points, first and last kept, when the curve is long', () => {
    const x = Array.from({ length: 100_000 }, (_, i) => i)
    const y = x.map((i) => Math.sin(i / 50))
    const pairs = decimateSeries(x, y, 1000)
    expect(pairs.length).toBeLessThanOrEqual(1000)
    expect(pairs[0]).toEqual([0, y[0]])
    expect(pairs[pairs.length - 1]).toEqual([99_999, y[99_999]])
  })

  it('keeps a single-sample peak and dip when the curve is decimated', () => {
    const x = Array.from({ length: 10_000 }, (_, i) => i)
    const y = x.map(() => 0)
    y[4321] = 12
    y[7777] = -30
    const pairs = decimateSeries(x, y, 200)
    expect(pairs).toContainEqual([4321, 12])
    expect(pairs).toContainEqual([7777, -30])
  })

  it('returns points in ascending x order when decimated', () => {
    const x = Array.from({ length: 5000 }, (_, i) => i)
    const y = x.map((i) => (i % 7) - (i % 3))
    const xs = decimateSeries(x, y, 300).map(([xi]) => xi)
    expect(xs).toEqual([...xs].sort((a, b) => a - b))
  })
})
