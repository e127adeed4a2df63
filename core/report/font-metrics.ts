/**
 * Advance widths and vertical metrics read straight from TrueType/OpenType font files (the `head`,
 * `hhea`, `hmtx` and `cmap` tables; OpenType spec, "Font file" chapter), so that text in the report's
 * charts is measured the same way in Node and in the browser, whatever canvas either has. The widths
 * are the fonts' own advances without kerning, which is what the charts need to place labels.
 *
 * Pure: takes the file bytes, returns plain lookups. Only uncompressed sfnt files (.ttf, .otf) are
 * read; a file that is not one is refused with an Error naming what was found.
 */

/** Metrics of one font file, in em (multiply by the font size for CSS pixels or points). */
export interface FontMetrics {
  /** Distance from the baseline up to the top of the em box (hhea ascender, normalised so ascent + descent = 1 em). */
  readonly ascent: number;
  /** Distance from the baseline down to the bottom of the em box, positive (normalised as `ascent`). */
  readonly descent: number;
  /** True when the font has a glyph for the code point. */
  has(codePoint: number): boolean;
  /** Advance width of the code point's glyph in em (the missing-glyph advance when it has none). */
  advance(codePoint: number): number;
}

function tableDirectory(view: DataView): Map<string, { offset: number; length: number }> {
  const version = view.getUint32(0);
  // 0x00010000: TrueType outlines; 'OTTO': CFF outlines; 'true': old Apple TrueType.
  if (version !== 0x00010000 && version !== 0x4f54544f && version !== 0x74727565) {
    const tag = String.fromCharCode(view.getUint8(0), view.getUint8(1), view.getUint8(2), view.getUint8(3));
    throw new Error(`not a TrueType or OpenType font file (it starts with "${tag}"; WOFF and WOFF2 files must be unpacked first)`);
  }
  const count = view.getUint16(4);
  const tables = new Map<string, { offset: number; length: number }>();
  for (let i = 0; i < count; i++) {
    const at = 12 + 16 * i;
    const tag = String.fromCharCode(view.getUint8(at), view.getUint8(at + 1), view.getUint8(at + 2), view.getUint8(at + 3));
    tables.set(tag, { offset: view.getUint32(at + 8), length: view.getUint32(at + 12) });
  }
  return tables;
}

/** Code point → glyph id from the best Unicode subtable: format 12 (full range) or 4 (BMP). */
function characterMap(view: DataView, cmapOffset: number): (codePoint: number) => number {
  const count = view.getUint16(cmapOffset + 2);
  let format4 = -1;
  let format12 = -1;
  for (let i = 0; i < count; i++) {
    const at = cmapOffset + 4 + 8 * i;
    const platform = view.getUint16(at);
    const encoding = view.getUint16(at + 2);
    const offset = cmapOffset + view.getUint32(at + 4);
    const unicode = platform === 0 || (platform === 3 && (encoding === 1 || encoding === 10));
    if (!unicode) continue;
    const format = view.getUint16(offset);
    if (format === 12 && format12 < 0) format12 = offset;
    if (format === 4 && format4 < 0) format4 = offset;
  }
  if (format12 >= 0) {
    const groups = view.getUint32(format12 + 12);
    const starts = new Uint32Array(groups);
    const ends = new Uint32Array(groups);
    const glyphs = new Uint32Array(groups);
    for (let g = 0; g < groups; g++) {
      const at = format12 + 16 + 12 * g;
      starts[g] = view.getUint32(at);
      ends[g] = view.getUint32(at + 4);
      glyphs[g] = view.getUint32(at + 8);
    }
    return (cp) => {
      let lo = 0;
      let hi = groups - 1;
      while (lo <= hi) {
        const mid = (lo + hi) >> 1;
        if (cp < starts[mid]!) hi = mid - 1;
        else if (cp > ends[mid]!) lo = mid + 1;
        else return glyphs[mid]! + (cp - starts[mid]!);
      }
      return 0;
    };
  }
  if (format4 >= 0) {
    const segments = view.getUint16(format4 + 6) / 2;
    const endsAt = format4 + 14;
    const startsAt = endsAt + 2 * segments + 2;
    const deltasAt = startsAt + 2 * segments;
    const rangesAt = deltasAt + 2 * segments;
    return (cp) => {
      if (cp > 0xffff) return 0;
      let lo = 0;
      let hi = segments - 1;
      while (lo <= hi) {
        const mid = (lo + hi) >> 1;
        const end = view.getUint16(endsAt + 2 * mid);
        const start = view.getUint16(startsAt + 2 * mid);
        if (cp > end) lo = mid + 1;
        else if (cp < start) hi = mid - 1;
        else {
          const delta = view.getInt16(deltasAt + 2 * mid);
          const rangeOffset = view.getUint16(rangesAt + 2 * mid);
          if (rangeOffset === 0) return (cp + delta) & 0xffff;
          const glyph = view.getUint16(rangesAt + 2 * mid + rangeOffset + 2 * (cp - start));
          return glyph === 0 ? 0 : (glyph + delta) & 0xffff;
        }
      }
      return 0;
    };
  }
  throw new Error('the font has no Unicode character map (cmap format 4 or 12)');
}

/** Reads the metrics of a TrueType/OpenType file. Throws an Error for anything else. */
export function readFontMetrics(bytes: Uint8Array): FontMetrics {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const tables = tableDirectory(view);
  const table = (tag: string) => {
    const found = tables.get(tag);
    if (!found) throw new Error(`the font has no "${tag}" table`);
    return found.offset;
  };
  const unitsPerEm = view.getUint16(table('head') + 18);
  const hhea = table('hhea');
  const ascender = view.getInt16(hhea + 4);
  const descender = -view.getInt16(hhea + 6);
  const metricsCount = view.getUint16(hhea + 34);
  const hmtx = table('hmtx');
  const glyphOf = characterMap(view, table('cmap'));
  const advances = new Float64Array(metricsCount);
  for (let i = 0; i < metricsCount; i++) advances[i] = view.getUint16(hmtx + 4 * i) / unitsPerEm;
  const box = ascender + descender > 0 ? ascender + descender : unitsPerEm;
  return {
    ascent: ascender / box,
    descent: descender / box,
    has: (cp) => glyphOf(cp) !== 0,
    // Glyphs past numberOfHMetrics share the last advance (OpenType hmtx).
    advance: (cp) => advances[Math.min(glyphOf(cp), metricsCount - 1)]!,
  };
}
