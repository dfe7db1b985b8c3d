import { ApiError } from './ApiError'
import { apiUrl, forgetCsrfToken, getCsrfToken, reportIfUnauthenticated, toApiError } from './http'

export interface UploadProgress {
  loadedBytes: number
  totalBytes: number
}

export interface UploadOptions {
  onProgress?: (progress: UploadProgress) => void
  /** Aborts the upload; the promise then rejects with an ApiError of code 'aborted'. */
  signal?: AbortSignal
}

const NETWORK_MESSAGE = 'The upload did not reach Ringdown. Check your connection and try again.'

function sendOnce(path: string, form: FormData, token: string, options: UploadOptions): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest()
    xhr.open('POST', apiUrl(path))
    xhr.withCredentials = true
    xhr.setRequestHeader('accept', 'application/json')
    xhr.setRequestHeader('x-csrf-token', token)
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress?.({ loadedBytes: event.loaded, totalBytes: event.total })
    }
    xhr.onload = () => {
      let json: unknown
      try {
        json = xhr.responseText ? JSON.parse(xhr.responseText) : undefined
      } catch {
        json = undefined
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(json)
      else reject(toApiError(xhr.status, json))
    }
    xhr.onerror = () => reject(new ApiError(0, { code: 'network', message: NETWORK_MESSAGE }))
    xhr.onabort = () => reject(new ApiError(0, { code: 'aborted', message: 'The upload was cancelled.' }))
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true })
    // The browser sets the multipart content type with its boundary: never set it by hand.
    xhr.send(form)
  })
}

/**
 * POSTs a multipart form with upload progress (fetch cannot report request-body progress, so
 * this is the one XMLHttpRequest in the client). Same CSRF token and credentials as `request`;
 * a stale token (403 `csrf`) is fetched again and the upload repeated once.
 */
export async function uploadForm<T>(path: string, form: FormData, options: UploadOptions = {}): Promise<T> {
  try {
    try {
      return (await sendOnce(path, form, await getCsrfToken(), options)) as T
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 403 && error.code === 'csrf')) throw error
      forgetCsrfToken()
      return (await sendOnce(path, form, await getCsrfToken(), options)) as T
    }
  } catch (error) {
    reportIfUnauthenticated(error, path)
    throw error
  }
}
