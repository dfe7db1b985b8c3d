/**
 * A plain sentence for a failure of getUserMedia or of audio playback, by the DOMException name
 * the browsers use (Media Capture and Streams, §10 getUserMedia errors).
 */
export function mediaErrorMessage(error: unknown): string {
  const name = error instanceof Error || (typeof error === 'object' && error !== null && 'name' in error) ? String((error as { name: unknown }).name) : ''
  switch (name) {
    case 'NotAllowedError':
    case 'SecurityError':
      return 'The browser was not allowed to use the microphone. Allow microphone access for this site (the icon beside the address) and try again.'
    case 'NotFoundError':
    case 'OverconstrainedError':
      return 'No microphone was found. Plug in a measurement microphone or audio interface, then choose it in the list.'
    case 'NotReadableError':
    case 'AbortError':
      return 'The microphone is in use by another program or could not be started. Close other programs that record audio and try again.'
    case 'EncodingError':
      return 'The test sweep could not be decoded by this browser. Try another browser, or download the sweep and upload a recording instead.'
    default:
      return error instanceof Error && error.message ? error.message : 'The microphone could not be started. Reload the page and try again.'
  }
}

/** True when this page may record at all (secure context with the media APIs). */
export function canRecordInBrowser(scope: { isSecureContext?: boolean; navigator?: { mediaDevices?: unknown } } = globalThis): boolean {
  return scope.isSecureContext === true && typeof scope.navigator?.mediaDevices === 'object' && scope.navigator.mediaDevices !== null
}
