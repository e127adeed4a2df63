/**
 * A minimal PNG encoder for opaque RGB images (colour type 2, 8 bits, no interlace).
 *
 * Why not the canvas's own encoder: it writes RGBA, and PDF has no alpha in image data, so PDFKit
 * must inflate every RGBA PNG, split off the alpha channel and deflate both again — about 70 ms per
 * chart. An RGB PNG's compressed data is what a PDF image stream holds (Flate with the PNG
 * predictors), so PDFKit embeds it as it is. Charts are drawn on an opaque white background, so
 * dropping alpha loses nothing.
 *
 * @see PNG (Portable Network Graphics) Specification, 2nd ed., W3C Recommendation 2003 /
 *      ISO/IEC 15948:2004 — §5 datastream (signature, chunk layout, CRC-32), §11.2.2 IHDR, §9 filter
 *      type 1 (Sub).
 */
import { promisify } from 'node:util';
import { crc32, deflate } from 'node:zlib';

const deflateAsync = promisify(deflate);

const SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

function chunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'ascii');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(data, crc32(head.subarray(4, 8))) >>> 0, 0);
  return Buffer.concat([head, data, crc]);
}

/**
 * Encodes RGBA pixels (row-major, 4 bytes per pixel, as `getImageData` gives them) as an RGB PNG,
 * ignoring alpha. Each row uses the Sub filter, which suits the flat colours of charts. The
 * deflate step runs on the thread pool. Throws when the pixel buffer does not match the size.
 */
export async function encodeRgbPng(rgba: Uint8Array | Uint8ClampedArray, width: number, height: number, level = 6): Promise<Buffer> {
  if (!Number.isInteger(width) || !Number.isInteger(height) || width <= 0 || height <= 0) throw new Error(`bad PNG size ${width} × ${height}`);
  if (rgba.length !== width * height * 4) throw new Error(`expected ${width * height * 4} bytes of RGBA pixels, got ${rgba.length}`);
  const stride = width * 3 + 1;
  const raw = Buffer.alloc(stride * height);
  for (let y = 0; y < height; y++) {
    const row = y * stride;
    raw[row] = 1; // filter type 1: Sub
    let r0 = 0;
    let g0 = 0;
    let b0 = 0;
    let i = y * width * 4;
    let k = row + 1;
    for (let x = 0; x < width; x++, i += 4, k += 3) {
      const r = rgba[i]!;
      const g = rgba[i + 1]!;
      const b = rgba[i + 2]!;
      raw[k] = (r - r0) & 0xff;
      raw[k + 1] = (g - g0) & 0xff;
      raw[k + 2] = (b - b0) & 0xff;
      r0 = r;
      g0 = g;
      b0 = b;
    }
  }
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: truecolour (RGB)
  header[10] = 0; // compression: deflate
  header[11] = 0; // filter method 0
  header[12] = 0; // no interlace
  const data = await deflateAsync(raw, { level });
  return Buffer.concat([SIGNATURE, chunk('IHDR', header), chunk('IDAT', data), chunk('IEND', Buffer.alloc(0))]);
}
