/**
 * pdfmake measures every inline (a word or run of a text node) by asking its style stack for 21
 * style properties one at a time (`StyleContextStack.getStyleProperty`), and each question pushes
 * the inline's own style onto the stack, builds a closure, walks the stack and pops again. On the
 * report, whose tables hold thousands of distinct short inlines, that bookkeeping cost more than
 * measuring the text itself (text-only 30-member report: 5.0–5.7 s CPU with pdfmake's own
 * `TextInlines.measure`, 3.3–3.7 s with this one, same PDF bytes; load average 28 on 2 cores).
 *
 * `installInlineMeasuring` replaces `TextInlines.prototype.measure` with one that pushes each
 * inline's style once and reads all the properties under it. The values are the same: an inline's
 * own property wins, otherwise the stack's answer with the inline's style pushed, otherwise
 * pdfmake's default — exactly what `getStyleProperty` returns — and the properties are read in
 * pdfmake's order with pdfmake's defaults (`MEASURED_PROPERTIES`). Widths come from pdfmake's own
 * `widthOfText`.
 *
 * This is the one place that replaces a pdfmake text-measuring method;
 * test/app/report/pdfmake-measure.test.ts fails if pdfmake's `measure` no longer reads exactly
 * these properties with these defaults in this order, or if its body changes at all.
 * pdfmake is not imported here: the host passes the classes it uses.
 */
import { originalMethod, replaceMethodOnce } from './pdfmake-patch.ts';

/** The parts of pdfmake's style stack used here. */
export interface StyleStack {
  autopush(item: object): number;
  pop(count: number): void;
  getProperty(property: string): unknown;
}

/** The parts of pdfmake's text measurer used here. */
interface TextMeasurer {
  readonly pdfDocument: { provideFont(family: unknown, bold: unknown, italics: unknown): { lineHeight(size: number): number } };
  widthOfText(text: string, inline: Inline): number;
}

/** A pdfmake inline while it is measured (its style fields are filled in here). */
type Inline = Record<string, unknown> & { text: string };

type Measure = (this: TextMeasurer, inlines: Inline[], stack: StyleStack | undefined) => Inline[];

/**
 * The style properties pdfmake's `TextInlines.measure` reads for each inline, in its order, with
 * its defaults (pdfmake 0.3, js/TextInlines.js). `leadingIndent` is read for the first inline only.
 */
export const MEASURED_PROPERTIES: ReadonlyArray<readonly [string, unknown]> = [
  ['leadingIndent', 0],
  ['font', 'Roboto'], ['bold', false], ['italics', false], ['alignment', 'left'], ['fontSize', 12],
  ['fontFeatures', null], ['characterSpacing', 0], ['color', 'black'], ['decoration', null],
  ['decorationColor', null], ['decorationStyle', null], ['decorationThickness', null], ['background', null],
  ['link', null], ['linkToPage', null], ['linkToDestination', null], ['noWrap', null], ['opacity', 1],
  ['sup', false], ['sub', false], ['lineHeight', 1], ['preserveLeadingSpaces', false], ['preserveTrailingSpaces', false],
];

const LEADING = /^(\s)+/g;
const TRAILING = /(\s)+$/g;
const isValue = (v: unknown): boolean => v !== undefined && v !== null;

/**
 * Reads one property of an inline as pdfmake's `getStyleProperty` answers it with the inline's style
 * pushed. `stackAnswer` is what the stack answers for the property at that moment.
 */
function readWith(inline: Inline, property: string, fallback: unknown, stackAnswer: (property: string) => unknown): unknown {
  const own = inline[property];
  if (isValue(own)) return own;
  const value = stackAnswer(property);
  return isValue(value) ? value : fallback;
}

/**
 * True when pushing `inline` onto the style stack adds nothing but the inline's own properties, which
 * `readWith` takes first: then the stack answers every other property as it does beneath the inline.
 * pdfmake's `autopush` pushes the inline's named styles (`style`) and then the inline itself.
 */
const ownPropertiesOnly = (inline: Inline): boolean => inline.style === undefined || inline.style === null || inline.style === '' || (Array.isArray(inline.style) && inline.style.length === 0);

