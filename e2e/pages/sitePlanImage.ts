import { crc32, deflateSync } from 'node:zlib';

/** A pixel of the invented site plan, px from its top-left corner (v down). */
export interface Px {
  u: number;
  v: number;
}

/**
 * An invented site plan drawn as a PNG (8-bit RGB, no filtering, deflated; PNG specification,
 * W3C 2003, §11–12): white paper, two survey marks for calibration and the corners of a route to trace,
 * each a black cross with a red centre pixel. `noise` fills the paper with random grey speckle so the
 * file does not compress (a "large" image).
 */
export function sitePlanPng(width: number, height: number, marks: readonly Px[], noise = false): Buffer {
  const rgb = Buffer.alloc(width * height * 3, 255);
  if (noise) for (let i = 0; i < rgb.length; i++) rgb[i] = 200 + Math.floor(Math.random() * 56);
  const put = (u: number, v: number, r: number, g: number, b: number) => {
    if (u < 0 || v < 0 || u >= width || v >= height) return;
    const i = (v * width + u) * 3;
    rgb[i] = r;
    rgb[i + 1] = g;
    rgb[i + 2] = b;
  };
  for (const m of marks) {
    for (let d = -14; d <= 14; d++)
      for (let w = -1; w <= 1; w++) {
        put(m.u + d, m.v + w, 0, 0, 0);
        put(m.u + w, m.v + d, 0, 0, 0);
      }
    put(m.u, m.v, 255, 0, 0);
  }
  const raw = Buffer.alloc((width * 3 + 1) * height);
  for (let v = 0; v < height; v++) rgb.copy(raw, v * (width * 3 + 1) + 1, v * width * 3, (v + 1) * width * 3);
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body) >>> 0);
    return Buffer.concat([len, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: RGB
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
