import { computed, ref, type Ref } from 'vue'
import * as capturesApi from '@/api/captures'
import type { CaptureListItem } from '@/api/captures'
import { errorMessage, isApiError } from '@/api/ApiError'
import {
  captureFormData,
  defaultCaptureDraftFields,
  isWavFile,
  validateCaptureDraft,
  type CaptureDraftErrors,
  type CaptureDraftFields,
} from '@/forms/captureDraft'

export type CaptureDraftState = 'ready' | 'uploading' | 'failed'

export interface CaptureDraft {
  key: number
  file: File
  reference: File | null
  fields: CaptureDraftFields
  errors: CaptureDraftErrors
  state: CaptureDraftState
  loadedBytes: number
  totalBytes: number
  /** Why the upload failed, and what to do; null unless failed. */
  failure: string | null
}

/** What to do next after a refused upload, by HTTP status. */
function failureText(error: unknown): string {
  if (isApiError(error) && error.status === 413) return `${error.message} Trim the silence at the end, or export at a lower sample rate, and try again.`
  if (isApiError(error) && error.status === 403 && error.code !== 'csrf') return 'You may look at this survey but not add captures to it. Ask the room’s owner for access.'
  return errorMessage(error)
}

/** Files chosen for upload to a survey, their fields, and their upload progress in bytes. */
export function useCaptureUpload(surveyId: Ref<number>, options: { existingCount: Ref<number>; onUploaded: (capture: CaptureListItem) => void }) {
  const drafts = ref<CaptureDraft[]>([])
  const skippedNames = ref<string[]>([])
  const isUploading = ref(false)
  let nextKey = 1

  function addFiles(files: readonly File[]): void {
    skippedNames.value = files.filter((file) => !isWavFile(file)).map((file) => file.name)
    for (const file of files.filter(isWavFile)) {
      const previous = drafts.value[drafts.value.length - 1]?.fields
      const position = options.existingCount.value + drafts.value.length + 1
      drafts.value.push({
        key: nextKey++, file, reference: null, fields: defaultCaptureDraftFields(file.name, position, previous),
        errors: {}, state: 'ready', loadedBytes: 0, totalBytes: file.size, failure: null,
      })
    }
  }

  function removeDraft(key: number): void {
    drafts.value = drafts.value.filter((draft) => draft.key !== key || draft.state === 'uploading')
  }

  async function uploadOne(draft: CaptureDraft): Promise<void> {
    const { body, errors } = validateCaptureDraft(draft.fields, draft.reference !== null)
    draft.errors = errors
    if (!body) {
      draft.state = 'failed'
      draft.failure = 'Check the highlighted fields of this file.'
      return
    }
    draft.state = 'uploading'
    draft.failure = null
    draft.loadedBytes = 0
    try {
      const capture = await capturesApi.uploadCapture(surveyId.value, captureFormData(body, draft.file, draft.reference), {
        onProgress: ({ loadedBytes, totalBytes }) => {
          draft.loadedBytes = loadedBytes
          draft.totalBytes = totalBytes
        },
      })
      drafts.value = drafts.value.filter((d) => d.key !== draft.key)
      options.onUploaded(capture)
    } catch (error) {
      draft.state = 'failed'
      draft.failure = failureText(error)
      if (isApiError(error)) draft.errors = { ...error.fields }
    }
  }

  /** Uploads every file not yet sent, one after another so each bar shows real progress. */
  async function uploadAll(): Promise<void> {
    if (isUploading.value) return
    isUploading.value = true
    try {
      for (const draft of drafts.value.filter((d) => d.state !== 'uploading')) {
        // Through the reactive list so progress updates reach the template.
        const live = drafts.value.find((d) => d.key === draft.key)
        if (live) await uploadOne(live)
      }
    } finally {
      isUploading.value = false
    }
  }

  const hasDrafts = computed(() => drafts.value.length > 0)
  return { drafts, skippedNames, isUploading, hasDrafts, addFiles, removeDraft, uploadAll }
}
