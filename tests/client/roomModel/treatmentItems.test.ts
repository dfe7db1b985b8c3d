import { describe, expect, it } from 'vitest'
import { parsePositive, removeAt, replaceAt } from '@/roomModel/treatmentItems'

describe('parsePositive', () => {
  it('returns the number when it is positive, with a decimal comma accepted', () => {
    expect(parsePositive('0,72')).toBe(0.72)
    expect(parsePositive('4', true)).toBe(4)
  })

  it('returns null when the text is empty, zero, negative or a fraction where a count is asked', () => {
    expect([parsePositive(''), parsePositive('0'), parsePositive('-1'), parsePositive('abc'), parsePositive('2.5', true)]).toEqual([null, null, null, null, null])
  })
})

describe('replaceAt', () => {
  it('returns a new list with one item changed and the input untouched', () => {
    const list = [{ count: 1 }, { count: 2 }]
    expect(replaceAt(list, 1, { count: 5 })).toEqual([{ count: 1 }, { count: 5 }])
    expect(list[1]!.count).toBe(2)
    expect(removeAt(list, 0)).toEqual([{ count: 2 }])
  })
})
