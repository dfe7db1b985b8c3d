import { computed, reactive, ref, shallowRef, type Ref } from 'vue'
import type { CaptureDto, CreateCaptureFields } from '@shared/api'
import * as capturesApi from '@/api/captures'
import { errorMessage, isApiError } from '@/api/ApiError'
import { sweepDownloadUrl } from '@/api/testSignal'
import { classifyInputLevel, type InputLevelVerdict } from '@/capture/classifyInputLevel'
import { encodeRecordingWav } from '@/capture/encodeRecordingWav'
import { peakDbfs } from '@/capture/levelDbfs'
import { mediaErrorMessage } from '@/capture/mediaErrorMessage'
import { nextPositionLabel } from '@/capture/nextPositionLabel'
import { recordSweep } from '@/capture/recordSweep'
import { sweepRecordingPlan, type SweepChoice } from '@/capture/sweepRecordingPlan'
import { captureFormData } from '@/forms/captureDraft'
import { useMicrophoneInput } from './useMicrophoneInput'

export type RecorderPhase = 'off' | 'opening' | 'ready' | 'caution' | 'fetching' | 'recording' | 'review' | 'uploading' | 'uploaded' | 'failed'

/** A finished recording waiting to be uploaded (or recorded again). */
interface Take {
  chunks: Float32Array[]
  sampleRateHz: number
  sampleCount: number
  peakDb: number
  verdict: InputLevelVerdict
  choice: SweepChoice
}

/**
 * In-browser sweep capture on one survey: microphone and meter → loudness caution → play the
 * product's sweep while recording → check the level → upload as a 'sweep' capture.
 */
export function useSweepRecorder(surveyId: Ref<number>, onUploaded: (capture: CaptureDto) => void) {
  const microphone = useMicrophoneInput()
  const phase = ref<RecorderPhase>('off')
  const failure = ref<string | null>(null)
  const recordFraction = ref(0)
  const upload = reactive({ loadedBytes: 0, totalBytes: 0 })
  const take = shallowRef<Take | null>(null)
  const choice = reactive<SweepChoice>({ f1Hz: 20, f2Hz: 20_000, durationS: 6, levelDb: -12 })
  const labels = reactive({ sourceLabel: 'Source 1', receiverLabel: 'Position 1' })
  let abort: AbortController | null = null

  function fail(message: string): void {
    failure.value = message
    phase.value = 'failed'
  }

  async function openMicrophone(deviceId: string | null = microphone.deviceId.value): Promise<boolean> {
    phase.value = 'opening'
    failure.value = null
    try {
      await microphone.open(deviceId)
      phase.value = 'ready'
      return true
    } catch (error) {
      fail(mediaErrorMessage(error))
      return false
    }
  }

  /** The Start button: turns the microphone on if needed, then asks for the loudness caution. */
  async function start(): Promise<void> {
    if (!microphone.source.value && !(await openMicrophone())) return
    phase.value = 'caution'
  }

  function cancelCaution(): void {
    phase.value = 'ready'
  }

  async function fetchSweep(context: AudioContext, plan: ReturnType<typeof sweepRecordingPlan>, signal: AbortSignal): Promise<AudioBuffer> {
    const response = await fetch(sweepDownloadUrl(plan.parameters), { credentials: 'same-origin', signal })
    if (!response.ok) throw new Error(`The test sweep could not be fetched (HTTP ${response.status}). Check the sweep settings and try again.`)
    return context.decodeAudioData(await response.arrayBuffer())
  }

  /** After the caution is accepted: fetch and play the sweep, record, then review the level. */
  async function playAndRecord(): Promise<void> {
    const context = microphone.context.value
    const input = microphone.source.value
    if (!context || !input) return fail('The microphone is off. Press Start again.')
    abort = new AbortController()
    const plan = sweepRecordingPlan({ ...choice }, context.sampleRate)
    try {
      phase.value = 'fetching'
      const sweep = await fetchSweep(context, plan, abort.signal)
      phase.value = 'recording'
      recordFraction.value = 0
      const chunks = await recordSweep({ context, input, sweep, recordSampleCount: plan.recordSampleCount, signal: abort.signal, onProgress: (f) => (recordFraction.value = f) })
      const peakDb = Math.max(...chunks.map((chunk) => peakDbfs(chunk)))
      take.value = { chunks, sampleRateHz: context.sampleRate, sampleCount: plan.recordSampleCount, peakDb, verdict: classifyInputLevel(peakDb), choice: { ...choice } }
      phase.value = 'review'
      if (take.value.verdict === 'good') await uploadTake()
    } catch (error) {
      if (abort.signal.aborted) phase.value = 'ready'
      else fail(error instanceof Error && error.name === 'Error' ? error.message : mediaErrorMessage(error))
    } finally {
      abort = null
    }
  }

  function stop(): void {
    abort?.abort()
  }

  function uploadFailureText(error: unknown): string {
    if (isApiError(error) && error.status === 403 && error.code !== 'csrf') return 'You may look at this survey but not add captures to it. Ask the room’s owner for access.'
    return `${errorMessage(error)} The recording is kept: press “Upload again”.`
  }

  async function uploadTake(): Promise<void> {
    const current = take.value
    if (!current) return
    phase.value = 'uploading'
    failure.value = null
    const bytes = encodeRecordingWav(current.chunks, { sampleRateHz: current.sampleRateHz, sampleCount: current.sampleCount })
    const name = `sweep-recording-${labels.receiverLabel.trim().replace(/[^a-z0-9]+/gi, '-').toLowerCase() || 'position'}.wav`
    const file = new File([bytes as Uint8Array<ArrayBuffer>], name, { type: 'audio/wav' })
    const body: CreateCaptureFields = {
      kind: 'sweep', channel: 0, sourceLabel: labels.sourceLabel, receiverLabel: labels.receiverLabel,
      positionXM: null, positionYM: null, positionZM: null,
      sweepF1Hz: current.choice.f1Hz, sweepF2Hz: current.choice.f2Hz, sweepDurationS: current.choice.durationS,
    }
    try {
      const capture = await capturesApi.uploadCapture(surveyId.value, captureFormData(body, file, null), {
        onProgress: (progress) => Object.assign(upload, progress),
      })
      take.value = null
      phase.value = 'uploaded'
      labels.receiverLabel = nextPositionLabel(labels.receiverLabel)
      onUploaded(capture)
    } catch (error) {
      fail(uploadFailureText(error))
    }
  }

  function discardTake(): void {
    take.value = null
    phase.value = microphone.source.value ? 'ready' : 'off'
  }

  const isBusy = computed(() => ['opening', 'fetching', 'recording', 'uploading'].includes(phase.value))
  return { microphone, phase, failure, recordFraction, upload, take, choice, labels, isBusy, openMicrophone, start, cancelCaution, playAndRecord, stop, uploadTake, discardTake }
}
