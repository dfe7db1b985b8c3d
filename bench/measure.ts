import { performance } from 'node:perf_hooks'

export interface Measurement {
  label: string
  medianMs: number
  minMs: number
  runs: number
}

/** Runs `task` `runs` times after one warm-up (JIT), returning median and best wall time. */
export function measure(label: string, task: () => unknown, runs = 5): Measurement {
  task()
  const times: number[] = []
  for (let i = 0; i < runs; i++) {
    const start = performance.now()
    task()
    times.push(performance.now() - start)
  }
  times.sort((a, b) => a - b)
  return { label, medianMs: times[Math.floor(runs / 2)] as number, minMs: times[0] as number, runs }
}
