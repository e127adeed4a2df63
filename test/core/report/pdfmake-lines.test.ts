/**
 * Neighbouring words of a line that print alike are written as one text object
 * (core/report/pdfmake-lines.ts); anything that ties a word to its own box keeps it apart.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { installLineMerging, mergeLineInlines, originalLineRendering, type LineInline } from '../../../core/report/pdfmake-lines.ts';

const font = { name: 'regular' };
const bold = { name: 'bold' };

/** Words laid side by side from x = 0 as pdfmake's Line.addInline places them. */
function line(...words: (string | Partial<LineInline> & { text: string })[]): LineInline[] {
  let x = 0;
  return words.map((w) => {
    const base = typeof w === 'string' ? { text: w } : w;
    const width = base.text.length * 4.5;
    const inline: LineInline = { font, fontSize: 9, color: '#1b2733', opacity: 1, characterSpacing: 0, height: 12, ...base, x, width };
    x += width;
    return inline;
  });
}

describe('mergeLineInlines', () => {
  it('joins words that print alike and touch into one run of the same extent', () => {
    const inlines = line('Span ', 'is ', '6.00 ', 'm');
    const merged = mergeLineInlines(inlines);
    expect(merged).toHaveLength(1);
    expect(merged[0]!.text).toBe('Span is 6.00 m');
    expect(merged[0]!.x).toBe(0);
    expect(merged[0]!.width).toBeCloseTo(inlines.reduce((s, i) => s + i.width, 0), 12);
    // The inputs are not changed.
    expect(inlines.map((i) => i.text)).toEqual(['Span ', 'is ', '6.00 ', 'm']);
  });

  it('returns the same array when nothing joins', () => {
    const one = line('alone');
    expect(mergeLineInlines(one)).toBe(one);
    const styled = line('a ', { text: 'b ', font: bold }, { text: 'c', color: '#b3261e' });
    expect(mergeLineInlines(styled)).toBe(styled);
  });

  it('keeps runs apart where font, size, colour or opacity change', () => {
    const inlines = line('Status: ', 'the ', { text: 'PASS ', font: bold, color: '#1e7b34' }, { text: 'FAIL ', font: bold, color: '#b3261e' }, { text: 'small ', fontSize: 7 }, { text: 'faint', fontSize: 7, opacity: 0.5 });
    expect(mergeLineInlines(inlines).map((i) => i.text)).toEqual(['Status: the ', 'PASS ', 'FAIL ', 'small ', 'faint']);
  });

  it('never joins the spread-out words of a justified line', () => {
    const inlines = line('one ', 'two ', 'three');
    // As pdfmake's ElementWriter.alignLine justifies: each later word moved right.
    inlines[1]!.x += 3; inlines[1]!.justifyShift = 3;
    inlines[2]!.x += 6; inlines[2]!.justifyShift = 3;
    expect(mergeLineInlines(inlines)).toBe(inlines);
    // A gap without a justify mark keeps words apart too.
    const gapped = line('one ', 'two');
    gapped[1]!.x += 0.01;
    expect(mergeLineInlines(gapped)).toBe(gapped);
  });

  it('keeps links, page references, decorations, backgrounds, features, spacing, sup and sub apart', () => {
    const specials: Partial<LineInline>[] = [
      { link: 'https://example.org' }, { linkToPage: 3 }, { linkToDestination: 'm1' }, { _pageNodeRef: { positions: [] } },
      { decoration: 'underline' }, { background: '#ffff00' }, { fontFeatures: ['tnum'] }, { characterSpacing: 2 }, { sup: true }, { sub: true },
    ];
    for (const special of specials) {
      const before = line('a ', { text: 'b ', ...special }, 'c');
      expect(mergeLineInlines(before).map((i) => i.text), JSON.stringify(special)).toEqual(['a ', 'b ', 'c']);
    }
  });

  it('joins the plain words around a special one', () => {
    const inlines = line('see ', 'page ', { text: '12', _pageNodeRef: { positions: [] } }, ' of ', 'the ', 'report');
    expect(mergeLineInlines(inlines).map((i) => i.text)).toEqual(['see page ', '12', ' of the report']);
  });
});

describe('pdfmake renderer as core/report/pdfmake-lines.ts expects it', () => {
  // If pdfmake's renderLine starts to read another field of an inline, merging could drop it:
  // this test then fails, and pdfmake-lines.ts must learn the field (or merging be removed).
  const require = createRequire(import.meta.url);
  const source = readFileSync(require.resolve('pdfmake/js/Renderer.js'), 'utf8');
  const start = source.indexOf('  renderLine(line, x, y) {');
  const end = source.indexOf('\n  renderVector(', start);

  it('has renderLine, writing each inline with pdfDocument.text', () => {
    expect(start).toBeGreaterThan(0);
    expect(end).toBeGreaterThan(start);
    expect(source.slice(start, end)).toContain('this.pdfDocument.text(inline.text, x + inline.x, shiftedY, options);');
  });

  it('reads only the inline fields that merging accounts for', () => {
    const read = new Set([...source.slice(start, end).matchAll(/\binline\.(\w+)/g)].map((m) => m[1]));
    expect([...read].sort()).toEqual(['_pageNodeRef', 'alignment', 'characterSpacing', 'color', 'font', 'fontFeatures', 'fontSize', 'height', 'link', 'linkToDestination', 'linkToPage', 'opacity', 'text', 'width', 'x']);
    // offsetText reads sup and sub; the text decorator reads decoration and background (both kept apart).
    expect(source).toContain('if (inline.sup) {');
    expect(source).toContain('textDecorator.drawDecorations(line, x, y);');
  });

  it('is pdfmake\'s renderLine as pinned (any change must be reviewed in core/report/pdfmake-lines.ts)', () => {
    const Renderer = (require('pdfmake/js/Renderer.js') as { default: { prototype: object } }).default;
    const renderLine = originalLineRendering(Renderer).toString();
    expect(source).toContain(renderLine.slice(0, 200));
    expect(createHash('sha256').update(renderLine.replace(/\s+/g, ' ')).digest('hex')).toBe('45aaac8844795ed0f1d859343eaab0eec47832c7c62045c69721f5293e16eab7');
  });

  it('installs once per renderer class, and refuses a renderer without renderLine', () => {
    class Fake {
      renderLine(line: { inlines: LineInline[] }, x: number, y: number): string {
        return `drawn ${line.inlines.length} at ${x}, ${y}`;
      }
    }
    installLineMerging(Fake);
    const installed = Fake.prototype.renderLine;
    expect(installed).not.toBe(originalLineRendering(Fake));
    installLineMerging(Fake);
    expect(Fake.prototype.renderLine).toBe(installed);
    expect(new Fake().renderLine({ inlines: [] }, 3, 4)).toBe('drawn 0 at 3, 4');
    expect(() => installLineMerging({ prototype: {} })).toThrow(/renderLine/);
  });
});
