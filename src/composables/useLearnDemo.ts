import { computed, onScopeDispose, reactive, ref, shallowRef, watch } from 'vue'
import type { AnalysisResult } from '@shared/types/analysis'
import { createLearnDemoRunner } from '@/learn/learnDemoRunner'
import { LEARN_BANDS_HZ, type LearnDemoSettings } from '@/learn/runLearnDemo'
import { useDebouncedRef } from './useDebouncedRef'

/** A small furnished room with a longer bass: a starting point teachers can reshape. */
export const DEFAULT_LEARN_SETTINGS: LearnDemoSettings = { T60S: [1.1, 0.9, 0.7, 0.6, 0.55, 0.5, 0.45, 0.4], noiseFloorDb: -90, seed: 1 }

/** The teacher's settings, the engine's answer for them (recomputed 250 ms after the last change), and the band shown. */
export function useLearnDemo() {
  const settings = reactive<LearnDemoSettings>({ ...DEFAULT_LEARN_SETTINGS, T60S: [...DEFAULT_LEARN_SETTINGS.T60S] })
  const result = shallowRef<AnalysisResult | null>(null)
  const error = ref<string | null>(null)
  const isComputing = ref(false)
  const selectedCentreHz = ref<number | null>(1000)
  const runner = createLearnDemoRunner(
    (answer) => {
      result.value = answer
      error.value = null
      isComputing.value = false
    },
    (message) => {
      error.value = message
      isComputing.value = false
    },
  )

  const snapshot = computed(() => JSON.stringify(settings))
  const settled = useDebouncedRef(snapshot, 250)
  watch(settled, (text) => {
    isComputing.value = true
    void runner.run(JSON.parse(text) as LearnDemoSettings)
  }, { immediate: true })
  watch(snapshot, () => (isComputing.value = true))
  onScopeDispose(runner.dispose)

  function reset(): void {
    Object.assign(settings, { ...DEFAULT_LEARN_SETTINGS, T60S: [...DEFAULT_LEARN_SETTINGS.T60S] })
  }
  function setAllBands(T60S: number): void {
    settings.T60S = LEARN_BANDS_HZ.map(() => T60S)
  }

  const selectedBand = computed(() => result.value?.bands.find((band) => band.centreHz === selectedCentreHz.value) ?? null)
  return { settings, result, error, isComputing, selectedCentreHz, selectedBand, reset, setAllBands }
}
