import { reactive, ref, watch } from 'vue'
import type { RoomDto } from '@shared/api'
import { isApiError } from '@/api/ApiError'
import { convertSizeUnit, emptyRoomFormValues, roomToFormValues, type ExactSizes, type RoomFormValues } from '@/forms/roomFormValues'
import { serverFieldsToRoomForm, validateRoomForm, type RoomFormBody, type RoomFormErrors } from '@/forms/validateRoomForm'
import { usePreferencesStore } from '@/stores/preferences'

/**
 * State of the room form. The unit switch is the user's remembered preference; switching it
 * re-expresses the sizes already typed, so nothing has to be entered twice.
 */
export function useRoomForm() {
  const preferences = usePreferencesStore()
  const values = reactive<RoomFormValues>(emptyRoomFormValues())
  const errors = ref<RoomFormErrors>({})
  let exact: ExactSizes = {}

  watch(
    () => preferences.lengthUnit,
    (to, from) => {
      const converted = convertSizeUnit(values, exact, from, to)
      Object.assign(values, converted.values)
      exact = converted.exact
    },
  )

  function reset(room?: RoomDto): void {
    const next = room ? roomToFormValues(room, preferences.lengthUnit) : { values: emptyRoomFormValues(), exact: {} }
    Object.assign(values, next.values)
    exact = next.exact
    errors.value = {}
  }

  /** The body to send, or null after putting messages on the inputs. */
  function validate(): RoomFormBody | null {
    const result = validateRoomForm(values, preferences.lengthUnit, exact)
    errors.value = result.errors
    return result.body
  }

  function showServerError(error: unknown): void {
    if (isApiError(error)) errors.value = serverFieldsToRoomForm(error.fields)
  }

  /** Takes one input's new value (as the form emits it) and clears that input's message. */
  function setValue(field: keyof RoomFormValues, value: unknown): void {
    if (field === 'use') values.use = (value as RoomFormValues['use']) ?? null
    else if (field === 'sizeMode') values.sizeMode = value === 'volume' ? 'volume' : 'dimensions'
    else values[field] = typeof value === 'string' ? value : ''
    if (errors.value[field]) errors.value = { ...errors.value, [field]: undefined }
  }

  return { values, errors, reset, validate, showServerError, setValue }
}
