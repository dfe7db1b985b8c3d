/**
 * localStorage that never throws: private windows and disabled storage must not break the app,
 * they only lose the remembered preference.
 */
export function readStorage(key: string): string | null {
  try {
    return window.localStorage.getItem(key)
  } catch {
    return null
  }
}

export function writeStorage(key: string, value: string | null): void {
  try {
    if (value === null) window.localStorage.removeItem(key)
    else window.localStorage.setItem(key, value)
  } catch {
    // The preference simply is not remembered.
  }
}

export const STORAGE_KEYS = {
  theme: 'ringdown.theme',
  lengthUnit: 'ringdown.lengthUnit',
  workspaceId: 'ringdown.workspaceId',
} as const
