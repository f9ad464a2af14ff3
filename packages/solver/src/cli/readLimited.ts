import { closeSync, fstatSync, openSync, readSync } from 'node:fs';

/** The app refuses project files over 20 MB (a 10,000-fitting route is about 5 MB); so does the CLI. */
export const DEFAULT_MAX_BYTES = 20 * 1024 * 1024;

/** A file over the size limit: `code` as Node's errors carry one, and the bytes seen. */
export class TooLargeError extends Error {
  readonly code = 'ETOOLARGE';
  constructor(
    readonly maxBytes: number,
    readonly size: number | null,
  ) {
    super(`larger than ${maxBytes} bytes`);
  }
}

/**
 * Reads at most `maxBytes` of a file. A regular file's size is checked before reading; a device or
 * pipe (/dev/zero, /dev/urandom) is read in chunks and refused once it passes the limit, so no
 * input can be read forever.
 */
export function readLimited(path: string, maxBytes: number): Uint8Array {
  const fd = openSync(path, 'r');
  try {
    const stat = fstatSync(fd);
    if (stat.isDirectory()) throw Object.assign(new Error('is a directory'), { code: 'EISDIR' });
    if (stat.isFile() && stat.size > maxBytes) throw new TooLargeError(maxBytes, stat.size);
    const chunks: Uint8Array[] = [];
    let total = 0;
    const chunk = new Uint8Array(64 * 1024);
    for (;;) {
      const n = readSync(fd, chunk, 0, chunk.length, null);
      if (n === 0) break;
      total += n;
      if (total > maxBytes) throw new TooLargeError(maxBytes, null);
      chunks.push(chunk.slice(0, n));
    }
    const out = new Uint8Array(total);
    let at = 0;
    for (const c of chunks) {
      out.set(c, at);
      at += c.length;
    }
    return out;
  } finally {
    closeSync(fd);
  }
}
