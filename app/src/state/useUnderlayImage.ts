import { useEffect, useState } from 'react';
import type { UnderlayImage } from './underlayFile.js';
import { lazyModule } from '../chrome/lazyPart.js';

export type ImageState =
  | { status: 'none' }
  | { status: 'loading' }
  | { status: 'ready'; image: HTMLImageElement; bytes: number | null }
  | { status: 'missing'; message: string };

type Decoder = typeof import('./underlayImage.js');
let loaded: Decoder | null = null;
/** The decoder and the image's drawing (state/underlayImage.ts): only a project with a site plan needs them at start. */
const decoder = lazyModule(() => import('./underlayImage.js').then((m) => (loaded = m)));

/**
 * Draws a decoded site-plan image under the route (plan/drawUnderlay.ts); its code came with the
 * decoder, which a `ready` image implies.
 */
export function drawUnderlayImage(...args: Parameters<Decoder['drawUnderlay']>): void {
  loaded?.drawUnderlay(...args);
}

/** The underlay's image for drawing and for the panel; re-renders when it is decoded. */
export function useUnderlayImage(u: UnderlayImage | undefined): ImageState {
  const key = u ? (u.dataUrl ?? u.storageKey ?? '') : '';
  const [state, setState] = useState<{ key: string; image: ImageState }>({ key: '', image: { status: 'none' } });
  useEffect(() => {
    if (!u) return;
    let live = true;
    void decoder()
      .then((m) => m.imageOf(u))
      .then(
        (image) => live && setState({ key, image }),
        () => live && setState({ key, image: { status: 'missing', message: 'the image reader could not be loaded' } }),
      );
    return () => {
      live = false;
    };
    // The key names the image; the rest of the underlay (placement, opacity) does not change it.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  if (!u) return { status: 'none' };
  return state.key === key ? state.image : { status: 'loading' };
}
