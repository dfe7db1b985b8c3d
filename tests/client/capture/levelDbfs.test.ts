import { describe, expect, it } from 'vitest'
import { peakDbfs, rmsDbfs } from '@/capture/levelDbfs'
import { expectWithin } from '../../helpers/tolerance'

function sine(amplitude: number, cycles: number, samplesPerCycle: number): Float32Array {
  const samples = new Float32Array(cycles * samplesPerCycle)
  for (let i = 0; i < samples.length; i++) samples[i] = amplitude * Math.sin((2 * Math.PI * i) / samplesPerCycle)
  return samples
}

describe('peakDbfs', () => {
  it('returns 0 dBFS for a full-scale sine and −6.02 dBFS at half amplitude (20·lg 0.5, closed form)', () => {
    // 48 samples per cycle put a sample exactly on each crest (sin 90° = 1).
    expectWithin(peakDbfs(sine(1, 10, 48)), 0, 1e-6)
    expectWithin(peakDbfs(sine(0.5, 10, 48)), 20 * Math.log10(0.5), 1e-6)
  })

  it('returns −Infinity when the block is silent or empty', () => {
    expect(peakDbfs(new Float32Array(64))).toBe(-Infinity)
    expect(peakDbfs([])).toBe(-Infinity)
  })

  it('returns the level of the largest magnitude when it is negative', () => {
    expectWithin(peakDbfs([0.1, -0.25, 0.2]), 20 * Math.log10(0.25), 1e-9)
  })
})

describe('rmsDbfs', () => {
  it('returns −3.01 dBFS for a full-scale sine over whole cycles (10·lg ½, closed form)', () => {
    expectWithin(rmsDbfs(sine(1, 20, 48)), 10 * Math.log10(0.5), 1e-5)
    expectWithin(rmsDbfs(sine(1, 20, 48)), -3.0103, 1e-4)
  })

  it('returns 0 dBFS for a full-scale square wave and −20 dBFS for a square at 0.1 (closed form)', () => {
    const square = Float32Array.from({ length: 96 }, (_, i) => (i % 2 === 0 ? 1 : -1))
    expectWithin(rmsDbfs(square), 0, 1e-9)
    expectWithin(rmsDbfs(square.map((v) => v * 0.1)), -20, 1e-5)
  })

  it('returns −Infinity when the block is silent or empty', () => {
    expect(rmsDbfs(new Float32Array(32))).toBe(-Infinity)
    expect(rmsDbfs([])).toBe(-Infinity)
  })
})
