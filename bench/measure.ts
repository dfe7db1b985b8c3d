import { performance } from 'node:perf_hooks'
import { setFlagsFromString } from 'node:v8'
import { runInNewContext } from 'node:vm'

// A collector we can call between runs (without it the heap grows with garbage from earlier
// cases and max RSS says more about V8's laziness than about the analysis).
setFlagsFromString('--expose-gc')
const collectGarbage = runInNewContext('gc') as () => void

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
    collectGarbage()
    const start = performance.now()
    task()
    times.push(performance.now() - start)
  }
  times.sort((a, b) => a - b)
  return { label, medianMs: times[Math.floor(runs / 2)] as number, minMs: times[0] as number, runs }
}
