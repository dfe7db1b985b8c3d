import { runLearnDemo, type LearnDemoSettings } from './runLearnDemo'

export interface LearnDemoRequest {
  requestId: number
  settings: LearnDemoSettings
}

// The synthesis and analysis take a few hundred ms: off the main thread the sliders stay smooth.
self.onmessage = (event: MessageEvent<LearnDemoRequest>) => {
  const { requestId, settings } = event.data
  try {
    self.postMessage({ requestId, result: runLearnDemo(settings) })
  } catch (error) {
    self.postMessage({ requestId, error: error instanceof Error ? error.message : String(error) })
  }
}
