/**
 * pdfmake writes every word of a laid-out line as its own PDF text object (its renderer has a
 * "lines without differently styled inlines should be written to pdf as one stream" to-do), and
 * each costs a colour, a font, a text matrix and a second measurement of the word in PDFKit. On
 * the report's tables and left-aligned text that is most of pdfmake's writing time.
 *
 * `installLineMerging` wraps pdfmake's `Renderer.renderLine` so that neighbouring words of one line
 * that print exactly alike — same font object, size, colour and opacity, no links, page references,
 * decorations, backgrounds, font features, character spacing, superscript or subscript, and the
 * second starting exactly where the first ends (so never the words of a justified line, which are
 * spread apart) — are written as one text object. The glyphs and their positions are the same:
 * PDFKit lays a string out word by word (it splits at spaces and caches each word's run), and a
 * word's advance is the width pdfmake placed the next word by. Only the number of text objects in
 * the page content changes.
 *
 * This is the one place that reaches into pdfmake's renderer; test/core/report/pdfmake-lines.test.ts
 * (pdfmake/js) and test/app/report/pdfmake-classes.test.ts (the browser build) fail if the renderer's
 * `renderLine` no longer reads the inline fields listed here, or changes at all (a digest).
 * pdfmake is not imported here: the host passes the renderer class it uses.
 */
import { originalMethod, replaceMethodOnce } from './pdfmake-patch.ts';

/** The fields of a pdfmake inline (a measured piece of text on a line) read here and by renderLine. */
export interface LineInline {
  text: string;
  x: number;
  width: number;
  height?: number;
  font?: unknown;
  fontSize?: number;
  color?: unknown;
  opacity?: unknown;
  characterSpacing?: number;
  fontFeatures?: unknown;
  link?: unknown;
  linkToPage?: unknown;
  linkToDestination?: unknown;
  decoration?: unknown;
  background?: unknown;
  sup?: unknown;
  sub?: unknown;
  justifyShift?: number;
  _pageNodeRef?: unknown;
  [other: string]: unknown;
}

/** How far apart (points) the end of one word and the start of the next may be and still be one run. */
const TOUCHING = 1e-6;

const absent = (v: unknown): boolean => v === undefined || v === null || v === false || v === 0;

/** True when `inline` prints on its own terms only: nothing that ties it to its own box. */
function plain(inline: LineInline): boolean {
  return absent(inline.characterSpacing) && absent(inline.fontFeatures) && absent(inline.link) && absent(inline.linkToPage)
    && absent(inline.linkToDestination) && absent(inline.decoration) && absent(inline.background) && absent(inline.sup)
    && absent(inline.sub) && inline._pageNodeRef === undefined && typeof inline.text === 'string';
}

/** True when `next` can be written in the same text object as `run`, right after it. */
function joins(run: LineInline, next: LineInline): boolean {
  return plain(next) && absent(next.justifyShift) && next.font === run.font && next.fontSize === run.fontSize
    && next.color === run.color && (next.opacity ?? 1) === (run.opacity ?? 1) && Math.abs(next.x - (run.x + run.width)) <= TOUCHING;
}

/**
 * The inlines of a line with neighbours that print alike joined into runs (new objects; the inputs
 * are not changed). Returns the same array when nothing joins.
 */
export function mergeLineInlines<T extends LineInline>(inlines: readonly T[]): readonly T[] {
  if (inlines.length < 2) return inlines;
  let out: T[] | null = null;
  let run: T = inlines[0]!;
  let runIsCopy = false;
  for (let i = 1; i < inlines.length; i++) {
    const next = inlines[i]!;
    if (plain(run) && joins(run, next)) {
      if (!out) out = inlines.slice(0, i - 1) as T[];
      if (!runIsCopy) {
        run = { ...run };
        runIsCopy = true;
      }
      run.text += next.text;
      run.width = next.x + next.width - run.x;
      run.height = Math.max(run.height ?? 0, next.height ?? 0);
      continue;
    }
    if (out) out.push(run);
    run = next;
    runIsCopy = false;
  }
  if (!out) return inlines;
  out.push(run);
  return out;
}

/** The part of pdfmake's renderer used here. */
interface RendererPrototype {
  renderLine(line: { inlines: LineInline[] }, x: number, y: number): unknown;
}

const ORIGINAL = Symbol.for('hingeline.pdfmake.renderLine.original');

type RenderLine = RendererPrototype['renderLine'];

/** pdfmake's own `renderLine` on `rendererClass` (also after installing), for tests and checks. */
export function originalLineRendering(rendererClass: { readonly prototype: object }): RenderLine {
  return originalMethod<RenderLine>(rendererClass, 'renderLine', ORIGINAL);
}

/**
 * Makes pdfmake's renderer write neighbouring words that print alike as one text object. Idempotent
 * per renderer class. The line itself is not changed: the renderer is given a view of it whose
 * `inlines` are the merged runs.
 */
export function installLineMerging(rendererClass: { readonly prototype: object }): void {
  replaceMethodOnce<RenderLine>(rendererClass, 'renderLine', ORIGINAL, (original) => function renderMergedLine(this: unknown, line, x, y) {
    const merged = mergeLineInlines(line.inlines);
    if (merged === line.inlines) return original.call(this, line, x, y);
    const view = Object.create(line) as typeof line;
    view.inlines = merged as LineInline[];
    return original.call(this, view, x, y);
  }, 'pdfmake\'s renderer has no renderLine method: this version of pdfmake is not supported by core/report/pdfmake-lines.ts.');
}
