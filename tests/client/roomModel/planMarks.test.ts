import { describe, expect, it } from 'vitest'
import { labelRows, mergeCoincidentLabels, planeCoordinates, reflectionLabel, reflectionView, withPlaneCoordinates } from '@/roomModel/planMarks'

describe('reflectionView', () => {
  it('returns the top view for walls and the side view for floor and ceiling, so each point is drawn once', () => {
    expect(['front wall', 'rear wall', 'left side wall', 'right side wall', 'floor', 'ceiling'].map((s) => reflectionView(s as 'floor'))).toEqual(['top', 'top', 'top', 'top', 'side', 'side'])
  })
})

describe('planeCoordinates', () => {
  it('returns (x, y) in the top view and (x, z) in the side view, and writes them back', () => {
    const point = { label: 'Left', xM: 1, yM: 2, zM: 3 }
    expect(planeCoordinates(point, 'top')).toEqual({ uM: 1, vM: 2 })
    expect(planeCoordinates(point, 'side')).toEqual({ uM: 1, vM: 3 })
    expect(withPlaneCoordinates(point, 'side', { uM: 4, vM: 1.5 })).toEqual({ label: 'Left', xM: 4, yM: 2, zM: 1.5 })
  })
})

describe('mergeCoincidentLabels', () => {
  it('returns one “L/R·ceiling” label when both speakers’ points coincide', () => {
    const points = [{ xPx: 100, yPx: 20, label: reflectionLabel({ speaker: 'Left', surface: 'ceiling' }) }, { xPx: 102, yPx: 20, label: 'R·ceiling' }, { xPx: 300, yPx: 20, label: 'L·rear' }]
    expect(mergeCoincidentLabels(points)).toEqual(['L/R·ceiling', '', 'L·rear'])
  })
})

describe('labelRows', () => {
  it('returns a second row for a label that would run into an earlier one on the same wall', () => {
    expect(labelRows([{ xPx: 150, yPx: 30, text: 'R·right' }, { xPx: 182, yPx: 30, text: 'L·right' }, { xPx: 400, yPx: 30, text: 'L·rear' }, { xPx: 182, yPx: 300, text: 'L·left' }])).toEqual([0, 1, 0, 0])
  })
})
