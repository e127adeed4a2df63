import { createCanvas, loadImage } from '@napi-rs/canvas';
import { describe, expect, it } from 'vitest';
import { encodeRgbPng } from '../../../app/report/png.ts';

/** Decodes a PNG with an independent decoder (Skia, through @napi-rs/canvas) into RGBA pixels. */
async function decode(png: Buffer, width: number, height: number): Promise<Uint8ClampedArray> {
  const image = await loadImage(png);
  expect([image.width, image.height]).toEqual([width, height]);
  const canvas = createCanvas(width, height);
  const context = canvas.getContext('2d');
  context.drawImage(image, 0, 0);
  return context.getImageData(0, 0, width, height).data;
}

describe('RGB PNG encoder', () => {
  it('writes an RGB PNG (colour type 2, 8 bits) that a standard decoder reads back pixel for pixel', async () => {
    const width = 13;
    const height = 7;
    const rgba = new Uint8ClampedArray(width * height * 4);
    for (let i = 0; i < width * height; i++) {
      rgba[4 * i] = (i * 37) % 256;
      rgba[4 * i + 1] = (i * 91) % 256;
      rgba[4 * i + 2] = 255 - ((i * 13) % 256);
      rgba[4 * i + 3] = 255;
    }
    const png = await encodeRgbPng(rgba, width, height);
    // PNG signature and IHDR (W3C PNG 2nd ed. §5.2, §11.2.2)
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.subarray(12, 16).toString('ascii')).toBe('IHDR');
    expect(png.readUInt32BE(16)).toBe(width);
    expect(png.readUInt32BE(20)).toBe(height);
    expect(png[24]).toBe(8);
    expect(png[25]).toBe(2);
    expect([...(await decode(png, width, height))]).toEqual([...rgba]);
  });

  it('ignores alpha (charts are drawn on white) and refuses a buffer of the wrong size', async () => {
    const rgba = new Uint8ClampedArray([10, 20, 30, 0, 40, 50, 60, 128]);
    const pixels = await decode(await encodeRgbPng(rgba, 2, 1), 2, 1);
    expect([...pixels]).toEqual([10, 20, 30, 255, 40, 50, 60, 255]);
    await expect(encodeRgbPng(rgba, 3, 1)).rejects.toThrow(/expected 12 bytes/);
    await expect(encodeRgbPng(rgba, 0, 2)).rejects.toThrow(/bad PNG size/);
  });
});
