import type { Underlay } from '@mainbrace/solver';
import { browserStore, type KeyValueStore } from './keyValue.js';

/**
 * An image file up to this size, bytes, is written into the project file as a data URL; a larger one
 * is kept in browser storage (IndexedDB) beside the project, and the file carries only its key
 * (project-format.md, "Where the image is kept").
 */
export const INLINE_LIMIT_BYTES = 1024 * 1024;

/** Prefix of the storage keys of large underlay images. */
export const UNDERLAY_KEY_PREFIX = 'mainbrace.underlay.v1.';

export type UnderlayMediaType = Underlay['mediaType'];

/** The kind of image from its first bytes (a file's name or stated type is not trusted). */
export function sniffImage(bytes: Uint8Array): UnderlayMediaType | null {
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length >= 8 && png.every((b, i) => bytes[i] === b)) return 'image/png';
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  return null;
}

/** Where an image of `bytes` bytes is kept. */
export const keptInline = (bytes: number): boolean => bytes <= INLINE_LIMIT_BYTES;

/** The image part of an underlay: what a loaded file gives, before it is placed on the plan. */
export type UnderlayImage = Pick<Underlay, 'name' | 'mediaType' | 'width' | 'height' | 'dataUrl' | 'storageKey'>;

export type LoadedImage = { ok: true; image: UnderlayImage; bytes: number } | { ok: false; message: string };

function dataUrlOf(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(String(r.result));
    r.onerror = () => reject(r.error ?? new Error('the file could not be read'));
    r.readAsDataURL(blob);
  });
}

/**
 * Reads a PNG or JPEG the user picked: small images become a data URL for the file; large ones are
 * stored under a new key in browser storage. Never throws; the message names the file and what was expected.
 */
export async function loadImageFile(file: File, kv: KeyValueStore = browserStore): Promise<LoadedImage> {
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await file.arrayBuffer());
  } catch (e) {
    return { ok: false, message: `${file.name}: the file could not be read (${(e as Error).message})` };
  }
  const mediaType = sniffImage(bytes);
  if (!mediaType) return { ok: false, message: `${file.name}: expected a PNG or JPEG image` };
  const blob = new Blob([bytes as BlobPart], { type: mediaType });
  let width: number;
  let height: number;
  try {
    const bitmap = await createImageBitmap(blob);
    width = bitmap.width;
    height = bitmap.height;
    bitmap.close();
  } catch {
    return { ok: false, message: `${file.name}: the image could not be decoded (a damaged ${mediaType} file?)` };
  }
  const base = { name: file.name.slice(0, 200), mediaType, width, height };
  try {
    if (keptInline(bytes.length))
      return { ok: true, bytes: bytes.length, image: { ...base, dataUrl: await dataUrlOf(blob) } };
    const storageKey = `${UNDERLAY_KEY_PREFIX}${Date.now().toString(36)}.${Math.random().toString(36).slice(2, 8)}`;
    await kv.set(storageKey, blob);
    return { ok: true, bytes: bytes.length, image: { ...base, storageKey } };
  } catch (e) {
    return { ok: false, message: `${file.name}: the image could not be kept (${(e as Error).message})` };
  }
}