const measure: Measure = function measure(this: TextMeasurer, inlines, stack) {
  // The stack's answers beneath this call's inlines, asked once per property (measuring pushes and
  // pops only the inlines' own styles, so the stack beneath stays as it is for the whole call).
  // Most inlines are words of one text node without named styles of their own: pushing each and
  // asking the stack for every property walked the whole stack ~22 times per word.
  const beneath = new Map<string, unknown>();
  const answerBeneath = (property: string): unknown => {
    if (!stack) return undefined;
    if (beneath.has(property)) return beneath.get(property);
    const value = stack.getProperty(property);
    beneath.set(property, value);
    return value;
  };
  const answerPushed = (property: string): unknown => stack?.getProperty(property);
  const styled = (item: Inline): boolean => stack !== undefined && !ownPropertiesOnly(item);
  if (inlines.length > 0) {
    const first = inlines[0]!;
    const pushed = styled(first) ? stack!.autopush(first) : 0;
    const leadingIndent = readWith(first, 'leadingIndent', 0, pushed > 0 ? answerPushed : answerBeneath) as number;
    if (pushed > 0) stack!.pop(pushed);
    if (leadingIndent) {
      first.leadingCut = -leadingIndent;
      first.leadingIndent = leadingIndent;
    }
  }
  for (const item of inlines) {
    const pushed = styled(item) ? stack!.autopush(item) : 0;
    const answer = pushed > 0 ? answerPushed : answerBeneath;
    const read = (property: string, fallback: unknown): unknown => readWith(item, property, fallback, answer);
    try {
      const font = read('font', 'Roboto');
      const bold = read('bold', false);
      const italics = read('italics', false);
      const provided = this.pdfDocument.provideFont(font, bold, italics);
      item.font = provided;
      item.alignment = read('alignment', 'left');
      item.fontSize = read('fontSize', 12);
      item.fontFeatures = read('fontFeatures', null);
      item.characterSpacing = read('characterSpacing', 0);
      item.color = read('color', 'black');
      item.decoration = read('decoration', null);
      item.decorationColor = read('decorationColor', null);
      item.decorationStyle = read('decorationStyle', null);
      item.decorationThickness = read('decorationThickness', null);
      item.background = read('background', null);
      item.link = read('link', null);
      item.linkToPage = read('linkToPage', null);
      item.linkToDestination = read('linkToDestination', null);
      item.noWrap = read('noWrap', null);
      item.opacity = read('opacity', 1);
      item.sup = read('sup', false);
      item.sub = read('sub', false);
      if (item.sup || item.sub) item.fontSize = (item.fontSize as number) * 0.58;
      const lineHeight = read('lineHeight', 1) as number;
      item.width = this.widthOfText(item.text, item);
      item.height = provided.lineHeight(item.fontSize as number) * lineHeight;
      if (!item.leadingCut) item.leadingCut = 0;
      if (!read('preserveLeadingSpaces', false)) {
        const spaces = item.text.match(LEADING);
        if (spaces) item.leadingCut = (item.leadingCut as number) + this.widthOfText(spaces[0]!, item);
      }
      item.trailingCut = 0;
      if (!read('preserveTrailingSpaces', false)) {
        const spaces = item.text.match(TRAILING);
        if (spaces) item.trailingCut = this.widthOfText(spaces[0]!, item);
      }
    } finally {
      if (pushed > 0) stack!.pop(pushed);
    }
  }
  return inlines;
};

const ORIGINAL = Symbol.for('hingeline.pdfmake.measure.original');

/** pdfmake's own `measure` on `textInlinesClass` (also after installing), for tests and checks. */
export function originalInlineMeasuring(textInlinesClass: { readonly prototype: object }): Measure {
  return originalMethod<Measure>(textInlinesClass, 'measure', ORIGINAL);
}

/** Replaces pdfmake's `TextInlines.prototype.measure` (once; a second call changes nothing). */
export function installInlineMeasuring(textInlinesClass: { readonly prototype: object }): void {
  replaceMethodOnce<Measure>(textInlinesClass, 'measure', ORIGINAL, () => measure, 'pdfmake has no TextInlines.prototype.measure to replace (has pdfmake changed?)');
}
