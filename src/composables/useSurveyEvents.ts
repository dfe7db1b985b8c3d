import { onScopeDispose, shallowRef, watch, type Ref } from 'vue'
import { openSurveyEvents, type SurveyEventHandlers, type SurveyEventsOptions } from '@/api/surveyEvents'

/**
 * Keeps a survey's live status stream open while the survey id is set (null: none), and says
 * whether it is connected, so the caller polls only while it is not.
 */
export function useSurveyEvents(surveyId: Ref<number | null>, handlers: Omit<SurveyEventHandlers, 'onConnection'> & { onConnected?: (isReconnect: boolean) => void }, options?: SurveyEventsOptions) {
  const isConnected = shallowRef(false)
  let close: (() => void) | null = null
  let hasConnected = false

  function onConnection(connected: boolean): void {
    if (connected && !isConnected.value) {
      handlers.onConnected?.(hasConnected)
      hasConnected = true
    }
    isConnected.value = connected
  }

  // Older browsers and test environments without EventSource simply keep polling.
  const isAvailable = typeof EventSource !== 'undefined' || options?.createSource !== undefined

  watch(
    surveyId,
    (id) => {
      close?.()
      close = null
      hasConnected = false
      if (id !== null && isAvailable) close = openSurveyEvents(id, { ...handlers, onConnection }, options)
    },
    { immediate: true },
  )
  onScopeDispose(() => close?.())

  return { isConnected }
}
