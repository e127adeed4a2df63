import { describe, expect, it } from 'vitest';
import { textPieces, textWidth, withFonts } from '../../../core/report/scripts.ts';
import { testFontSet } from './report-fonts.ts';

const fonts = testFontSet();
const pieces = (text: string) => textPieces(text, fonts).map((p) => `${p.family}${p.rightToLeft ? '/rtl' : ''}:${p.text}`);

describe('textPieces: fonts per script and visual order (Unicode Bidirectional Algorithm, UAX #9)', () => {
  it('leaves text the report font prints as one piece', () => {
    expect(pieces('B-204 φu/φy ≤ 0.5 kN·m')).toEqual(['Roboto:B-204 φu/φy ≤ 0.5 kN·m']);
  });

  it('sets Hebrew in the Hebrew font and puts the words of a right-to-left run in visual order', () => {
    // "beam" "main" in Hebrew: read right to left, so on the page (left to right) the second word comes first.
    expect(pieces('קורה ראשית')).toEqual(['NotoSansHebrew/rtl:ראשית', 'Roboto: ', 'NotoSansHebrew/rtl:קורה']);
  });

  it('keeps numbers left to right inside right-to-left text and Latin text around it in place', () => {
    // UAX #9: European digits after a right-to-left letter take an even level within the run (W2, I1).
    // Levels: "Beam " 0, "קורה" 1, " " 1 (N1), "12" 2, so on the page: "Beam 12 " then the Hebrew word.
    expect(pieces('Beam קורה 12')).toEqual(['Roboto:Beam 12 ', 'NotoSansHebrew/rtl:קורה']);
  });

  it('sets Arabic in the Arabic font, letters in logical order for the shaper', () => {
    expect(pieces('جسر B1')).toEqual(['NotoSansArabic/rtl:جسر', 'Roboto: B1']);
  });

  it('sets emoji in the emoji font, keeping a sequence with a variation selector together', () => {
    expect(pieces('Beam 🏗️ east')).toEqual(['Roboto:Beam ', 'NotoEmoji:🏗️', 'Roboto: east']);
  });

  it('sets arrows, triangles and a letter with a combining macron in the symbol font, the rest in the report font', () => {
    // Roboto has no U+2192, U+25B2 or U+0304 (checked with fontkit); Noto Sans Math has all three.
    // The cluster f + U+0304 (f̄) goes whole to the first font that draws both, so the bar sits over the f (Noto Sans Hebrew, first in order, has Latin letters and the mark).
    expect(pieces('a → b')).toEqual(['Roboto:a ', 'NotoSansMath:→', 'Roboto: b']);
    expect(pieces('▲ peak')).toEqual(['NotoSansMath:▲', 'Roboto: peak']);
    const [bar, rest] = textPieces('f\u0304c = 31 MPa', fonts);
    expect(bar!.text).toBe('f\u0304');
    expect(bar!.family).not.toBe('Roboto');
    const face = fonts.fallbacks.find((f) => f.family === bar!.family)!;
    expect(face.normal.has(0x66) && face.normal.has(0x304)).toBe(true);
    expect(rest).toEqual({ text: 'c = 31 MPa', family: 'Roboto', rightToLeft: false });
  });

  it('mirrors brackets in a right-to-left run', () => {
    expect(pieces('(קורה)').join('|')).toBe('Roboto:(|NotoSansHebrew/rtl:קורה|Roboto:)');
    // All at level 1: reversed, the brackets mirrored (rule L4), so the page shows "(א) " left of the word.
    expect(pieces('קורה (א)').map((p) => p.replace(/^[^:]+:/, '')).join('')).toBe('(א) קורה');
  });

  it('measures text in the font of each piece', () => {
    const hebrew = fonts.fallbacks.find((f) => f.family === 'NotoSansHebrew')!;
    const expected = [...'קורה'].reduce((sum, c) => sum + hebrew.normal.advance(c.codePointAt(0)!), 0) + fonts.primary.normal.advance(0x41);
    expect(textWidth('Aקורה', fonts)).toBeCloseTo(expected, 12);
  });
});

describe('withFonts: the document definition', () => {
  it('splits texts in tables, stacks and columns, and leaves everything else as it is', () => {
    const untouched = { text: 'Plain', style: 'h2' };
    const tree = [
      untouched,
      { table: { body: [['Member', 'קורה ראשית'], ['B-1', { text: 'جسر', bold: true }]] } },
      { stack: ['🏗️ Site'], columns: [{ text: ['Beam ', 'קורה'] }] },
    ];
    const out = withFonts(tree, fonts) as unknown[];
    expect(out[0]).toBe(untouched);
    // Short right-to-left text stays on one line (no-break spaces, noWrap): its order is for one line.
    const rtl = { noWrap: true };
    expect((out[1] as { table: { body: unknown[][] } }).table.body).toEqual([
      ['Member', { text: [{ text: 'ראשית', font: 'NotoSansHebrew', ...rtl }, { text: '\u00A0', ...rtl }, { text: 'קורה', font: 'NotoSansHebrew', ...rtl }] }],
      ['B-1', { text: [{ text: 'جسر', font: 'NotoSansArabic', ...rtl }], bold: true }],
    ]);
    expect((out[2] as { stack: unknown[] }).stack).toEqual([{ text: [{ text: '🏗️', font: 'NotoEmoji' }, { text: ' Site' }] }]);
    expect((out[2] as { columns: { text: unknown[] }[] }).columns[0]!.text).toEqual(['Beam ', { text: 'קורה', font: 'NotoSansHebrew', noWrap: true }]);
    expect(tree[1]).toEqual({ table: { body: [['Member', 'קורה ראשית'], ['B-1', { text: 'جسر', bold: true }]] } });
  });
});
