import type { AnalysisResult } from '@shared/types/analysis'
import type { LearnDemoSettings } from './runLearnDemo'

type Reply = { requestId: number; result?: AnalysisResult; error?: string }

/**
 * Runs the demo in a Web Worker; where workers are missing (old browsers, tests) it runs the
 * same function on the main thread. Only the newest request's answer is delivered.
 */
export function createLearnDemoRunner(onResult: (result: AnalysisResult) => void, onError: (message: string) => void) {
  let worker: Worker | null = null
  let latestId = 0

  function deliver(reply: Reply): void {
    if (reply.requestId !== latestId) return
    if (reply.result) onResult(reply.result)
    else onError(reply.error ?? 'The demo could not be computed.')
  }

  function startWorker(): Worker | null {
    if (typeof Worker === 'undefined') return null
    try {
      const created = new Worker(new URL('./learnDemo.worker.ts', import.meta.url), { type: 'module' })
      created.onmessage = (event: MessageEvent<Reply>) => deliver(event.data)
      created.onerror = () => onError('The demo engine could not start in this browser. Reload the page and try again.')
      return created
    } catch {
      return null
    }
  }

  async function run(settings: LearnDemoSettings): Promise<void> {
    const requestId = ++latestId
    worker ??= startWorker()
    if (worker) {
      worker.postMessage({ requestId, settings })
      return
    }
    const { runLearnDemo } = await import('./runLearnDemo')
    try {
      deliver({ requestId, result: runLearnDemo(settings) })
    } catch (error) {
      deliver({ requestId, error: error instanceof Error ? error.message : String(error) })
    }
  }

  function dispose(): void {
    worker?.terminate()
    worker = null
  }

  return { run, dispose }
}
