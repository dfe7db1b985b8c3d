import { onBeforeUnmount, ref, shallowRef } from 'vue'
import { peakDbfs, rmsDbfs, SILENCE_DB } from '@/capture/levelDbfs'

/** Capture without the browser's speech processing: it would reshape the decay being measured. */
export function measurementConstraints(deviceId: string | null): MediaStreamConstraints {
  return { audio: { echoCancellation: false, noiseSuppression: false, autoGainControl: false, channelCount: 1, ...(deviceId ? { deviceId: { exact: deviceId } } : {}) }, video: false }
}

/** Peak-hold fall rate of the meter, dB per second (common practice for program meters, about 20 dB/s). */
const PEAK_FALL_DB_PER_S = 20

/**
 * The microphone for in-browser capture: one AudioContext, the chosen input device, and a live
 * level meter (peak with hold and RMS, dBFS) read from an AnalyserNode each animation frame.
 */
export function useMicrophoneInput() {
  const context = shallowRef<AudioContext | null>(null)
  const source = shallowRef<MediaStreamAudioSourceNode | null>(null)
  const devices = ref<{ deviceId: string; label: string }[]>([])
  const deviceId = ref<string | null>(null)
  const peakDb = ref(SILENCE_DB)
  const rmsDb = ref(SILENCE_DB)
  const heldPeakDb = ref(SILENCE_DB)
  let stream: MediaStream | null = null
  let analyser: AnalyserNode | null = null
  let frame = 0
  let lastFrameMs = 0

  function readLevel(nowMs: number): void {
    if (!analyser) return
    const block = new Float32Array(analyser.fftSize)
    analyser.getFloatTimeDomainData(block)
    peakDb.value = peakDbfs(block)
    rmsDb.value = rmsDbfs(block)
    const fallen = heldPeakDb.value - (PEAK_FALL_DB_PER_S * (nowMs - lastFrameMs)) / 1000
    heldPeakDb.value = Math.max(peakDb.value, fallen)
    lastFrameMs = nowMs
    frame = requestAnimationFrame(readLevel)
  }

  async function listDevices(): Promise<void> {
    const all = await navigator.mediaDevices.enumerateDevices()
    devices.value = all.filter((d) => d.kind === 'audioinput').map((d, i) => ({ deviceId: d.deviceId, label: d.label || `Input ${i + 1}` }))
  }

  function closeStream(): void {
    cancelAnimationFrame(frame)
    source.value?.disconnect()
    analyser?.disconnect()
    stream?.getTracks().forEach((track) => track.stop())
    stream = null
    source.value = null
    analyser = null
  }

  /** Asks for the microphone (the permission prompt on first use) and starts the meter. */
  async function open(chosenId: string | null = deviceId.value): Promise<void> {
    closeStream()
    context.value ??= new AudioContext({ latencyHint: 'interactive' })
    if (context.value.state === 'suspended') await context.value.resume()
    stream = await navigator.mediaDevices.getUserMedia(measurementConstraints(chosenId))
    deviceId.value = stream.getAudioTracks()[0]?.getSettings().deviceId ?? chosenId
    source.value = context.value.createMediaStreamSource(stream)
    analyser = new AnalyserNode(context.value, { fftSize: 2048 })
    source.value.connect(analyser)
    heldPeakDb.value = SILENCE_DB
    lastFrameMs = performance.now()
    frame = requestAnimationFrame(readLevel)
    // Device names are only readable once permission is granted.
    await listDevices()
  }

  function close(): void {
    closeStream()
    void context.value?.close()
    context.value = null
  }

  onBeforeUnmount(close)
  return { context, source, devices, deviceId, peakDb, rmsDb, heldPeakDb, open, close }
}
