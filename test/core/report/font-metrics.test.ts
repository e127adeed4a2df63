import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { readFontMetrics } from '../../../core/report/font-metrics.ts';
import { reportFontFiles } from '../../../core/report/fonts.ts';
import { fontBytes } from './report-fonts.ts';

// fontkit (the font library inside pdfkit, which lays out the PDF's text) reads the same files
// independently: the advances must agree glyph for glyph.
const fontkit = createRequire(import.meta.url)('fontkit') as { create(buffer: Buffer): { unitsPerEm: number; ascent: number; descent: number; glyphForCodePoint(cp: number): { id: number; advanceWidth: number } } };

const SAMPLE = [...'AMWiy 0123.,:φσεΔ√‰ℓ×·²קורהשלוםمرحباكتاب😀🏗'].map((c) => c.codePointAt(0)!);

describe('readFontMetrics', () => {
  it.each(reportFontFiles().map((f) => [f.file] as const))('reads the same advances and glyph coverage as fontkit from %s', (file) => {
    const bytes = fontBytes(file);
    const ours = readFontMetrics(bytes);
    const theirs = fontkit.create(Buffer.from(bytes));
    for (const cp of SAMPLE) {
      const glyph = theirs.glyphForCodePoint(cp);
      expect(ours.has(cp), `U+${cp.toString(16)}`).toBe(glyph.id !== 0);
      expect(ours.advance(cp)).toBeCloseTo(glyph.advanceWidth / theirs.unitsPerEm, 9);
    }
    // The em box: ascent + descent = 1 em, in the font's own proportion.
    expect(ours.ascent + ours.descent).toBeCloseTo(1, 12);
    expect(ours.ascent / ours.descent).toBeCloseTo(theirs.ascent / -theirs.descent, 9);
  });

  it('knows which script each font covers', () => {
    const roboto = readFontMetrics(fontBytes('Roboto-Regular.ttf'));
    const hebrew = readFontMetrics(fontBytes('@expo-google-fonts/noto-sans-hebrew/400Regular/NotoSansHebrew_400Regular.ttf'));
    expect(roboto.has('φ'.codePointAt(0)!)).toBe(true);
    expect(roboto.has('ש'.codePointAt(0)!)).toBe(false);
    expect(hebrew.has('ש'.codePointAt(0)!)).toBe(true);
  });

  it('refuses a file that is not an unpacked font, naming what it found', () => {
    expect(() => readFontMetrics(new TextEncoder().encode('wOF2 and more bytes here'))).toThrow(/not a TrueType or OpenType font file \(it starts with "wOF2"/);
  });
});
