/**
 * What to tell the user when the browser refused to store or read the project (state/storageError.ts),
 * worded by code loaded only when that happens; never blank, even if that code cannot be loaded.
 */
export const storageErrorDetail = (e: unknown): Promise<string> =>
  import('./storageError.js').then(
    (m) => m.storageErrorDetail(e),
    () => 'the browser gave no reason; its storage may be full, or turned off for this site',
  );
