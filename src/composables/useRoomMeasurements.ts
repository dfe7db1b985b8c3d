import { computed, ref, watch, type Ref } from 'vue'
import { CAPTURES_PAGE_SIZE_MAX, type CaptureDto } from '@shared/api'
import * as capturesApi from '@/api/captures'
import { getSurveySummary } from '@/api/results'
import { listSurveys } from '@/api/surveys'
import { summaryToMeasuredSurvey, type MeasuredSurvey } from '@/roomModel/measuredSurvey'
import { useAsyncState } from './useAsyncState'

/** A capture the user may lay over the model: label, and where the microphone stood. */
export interface CaptureChoice {
  captureId: number
  label: string
  position: { xM: number; yM: number; zM: number } | null
}

function captureChoice(capture: CaptureDto, surveyName: string): CaptureChoice {
  const { positionXM: x, positionYM: y, positionZM: z } = capture
  return {
    captureId: capture.id,
    label: `${surveyName} · ${capture.sourceLabel || 'source'} → ${capture.receiverLabel || 'receiver'}`,
    position: x !== null && y !== null && z !== null ? { xM: x, yM: y, zM: z } : null,
  }
}

/** The room's measured side: octave summaries of its surveys and its analysed captures, with one chosen for overlays. */
export function useRoomMeasurements(roomId: Ref<number>) {
  const load = useAsyncState(async (id: number) => {
    const surveys = (await listSurveys(id)).filter((s) => s.captureCount > 0)
    const [summaries, captureLists] = await Promise.all([
      Promise.all(surveys.map((s) => getSurveySummary(s.id, 'octave'))),
      // Analysed captures only (the server filters), as many as a page holds.
      Promise.all(surveys.map((s) => capturesApi.listCaptures(s.id, { analysed: true, pageSize: CAPTURES_PAGE_SIZE_MAX }).then((page) => page.items))),
    ])
    const measured: MeasuredSurvey[] = summaries.filter((s) => s.analysedCount > 0).map(summaryToMeasuredSurvey)
    const captures = captureLists.flatMap((list, i) => list.map((c) => captureChoice(c, surveys[i]!.name)))
    return { measured, captures }
  })
  watch(roomId, (id) => void load.run(id), { immediate: true })

  const chosenCaptureId = ref<number | null>(null)
  const analysis = useAsyncState(capturesApi.getAnalysis)
  watch(chosenCaptureId, (id) => {
    if (id === null) analysis.data.value = null
    else void analysis.run(id)
  })

  const surveys = computed(() => load.data.value?.measured ?? [])
  const captures = computed(() => load.data.value?.captures ?? [])
  const chosenCapture = computed(() => captures.value.find((c) => c.captureId === chosenCaptureId.value) ?? null)
  return { load, surveys, captures, chosenCaptureId, chosenCapture, analysis }
}
