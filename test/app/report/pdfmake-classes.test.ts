/**
 * pdfmake's browser build (the app's report worker) gets the same adjustments as pdfmake in Node
 * (the command line): its classes are found through a one-line document, its patched methods are
 * the ones the adjustments were written for, and both builds then write the same page contents.
 * The browser build runs here in Node with the report's fonts in its virtual file system.
 */
import { createHash } from 'node:crypto';
import { createRequire } from 'node:module';
import { inflateSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { renderPdf } from '../../../app/report/pdf.ts';
import { reportFontDescriptors, reportFontFiles, REPORT_FONT_FILES } from '../../../core/report/fonts.ts';
import { findBundledClasses, installReportAdjustments, type PdfmakeBundle, type PdfmakeClasses } from '../../../core/report/pdfmake-classes.ts';
import { originalLineRendering } from '../../../core/report/pdfmake-lines.ts';
import { MEASURED_PROPERTIES, originalInlineMeasuring } from '../../../core/report/pdfmake-measure.ts';
import { DEFAULT_STYLE, STYLES, pageGeometry } from '../../../core/report/layout.ts';
import type { DocumentDefinition } from '../../../core/report/types.ts';
import { fontBytes } from '../../core/report/report-fonts.ts';
import { pdfText } from './pdf-text.ts';

const require = createRequire(import.meta.url);

interface Bundle extends PdfmakeBundle {
  addVirtualFileSystem(files: Record<string, string>): void;
  setFonts(fonts: object): void;
  setUrlAccessPolicy(policy: (url: string) => boolean): void;
  localAccessPolicy?: (path: string) => boolean;
  createPdf(definition: object): { getStream(): Promise<object>; getBuffer(): Promise<Uint8Array> };
}

const bundle = require('pdfmake/build/pdfmake.js') as Bundle;
const GENERATED_ON = '2026-03-14T09:30:00Z';

/** A report-styled document with tables, justified and right-aligned text, links, sup/sub and decorations. */
function document(): DocumentDefinition {
  const page = pageGeometry('SI');
  const paragraph = [
    'The beam reaches its ', { text: 'nominal moment ', bold: true }, 'at a curvature of 4.2 × 10', { text: '−5', sup: true }, ' 1/mm; ε',
    { text: 'cu', sub: true }, ' = 0.003. ', { text: 'underlined ', decoration: 'underline' }, { text: 'a link ', link: 'https://example.invalid/' },
    { text: 'in colour ', color: '#b3261e' }, 'and plain words to the end of a line that wraps more than once across the page width.',
  ];
  return {
    pageSize: page.pageSize, pageOrientation: 'portrait', pageMargins: page.margins,
    info: { title: 'classes', author: '', subject: '', keywords: '', creator: '', producer: '' },
    content: [
      { text: 'Heading of the test', style: 'h2' },
      { text: paragraph },
      { text: paragraph, alignment: 'justify' },
      { text: 'right-aligned words of one line', alignment: 'right' },
      { table: { widths: ['auto', '*', 'auto'], body: [['Quantity', 'Value', 'Unit'], ['Yield moment My', '212.4 (sagging)', 'kN·m'], [{ text: 'Ductility μΔ', bold: true }, { text: '4.8 — adequate', color: '#1e7b34' }, '–']] } },
    ],
    footer: (p: number, n: number) => ({ text: `Page ${p} of ${n}`, alignment: 'center', fontSize: 7.5 }),
    styles: STYLES, defaultStyle: DEFAULT_STYLE, images: {},
  } as unknown as DocumentDefinition;
}

async function bundlePdf(definition: DocumentDefinition): Promise<Buffer> {
  const withDate = { ...definition, info: { ...definition.info, creationDate: new Date(GENERATED_ON) } };
  return Buffer.from(await bundle.createPdf(withDate).getBuffer());
}

/** The PDF's streams inflated, in file order (the builds compress with different deflate libraries). */
function inflatedStreams(pdf: Buffer): string[] {
  const text = pdf.toString('latin1');
  return [...text.matchAll(/(?<!end)stream\r?\n/g)].map((m) => {
    const start = m.index + m[0].length;
    return inflateSync(pdf.subarray(start, text.indexOf('endstream', start))).toString('latin1');
  });
}

/** Text objects (BT … ET) in the PDF's streams. */
const textObjects = (pdf: Buffer) => inflatedStreams(pdf).reduce((n, s) => n + (s.match(/(?<=\s|^)BT(?=\s)/g)?.length ?? 0), 0);

const digest = (f: unknown) => createHash('sha256').update(String(f).replace(/\s+/g, ' ')).digest('hex');

let classes: PdfmakeClasses;
let forEachBefore: unknown;

beforeAll(async () => {
  const vfs: Record<string, string> = {};
  for (const file of [...Object.values(REPORT_FONT_FILES), ...reportFontFiles().map((f) => f.file)]) vfs[file] = Buffer.from(fontBytes(file)).toString('base64');
  bundle.addVirtualFileSystem(vfs);
  bundle.setFonts(reportFontDescriptors());
  bundle.setUrlAccessPolicy(() => false);
  bundle.localAccessPolicy = () => false; // no files: its fonts are in the virtual file system
  forEachBefore = Array.prototype.forEach;
  classes = await findBundledClasses(bundle);
});

describe('pdfmake\'s browser build, adjusted as in Node', () => {
  it('shows its document, text measurer and renderer, and leaves Array.prototype.forEach as it was', () => {
    expect(Array.prototype.forEach).toBe(forEachBefore);
    expect(Object.getOwnPropertyNames(classes.documentClass.prototype)).toContain('provideFont');
    expect(Object.getOwnPropertyNames(classes.textInlinesClass.prototype)).toEqual(expect.arrayContaining(['measure', 'widthOfText', 'buildInlines']));
    expect(Object.getOwnPropertyNames(classes.rendererClass.prototype)).toEqual(expect.arrayContaining(['renderPages', 'renderLine']));
    // They are the bundle's own classes, not the ones of pdfmake/js.
    expect(classes.rendererClass).not.toBe((require('pdfmake/js/Renderer.js') as { default: unknown }).default);
    expect(classes.textInlinesClass).not.toBe((require('pdfmake/js/TextInlines.js') as { default: unknown }).default);
  });

  it('names what it did not find, and restores forEach when the probe fails', async () => {
    const silent: PdfmakeBundle = { createPdf: () => ({ getStream: async () => ({}) }), setProgressCallback: () => undefined };
    await expect(findBundledClasses(silent)).rejects.toThrow(/did not show its document, text measurer, renderer class/);
    const failing: PdfmakeBundle = { createPdf: () => ({ getStream: () => Promise.reject(new Error('no fonts')) }), setProgressCallback: () => undefined };
    await expect(findBundledClasses(failing)).rejects.toThrow('no fonts');
    expect(Array.prototype.forEach).toBe(forEachBefore);
  });

  it('has the measure and renderLine the adjustments were written for', () => {
    // The same checks as for pdfmake/js (pdfmake-measure.test.ts, core/report/pdfmake-lines.test.ts),
    // on the bundle's compiled copies: a new pdfmake must be reviewed in both places.
    const measure = originalInlineMeasuring(classes.textInlinesClass).toString();
    const read = [...measure.matchAll(/getStyleProperty\(\s*[\w[\]]+\s*,\s*styleContextStack\s*,\s*'(\w+)'\s*,\s*([^)]+?)\s*\)/g)].map((m) => [m[1], m[2]]);
    expect(read).toEqual(MEASURED_PROPERTIES.map(([name, fallback]) => [name, typeof fallback === 'string' ? `'${fallback}'` : String(fallback)]));
    expect(digest(measure)).toBe('a3aa09b6f123b3629d1bc4ec36ae5bb0c46d25e4abfdea4c107958001516ed45');
    const renderLine = originalLineRendering(classes.rendererClass).toString();
    const fields = new Set([...renderLine.matchAll(/\binline\.(\w+)/g)].map((m) => m[1]));
    expect([...fields].sort()).toEqual(['_pageNodeRef', 'alignment', 'characterSpacing', 'color', 'font', 'fontFeatures', 'fontSize', 'height', 'link', 'linkToDestination', 'linkToPage', 'opacity', 'text', 'width', 'x']);
    expect(renderLine).toContain('this.pdfDocument.text(inline.text, x + inline.x, shiftedY, options);');
    expect(digest(renderLine)).toBe('8177caadc36c062f8d65c469237fd85c957b9dce5113644a401e04801216d180');
  });

  it('writes the same pages as pdfmake in Node once adjusted: same contents, words that print alike joined', async () => {
    installReportAdjustments(classes);
    const browser = await bundlePdf(document());
    expect(inflatedStreams(browser)).toEqual(inflatedStreams(await renderPdf(document(), GENERATED_ON)));
    // Against the bundle's own measure and renderer: the same bytes with its own measure; the same
    // words in the same order, in fewer text objects, with its own renderLine.
    const rendererPrototype = classes.rendererClass.prototype as { renderLine: unknown };
    const measurerPrototype = classes.textInlinesClass.prototype as { measure: unknown };
    const [merging, measuring] = [rendererPrototype.renderLine, measurerPrototype.measure];
    let ownMeasure: Buffer;
    let ownRenderer: Buffer;
    try {
      measurerPrototype.measure = originalInlineMeasuring(classes.textInlinesClass);
      ownMeasure = await bundlePdf(document());
      measurerPrototype.measure = measuring;
      rendererPrototype.renderLine = originalLineRendering(classes.rendererClass);
      ownRenderer = await bundlePdf(document());
    } finally {
      rendererPrototype.renderLine = merging;
      measurerPrototype.measure = measuring;
    }
    expect(ownMeasure.equals(browser)).toBe(true);
    expect((await pdfText(browser)).pages).toEqual((await pdfText(ownRenderer)).pages);
    const [joined, apart] = [textObjects(browser), textObjects(ownRenderer)];
    expect(joined).toBeGreaterThan(10);
    expect(joined).toBeLessThan(apart * 0.6);
  });
});
