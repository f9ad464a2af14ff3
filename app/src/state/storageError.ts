/**
 * What to tell the user when the browser refused to store the project. IndexedDB errors are often
 * DOMExceptions with an empty message, or no error object at all: the detail is never blank.
 */
export function storageErrorDetail(e: unknown): string {
  const name = typeof e === 'object' && e !== null && 'name' in e ? String((e as { name: unknown }).name) : '';
  const message =
    typeof e === 'string'
      ? e.trim()
      : typeof e === 'object' && e !== null && 'message' in e
        ? String((e as { message: unknown }).message).trim()
        : '';
  const why =
    name === 'QuotaExceededError'
      ? 'the browser’s storage for this site is full'
      : name === 'InvalidStateError' || name === 'UnknownError' || name === 'SecurityError'
        ? 'the browser does not allow storage for this site (a private window, or site data blocked)'
        : name === 'AbortError'
          ? 'the browser stopped the save before it finished'
          : '';
  const said = message && message !== name ? message : '';
  const parts = [name && name !== 'Error' ? name : '', said, why].filter(Boolean);
  return parts.length
    ? parts.join(': ')
    : 'the browser gave no reason; its storage may be full, or turned off for this site (a private window, or site data blocked)';
}
