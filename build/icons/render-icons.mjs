// Renders build/icons/icon.svg into the PNG, ICO and ICNS files the packager uses:
//   png/<n>x<n>.png (Linux), icon.png (1024 px), icon.ico (Windows), icon.icns (macOS).
// Run: node build/icons/render-icons.mjs   (uses @napi-rs/canvas, works offline)
import { readFile, writeFile, mkdir } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { createCanvas, loadImage } from '@napi-rs/canvas';

const folder = fileURLToPath(new URL('.', import.meta.url));
const PNG_SIZES = [16, 24, 32, 48, 64, 128, 256, 512, 1024];
const ICO_SIZES = [16, 24, 32, 48, 64, 128, 256];
// ICNS element types holding PNG data, with their pixel size.
const ICNS_TYPES = [
  ['icp4', 16], ['icp5', 32], ['icp6', 64], ['ic07', 128], ['ic08', 256], ['ic09', 512], ['ic10', 1024],
  ['ic11', 32], ['ic12', 64], ['ic13', 256], ['ic14', 512],
];

async function renderPng(svg, size) {
  const image = await loadImage(svg);
  const canvas = createCanvas(size, size);
  const context = canvas.getContext('2d');
  context.imageSmoothingQuality = 'high';
  context.drawImage(image, 0, 0, size, size);
  return canvas.encode('png');
}

function ico(images) {
  const header = Buffer.alloc(6 + 16 * images.length);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2); // 1 = icon
  header.writeUInt16LE(images.length, 4);
  let offset = header.length;
  images.forEach(({ size, png }, index) => {
    const entry = 6 + 16 * index;
    header.writeUInt8(size >= 256 ? 0 : size, entry); // 0 means 256
    header.writeUInt8(size >= 256 ? 0 : size, entry + 1);
    header.writeUInt8(0, entry + 2);
    header.writeUInt8(0, entry + 3);
    header.writeUInt16LE(1, entry + 4);
    header.writeUInt16LE(32, entry + 6);
    header.writeUInt32LE(png.length, entry + 8);
    header.writeUInt32LE(offset, entry + 12);
    offset += png.length;
  });
  return Buffer.concat([header, ...images.map(({ png }) => png)]);
}

function icns(elements) {
  const parts = elements.map(({ type, png }) => {
    const head = Buffer.alloc(8);
    head.write(type, 0, 'ascii');
    head.writeUInt32BE(png.length + 8, 4);
    return Buffer.concat([head, png]);
  });
  const body = Buffer.concat(parts);
  const head = Buffer.alloc(8);
  head.write('icns', 0, 'ascii');
  head.writeUInt32BE(body.length + 8, 4);
  return Buffer.concat([head, body]);
}

const svg = await readFile(join(folder, 'icon.svg'));
const pngs = new Map();
for (const size of PNG_SIZES) pngs.set(size, await renderPng(svg, size));

await mkdir(join(folder, 'png'), { recursive: true });
for (const [size, png] of pngs) await writeFile(join(folder, 'png', `${size}x${size}.png`), png);
await writeFile(join(folder, 'icon.png'), pngs.get(1024));
await writeFile(join(folder, 'icon.ico'), ico(ICO_SIZES.map((size) => ({ size, png: pngs.get(size) }))));
await writeFile(join(folder, 'icon.icns'), icns(ICNS_TYPES.map(([type, size]) => ({ type, png: pngs.get(size) }))));
console.log(`icons written to ${folder}`);
