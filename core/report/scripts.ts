/**
 * Text in scripts the report font does not cover (Hebrew, Arabic, emoji in member and section names),
 * and right-to-left text.
 *
 * pdfmake draws each text piece in one font and has no bidirectional layout. So every string is cut
 * into pieces, in the order they appear on the page from left to right:
 *  - each character goes to the first font of the set that has a glyph for it (the report font first,
 *    then the fallbacks), spaces and punctuation staying with the piece around them;
 *  - the Unicode Bidirectional Algorithm (UAX #9, through bidi-js) gives the visual order; a run of
 *    right-to-left letters stays one piece in logical order, because the PDF library's shaper
 *    (fontkit) joins Arabic letters and reverses a right-to-left piece itself; brackets in
 *    right-to-left runs are mirrored.
 * Limitation: the order is computed for the whole string, before pdfmake breaks lines, which is
 * right for names, labels and single lines (all this applies to); a long right-to-left paragraph
 * that wraps would keep its lines in the wrong order.
 */
import bidiFactory from 'bidi-js';
import type { FontMetrics } from './font-metrics.ts';

/** A font family of the report with the metrics of its regular and bold faces. */
export interface FontFamilyMetrics {
  /** Family name, as in the pdfmake font dictionary and the SVG `font-family`. */
  readonly family: string;
  readonly normal: FontMetrics;
  readonly bold: FontMetrics;
}

/** The report font first, then the fallbacks in order of preference. */
export interface ReportFontSet {
  readonly primary: FontFamilyMetrics;
  readonly fallbacks: readonly FontFamilyMetrics[];
}

/** One piece of text in one font; pieces are listed from left to right on the page. */
export interface TextPiece {
  readonly text: string;
  readonly family: string;
  /** A right-to-left run, in logical order (the shaper reverses it when drawing). */
  readonly rightToLeft: boolean;
}

let bidi: ReturnType<typeof bidiFactory> | null = null;

/** Letters of right-to-left scripts: Hebrew, Arabic, Syriac, Thaana, N'Ko and their presentation forms. */
const RTL_LETTER = /[\u0590-\u08FF\uFB1D-\uFDFF\uFE70-\uFEFF]|\uD802[\uDC00-\uDFFF]|\uD803[\uDC00-\uDE7F]|\uD83A[\uDC00-\uDFFF]/;
/** Characters that never start a cluster: marks, joiners, variation selectors, emoji modifiers, keycap. */
const CLUSTER_TAIL = /^(?:\p{M}|\u200D|[\uFE00-\uFE0F]|\uD83C[\uDFFB-\uDFFF]|\u20E3|\uDB40[\uDC20-\uDC7F])$/u;
/** Characters that may stay in the font of the piece around them. */
const NEUTRAL = /^[\s\p{P}\p{S}\p{N}]$/u;

/** Quick test: printable ASCII, which every report font covers. Anything else is looked up in the font's character map. */
const PLAIN = /^[\u0020-\u007E]*$/;
/** Characters a font needs no glyph for: joiners, variation selectors, tag characters (emoji sequences). */
const INVISIBLE = /^(?:\u200D|[\uFE00-\uFE0F]|\uDB40[\uDC20-\uDC7F])$/;

interface Cluster {
  readonly text: string;
  readonly start: number;
  level: number;
}

function clusters(text: string): Cluster[] {
  const out: Cluster[] = [];
  for (const char of text) {
    const last = out[out.length - 1];
    // A zero-width joiner glues the next character too (emoji sequences).
    if (last && (CLUSTER_TAIL.test(char) || last.text.endsWith('\u200D'))) {
      out[out.length - 1] = { text: last.text + char, start: last.start, level: last.level };
    } else {
      out.push({ text: char, start: last ? last.start + last.text.length : 0, level: 0 });
    }
  }
  return out;
}

/** Clusters in visual order (UAX #9 rule L2), levels from bidi-js. */
function visualOrder(text: string, list: Cluster[]): Cluster[] {
  bidi ??= bidiFactory();
  const { levels } = bidi.getEmbeddingLevels(text, 'ltr');
  for (const c of list) c.level = levels[c.start]!;
  const order = [...list];
  const highest = Math.max(...order.map((c) => c.level));
  for (let level = highest; level >= 1; level--) {
    for (let i = 0; i < order.length; ) {
      if (order[i]!.level < level) {
        i++;
        continue;
      }
      let j = i;
      while (j < order.length && order[j]!.level >= level) j++;
      const reversed = order.slice(i, j).reverse();
      order.splice(i, j - i, ...reversed);
      i = j;
    }
  }
  return order;
}

function mirrored(char: string): string {
  bidi ??= bidiFactory();
  return bidi.getMirroredCharacter(char) ?? char;
}

/**
 * The pieces of `text` from left to right (see the module comment). Text the report font covers and
 * that has no right-to-left letters comes back as one piece.
 */
