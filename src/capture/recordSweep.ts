// Never inlined as a data: URL: the content security policy loads worklets from 'self' only.
import WORKLET_URL from './recorderWorklet.js?url&no-inline'

const loadedContexts = new WeakSet<BaseAudioContext>()

export interface RecordSweepOptions {
  context: AudioContext
  /** The microphone, already connected by the caller's meter or not: this adds its own tap. */
  input: MediaStreamAudioSourceNode
  /** The decoded test sweep (with its lead and tail silence). */
  sweep: AudioBuffer
  recordSampleCount: number
  /** Fraction of the recording done, 0–1. */
  onProgress?: (fraction: number) => void
  signal?: AbortSignal
}

async function ensureWorklet(context: AudioContext): Promise<void> {
  if (loadedContexts.has(context)) return
  await context.audioWorklet.addModule(WORKLET_URL)
  loadedContexts.add(context)
}

/**
 * Plays the sweep to the speakers while recording the microphone into Float32 blocks at the
 * context's rate, until `recordSampleCount` samples are in. Recording starts just before
 * playback: the deconvolution finds the delay, so no alignment is needed here.
 */
export async function recordSweep(options: RecordSweepOptions): Promise<Float32Array[]> {
  const { context, input, sweep, recordSampleCount } = options
  await ensureWorklet(context)
  if (context.state === 'suspended') await context.resume()
  const recorder = new AudioWorkletNode(context, 'ringdown-recorder', { numberOfInputs: 1, numberOfOutputs: 1, channelCount: 1, channelCountMode: 'explicit' })
  // A silent path to the destination keeps the recorder in the rendered graph in every browser.
  const mute = new GainNode(context, { gain: 0 })
  input.connect(recorder).connect(mute).connect(context.destination)
  const player = new AudioBufferSourceNode(context, { buffer: sweep })
  player.connect(context.destination)
  const chunks: Float32Array[] = []
  try {
    await new Promise<void>((resolve, reject) => {
      let recordedCount = 0
      options.signal?.addEventListener('abort', () => reject(new DOMException('The recording was stopped.', 'AbortError')), { once: true })
      recorder.port.onmessage = (event: MessageEvent<Float32Array>) => {
        chunks.push(event.data)
        recordedCount += event.data.length
        options.onProgress?.(Math.min(1, recordedCount / recordSampleCount))
        if (recordedCount >= recordSampleCount) resolve()
      }
      recorder.port.postMessage('start')
      player.start()
    })
  } finally {
    recorder.port.postMessage('stop')
    recorder.port.onmessage = null
    try {
      player.stop()
    } catch {
      // Already ended.
    }
    player.disconnect()
    input.disconnect(recorder)
    recorder.disconnect()
    mute.disconnect()
  }
  return chunks
}
