/**
 * The report changes three of pdfmake's classes, the same way in both hosts so that the app's PDF
 * and the command line's stay alike:
 *  - its PDF document: charts given as figure programs are drawn directly (pdfmake-figures.ts);
 *  - its text measurer (`TextInlines`): each inline's style is pushed once (pdfmake-measure.ts);
 *  - its renderer: neighbouring words that print alike are one text object (pdfmake-lines.ts).
 * `installReportAdjustments` installs all three; each host finds the classes its pdfmake uses.
 *
 * Node (app/report/pdf.ts) requires them from pdfmake/js/*, the modules pdfmake itself loads. The
 * browser build (pdfmake/build/pdfmake.js, the app's report worker) is one bundle that exports only
 * its pdfmake object: the same classes are compiled into it, reachable only through their
 * instances. `findBundledClasses` makes a one-line document with the bundle and meets each on the
 * way:
 *  - the document: the PDFKit document that `getStream()` resolves with;
 *  - the renderer: pdfmake calls the progress callback as a method of its renderer
 *    (`this.progressCallback(done)` in `Renderer.renderPages`), so a plain function sees it as `this`;
 *  - the text measurer: nothing hands it out, but `TextInlines.measure` walks its inlines with
 *    `array.forEach(callback, this)`. For the probe alone, `Array.prototype.forEach` is wrapped to
 *    note a `thisArg` that is a text measurer, and restored when the probe ends (also on failure);
 *    the wrapper passes every call through unchanged.
 * test/app/report/pdfmake-classes.test.ts checks that the bundle's classes are found, that its
 * patched methods are the ones the adjustments were written for (digests, as for pdfmake/js), and
 * that both builds then write the same page contents.
 * pdfmake is not imported here: the host passes the pdfmake it uses.
 */
import { installFigureDrawing } from './pdfmake-figures.ts';
import { installLineMerging } from './pdfmake-lines.ts';
import { installInlineMeasuring } from './pdfmake-measure.ts';

/** A class of pdfmake's, as the adjustments take it. */
export interface PdfmakeClass {
  readonly prototype: object;
}

/** The pdfmake classes the report adjusts. */
export interface PdfmakeClasses {
  /** pdfmake's PDFKit document (js/PDFDocument.js). */
  readonly documentClass: PdfmakeClass;
  /** pdfmake's text measurer (js/TextInlines.js). */
  readonly textInlinesClass: PdfmakeClass;
  /** pdfmake's renderer (js/Renderer.js). */
  readonly rendererClass: PdfmakeClass;
}

/** Installs every adjustment of pdfmake the report relies on (each once per class). */
export function installReportAdjustments(classes: PdfmakeClasses): void {
  installFigureDrawing(classes.documentClass);
  installInlineMeasuring(classes.textInlinesClass);
  installLineMerging(classes.rendererClass);
}

/** The parts of pdfmake's browser build used here. */
export interface PdfmakeBundle {
  createPdf(definition: object): { getStream(): Promise<object> };
  setProgressCallback(callback: ((fraction: number) => void) | undefined): void;
}

const methods = (value: unknown, ...names: string[]): value is object => {
  if (typeof value !== 'object' || value === null) return false;
  return names.every((name) => typeof (value as Record<string, unknown>)[name] === 'function');
};

const classOf = (instance: object): PdfmakeClass => (Object.getPrototypeOf(instance) as { constructor: PdfmakeClass }).constructor;

/**
 * Finds the document, text-measurer and renderer classes inside pdfmake's browser build by making
 * a one-line document with it (module comment). The progress callback is cleared afterwards. Throws
 * when one is not found (a pdfmake this code was not written for).
 */
export async function findBundledClasses(pdfMake: PdfmakeBundle): Promise<PdfmakeClasses> {
  const found: { renderer?: object; measurer?: object } = {};
  const forEach = Array.prototype.forEach;
  function noticingForEach(this: unknown[], callback: (value: unknown, index: number, array: unknown[]) => void, thisArg?: unknown): void {
    if (!found.measurer && methods(thisArg, 'measure', 'widthOfText', 'buildInlines', 'sizeOfText')) found.measurer = thisArg;
    forEach.call(this, callback, thisArg);
  }
  pdfMake.setProgressCallback(function noticeRenderer(this: unknown) {
    if (!found.renderer && methods(this, 'renderPages', 'renderLine')) found.renderer = this;
  });
  let document: object;
  Array.prototype.forEach = noticingForEach as typeof forEach;
  try {
    document = await pdfMake.createPdf({ content: ['probe'] }).getStream();
  } finally {
    Array.prototype.forEach = forEach;
    pdfMake.setProgressCallback(undefined);
  }
  const { measurer, renderer } = found;
  if (!methods(document, 'provideFont', 'text') || !measurer || !renderer) {
    const missing = [!methods(document, 'provideFont', 'text') && 'document', !measurer && 'text measurer', !renderer && 'renderer'].filter(Boolean);
    throw new Error(`pdfmake's browser build did not show its ${missing.join(', ')} class: this version of pdfmake is not supported by core/report/pdfmake-classes.ts.`);
  }
  return { documentClass: classOf(document), textInlinesClass: classOf(measurer), rendererClass: classOf(renderer) };
}
