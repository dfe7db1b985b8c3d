import { ref, shallowRef, type Ref, type ShallowRef } from 'vue'

export interface AsyncState<T, A extends unknown[]> {
  data: ShallowRef<T | null>
  error: ShallowRef<unknown>
  isLoading: Ref<boolean>
  /** Runs the action; resolves to its result, or undefined when it failed (see `error`). */
  run: (...args: A) => Promise<T | undefined>
}

/**
 * Per-view async state for one action. When calls overlap only the latest one updates the
 * state, so a slow early search cannot overwrite the answer to a later one.
 */
export function useAsyncState<T, A extends unknown[]>(action: (...args: A) => Promise<T>): AsyncState<T, A> {
  const data = shallowRef<T | null>(null)
  const error = shallowRef<unknown>(null)
  const isLoading = ref(false)
  let latestCall = 0

  async function run(...args: A): Promise<T | undefined> {
    const call = ++latestCall
    isLoading.value = true
    error.value = null
    try {
      const result = await action(...args)
      if (call === latestCall) data.value = result
      return result
    } catch (caught) {
      if (call === latestCall) error.value = caught
      return undefined
    } finally {
      if (call === latestCall) isLoading.value = false
    }
  }

  return { data, error, isLoading, run }
}