export function textPieces(text: string, fonts: ReportFontSet, bold = false): TextPiece[] {
  const primary = fonts.primary.family;
  const covers = (face: FontFamilyMetrics, cluster: string) => {
    const metrics = bold ? face.bold : face.normal;
    // Combining marks count: a letter with a mark the font lacks would print with an empty box.
    for (const char of cluster) if (!INVISIBLE.test(char) && !metrics.has(char.codePointAt(0)!)) return false;
    return true;
  };
  if (text === '' || PLAIN.test(text) || (!RTL_LETTER.test(text) && covers(fonts.primary, text))) return [{ text, family: primary, rightToLeft: false }];
  const faces = [fonts.primary, ...fonts.fallbacks];
  const familyOf = (cluster: string, current: string | null): string => {
    // Spaces, digits and punctuation: the report font where it has them, else the piece's own font.
    if (current !== null && NEUTRAL.test(cluster) && !covers(fonts.primary, cluster)) {
      const face = faces.find((f) => f.family === current);
      if (face && covers(face, cluster)) return current;
    }
    return (faces.find((f) => covers(f, cluster)) ?? fonts.primary).family;
  };
  const list = clusters(text);
  const hasRtl = RTL_LETTER.test(text);
  const order = hasRtl ? visualOrder(text, list) : list;
  const pieces: { text: string; family: string; rightToLeft: boolean; lastStart: number }[] = [];
  for (const cluster of order) {
    const rtlLetter = hasRtl && cluster.level % 2 === 1 && RTL_LETTER.test(cluster.text);
    const last = pieces[pieces.length - 1];
    if (rtlLetter) {
      // Right-to-left letters that follow each other in the text stay one piece in logical order.
      if (last && last.rightToLeft && cluster.start + cluster.text.length === last.lastStart && covers(faces.find((f) => f.family === last.family)!, cluster.text)) {
        last.text = cluster.text + last.text;
        last.lastStart = cluster.start;
      } else {
        pieces.push({ text: cluster.text, family: familyOf(cluster.text, null), rightToLeft: true, lastStart: cluster.start });
      }
      continue;
    }
    const char = cluster.level % 2 === 1 ? mirrored(cluster.text) : cluster.text;
    const family = familyOf(char, last && !last.rightToLeft ? last.family : null);
    if (last && !last.rightToLeft && last.family === family) last.text += char;
    else pieces.push({ text: char, family, rightToLeft: false, lastStart: cluster.start });
  }
  return pieces.map(({ text: t, family, rightToLeft }) => ({ text: t, family, rightToLeft }));
}

/** Width of `text` in em in the given fonts (the fonts' advances, without kerning). */
export function textWidth(text: string, fonts: ReportFontSet, bold = false): number {
  let width = 0;
  for (const piece of textPieces(text, fonts, bold)) {
    const face = [fonts.primary, ...fonts.fallbacks].find((f) => f.family === piece.family) ?? fonts.primary;
    const metrics = bold ? face.bold : face.normal;
    for (const char of piece.text) if (!CLUSTER_TAIL.test(char)) width += metrics.advance(char.codePointAt(0)!);
  }
  return width;
}

// --- the document definition --------------------------------------------------------------------

type Node = { [key: string]: unknown };

/** Inline pieces of a string, or null when it needs no other font and no reordering. */
/**
 * Right-to-left text up to this length is kept on one line (its spaces become no-break spaces): its
 * visual order is computed for the whole string, so a line break would put its words on the wrong
 * lines. Longer text may wrap (see the limitation above).
 */
export const RTL_NO_WRAP_LENGTH = 60;

function inlinePieces(text: string, fonts: ReportFontSet): Node[] | null {
  if (PLAIN.test(text)) return null;
  const pieces = textPieces(text, fonts);
  if (pieces.length === 1 && pieces[0]!.family === fonts.primary.family && !pieces[0]!.rightToLeft) return null;
  const noWrap = text.length <= RTL_NO_WRAP_LENGTH && pieces.some((p) => p.rightToLeft);
  return pieces.map((p) => ({ text: noWrap ? p.text.replace(/ /g, '\u00A0') : p.text, ...(p.family === fonts.primary.family ? {} : { font: p.family }), ...(noWrap ? { noWrap: true } : {}) }));
}

function textValue(value: unknown, fonts: ReportFontSet): unknown {
  if (typeof value === 'string') return inlinePieces(value, fonts) ?? value;
  if (Array.isArray(value)) return value.flatMap((item) => (typeof item === 'string' ? (inlinePieces(item, fonts) ?? [item]) : [withFonts(item, fonts)]));
  return withFonts(value, fonts);
}

/** Keys whose values hold content (strings there are text). */
const CONTENT_KEYS = new Set(['stack', 'columns', 'ul', 'ol']);

/**
 * A copy of a pdfmake content tree in which every text that the report font does not cover, or that
 * holds right-to-left letters, is split into inline pieces with their fonts, in visual order
 * (`textPieces`). Everything else is returned as it is (same objects where nothing changes).
 */
export function withFonts<T>(content: T, fonts: ReportFontSet): T {
  if (typeof content === 'string') {
    const pieces = inlinePieces(content, fonts);
    return (pieces ? { text: pieces } : content) as T;
  }
  if (Array.isArray(content)) return content.map((item) => withFonts(item, fonts)) as T;
  if (content === null || typeof content !== 'object') return content;
  const node = content as Node;
  let copy: Node | null = null;
  const set = (key: string, value: unknown) => {
    if (value === node[key]) return;
    copy ??= { ...node };
    copy[key] = value;
  };
  if ('text' in node) set('text', textValue(node.text, fonts));
  for (const key of CONTENT_KEYS) if (key in node) set(key, withFonts(node[key], fonts));
  if (node.table && typeof node.table === 'object') {
    const table = node.table as Node;
    if (Array.isArray(table.body)) {
      const body = table.body.map((row: unknown) => (Array.isArray(row) ? row.map((cell) => withFonts(cell, fonts)) : row));
      if (body.some((row: unknown, i: number) => Array.isArray(row) && (row as unknown[]).some((cell, j) => cell !== (table.body as unknown[][])[i]![j]))) set('table', { ...table, body });
    }
  }
  return (copy ?? node) as T;
}
