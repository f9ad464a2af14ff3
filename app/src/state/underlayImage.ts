// The site plan's image decoded for drawing: off the first screen, loaded in the warm-up after it, or at
// once for a project that has a site plan (state/useUnderlayImage.ts).
import { browserStore, type KeyValueStore } from './keyValue.js';

export { drawUnderlay } from '../plan/drawUnderlay.js';
import type { UnderlayImage } from './underlayFile.js';
import type { ImageState } from './useUnderlayImage.js';

/** Decoded images by data URL or storage key: a redraw or an undo never decodes again. */
const decoded = new Map<string, Promise<ImageState>>();

function decode(src: string, bytes: number | null): Promise<ImageState> {
  return new Promise((resolve) => {
    const img = new Image();
    img.onload = () => resolve({ status: 'ready', image: img, bytes });
    img.onerror = () => resolve({ status: 'missing', message: 'the image could not be decoded' });
    img.src = src;
  });
}

/** The decoded image of an underlay, from the file's data URL or from browser storage. */
export function imageOf(u: UnderlayImage, kv: KeyValueStore = browserStore): Promise<ImageState> {
  const key = u.dataUrl ?? u.storageKey ?? '';
  let p = decoded.get(key);
  if (!p) {
    if (u.dataUrl) p = decode(u.dataUrl, Math.floor((u.dataUrl.length - u.dataUrl.indexOf(',') - 1) * 0.75));
    else
      p = kv.get(key).then((blob) =>
        blob instanceof Blob
          ? decode(URL.createObjectURL(blob), blob.size)
          : {
              status: 'missing' as const,
              message:
                'the image was kept in the browser storage of the computer it was loaded on, and is not in this one',
            },
      );
    decoded.set(key, p);
    // A failed look-up may succeed after the image is loaded again under the same key.
    void p.then((s) => s.status === 'missing' && decoded.delete(key));
  }
  return p;
}
