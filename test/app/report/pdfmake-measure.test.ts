import { createHash } from 'node:crypto';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { renderPdf } from '../../../app/report/pdf.ts';
import { MEASURED_PROPERTIES, installInlineMeasuring, originalInlineMeasuring } from '../../../core/report/pdfmake-measure.ts';
import { DEFAULT_STYLE, STYLES, pageGeometry } from '../../../core/report/layout.ts';
import type { DocumentDefinition } from '../../../core/report/types.ts';

const require = createRequire(import.meta.url);
type Measure = ReturnType<typeof originalInlineMeasuring>;
const TextInlines = (require('pdfmake/js/TextInlines.js') as { default: { prototype: { measure: Measure } } }).default;

/** A document that exercises every style property the measurer reads, through named styles, `extends`, nesting and inline overrides. */
function styledDocument(): DocumentDefinition {
  const page = pageGeometry('SI');
  const styles = { ...STYLES, base: { fontSize: 9, color: '#334455', lineHeight: 1.3 }, child: { extends: 'base', bold: true, characterSpacing: 0.4 }, loose: { preserveLeadingSpaces: true, preserveTrailingSpaces: true } };
  const paragraph = [
    { text: '   leading spaces kept ', style: 'loose' },
    { text: 'bold child with spacing ', style: 'child' },
    { text: 'x', fontSize: 14 }, { text: '2', sup: true }, { text: ' and A', italics: true }, { text: 's', sub: true },
    { text: ' underlined ', decoration: 'underline', decorationColor: 'red', decorationStyle: 'dashed' },
    { text: 'linked ', link: 'https://example.invalid/', color: 'blue' },
    { text: 'faint ', opacity: 0.4, background: '#eeeeee' },
    { text: 'no wrap here ', noWrap: true },
    { text: 'trailing spaces   ' },
  ];
  return {
    pageSize: page.pageSize, pageOrientation: 'portrait', pageMargins: page.margins,
    info: { title: 'measure', author: '', subject: '', keywords: '', creator: '', producer: '' },
    content: [
      { text: 'Heading of the test', style: 'h2' },
      { text: paragraph, style: 'base', leadingIndent: 12 },
      { text: paragraph, style: ['base', 'child'], alignment: 'justify' },
      { stack: [{ text: 'nested in a styled stack', fontSize: 7 }, { text: 'second line right', alignment: 'right' }], style: 'child' },
      { table: { widths: ['auto', '*'], body: [[{ text: 'M', bold: true }, { text: ['12.5 ', { text: 'kN·m', italics: true }] }], ['φ', { text: '0.0123 1/m', style: 'base' }]] } },
    ],
    header: () => null, footer: (p: number, n: number) => ({ text: `Page ${p} of ${n}`, alignment: 'center', fontSize: 7.5 }),
    styles, defaultStyle: DEFAULT_STYLE, images: {}, compress: false,
  } as unknown as DocumentDefinition;
}

describe('inline measuring (one style push per inline)', () => {
  it('is pdfmake\'s TextInlines.measure as pinned: same properties, defaults and order', () => {
    const original = originalInlineMeasuring(TextInlines).toString();
    const read = [...original.matchAll(/getStyleProperty\(\s*[\w[\]]+\s*,\s*styleContextStack\s*,\s*'(\w+)'\s*,\s*([^)]+?)\s*\)/g)].map((m) => [m[1], m[2]]);
    expect(read).toEqual(MEASURED_PROPERTIES.map(([name, fallback]) => [name, typeof fallback === 'string' ? `'${fallback}'` : String(fallback)]));
    // Any other change of pdfmake's measure (a new step, a changed formula) must be reviewed here and in core/report/pdfmake-measure.ts.
    const digest = createHash('sha256').update(original.replace(/\s+/g, ' ')).digest('hex');
    expect(digest).toBe('86b60733b0b6b68843d796325a56a5d90e0f06a354a0524babd5f0beb65fa190');
  });

  it('gives the same PDF bytes as pdfmake\'s own measure on a document using every measured property', async () => {
    await renderPdf(styledDocument(), '2026-03-14T09:30:00Z'); // configures pdfmake (installs the measurer)
    const installed = TextInlines.prototype.measure;
    const original = originalInlineMeasuring(TextInlines);
    expect(installed).not.toBe(original);
    let ours: Buffer;
    let theirs: Buffer;
    try {
      ours = await renderPdf(styledDocument(), '2026-03-14T09:30:00Z');
      TextInlines.prototype.measure = original;
      theirs = await renderPdf(styledDocument(), '2026-03-14T09:30:00Z');
    } finally {
      TextInlines.prototype.measure = installed;
    }
    expect(ours.length).toBeGreaterThan(1000);
    expect(ours.equals(theirs)).toBe(true);
  });

  it('installs once', () => {
    const before = TextInlines.prototype.measure;
    installInlineMeasuring(TextInlines);
    expect(TextInlines.prototype.measure).toBe(before);
    expect(() => installInlineMeasuring({ prototype: {} })).toThrow(/TextInlines\.prototype\.measure/);
  });
});
