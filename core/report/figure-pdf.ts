/**
 * A chart of the report as PDF drawing operators, read from the SVG the recording canvas wrote
 * (svg-canvas.ts), so that the PDF draws it directly instead of through pdfmake's SVG reader.
 *
 * Why: pdfmake parses each SVG twice while measuring (size, then again to write the size back),
 * and its SVG reader parses it a third time and walks every element with the full SVG styling
 * machinery (inheritance, CSS lookups, a text layout per glyph): about 20 ms per chart, most of a
 * report's drawing time. The recording canvas writes a small, fixed subset, so it is read here with
 * a few regular expressions and written straight to PDF operators; the printed chart is the same
 * (same paths, colours, dashes, clips, fonts and glyph positions as pdfmake's SVG reader drew).
 *
 * The subset (anything else returns null, and the caller keeps the SVG): the root `<svg>` with
 * width, height and a `0 0 w h` viewBox; nested `<svg x y width height viewBox overflow="hidden">`
 * clipping viewports with a viewBox equal to their rectangle; `<path>` with absolute M, L, C, Q, A
 * (circular, unrotated) and Z, fill, fill-opacity, fill-rule, stroke, stroke-width, stroke-opacity,
 * stroke-dasharray, stroke-dashoffset, stroke-linecap, stroke-linejoin; `<text>` with x, y,
 * font-family, font-size, font-weight, fill, fill-opacity and a `matrix(…)` transform.
 *
 * Coordinates: the operators draw in the figure's own points, origin at its top left, y downwards
 * (the canvas's and the SVG's system); the caller maps that onto the page. Text needs the PDF's
 * fonts, so the glyphs come from the host (`FigurePdfHost.glyphs`); everything else is pure.
 *
 * @see ISO 32000-1:2008 (PDF 1.7) §8.4–8.5 (graphics state, path construction and painting), §9.4
 *      (text objects, Tm, TJ) and §8.10 (form XObjects); SVG 1.1 (W3C, 2011) §8.3 path data and
 *      Appendix F.6 (elliptical arc implementation notes).
 */

/** Glyphs of one run of text in one font, as the PDF's font writer encodes them. */
export interface FigureGlyphs {
  /** Resource name of the font (e.g. `F2`). */
  readonly font: string;
  /** Each glyph's code in the font, as hex digits. */
  readonly codes: readonly string[];
  /**
   * Each glyph's placement in thousandths of the font size: advance as drawn (with kerning), its
   * own advance width, and its offset from the pen position (y upwards).
   */
  readonly positions: readonly { readonly xAdvance: number; readonly advanceWidth: number; readonly xOffset: number; readonly yOffset: number }[];
}

/** What only the PDF writer can supply: encoded glyphs and graphics states. */
export interface FigurePdfHost {
  /** `text` set in `family` (bold or regular) as the PDF writer encodes it. */
  glyphs(family: string, bold: boolean, text: string): FigureGlyphs;
  /** Resource name of a graphics state with these opacities (0–1) for fills and strokes. */
  opacity(fill: number, stroke: number): string;
}

/**
 * First line of a figure program: `hingeline-figure 1 <width> <height>` (points). The program is
 * text, so that it travels in the document definition's image dictionary (which pdfmake passes on
 * as it is): PDF operators one group a line, and two kinds of lines the PDF writer completes —
 * `\u0001G <fill opacity> <stroke opacity>` for a graphics state, and
 * `\u0001T <family> <0|1 bold> <size> <a b c d e f> <x> <y> <text>` (tab-separated) for a text.
 */
export const FIGURE_PROGRAM = 'hingeline-figure 1';
const MARK = '\u0001';

/** Numbers in content: at most `digits` decimals, no "-0". */
function fixed(v: number, digits = 3): string {
  const f = 10 ** digits;
  const r = Math.round(v * f) / f;
  return Object.is(r, -0) ? '0' : String(r);
}

const NUMBER = /^-?(?:\d+\.?\d*|\.\d+)$/;

function decodeXml(text: string): string {
  return text.replace(/&(amp|lt|gt|quot|apos|#\d+|#x[0-9a-f]+);/gi, (_, e: string) => {
    switch (e.toLowerCase()) {
      case 'amp': return '&';
      case 'lt': return '<';
      case 'gt': return '>';
      case 'quot': return '"';
      case 'apos': return "'";
      default: return String.fromCodePoint(e[1] === 'x' || e[1] === 'X' ? parseInt(e.slice(2), 16) : Number(e.slice(1)));
    }
  });
}

/** A `#rrggbb` or `#rgb` colour as PDF components (0–1), or null. */
function rgb(colour: string): string | null {
  let hex = /^#([0-9a-f]{6})$/i.exec(colour)?.[1];
  const short = /^#([0-9a-f]{3})$/i.exec(colour)?.[1];
  if (short) hex = short.replace(/./g, (c) => c + c);
  if (!hex) return NAMED[colour.toLowerCase()] ?? null;
  return [0, 2, 4].map((i) => fixed(parseInt(hex.slice(i, i + 2), 16) / 255, 4)).join(' ');
}

const NAMED: Readonly<Record<string, string>> = { black: '0 0 0', white: '1 1 1' };

type Attributes = Record<string, string>;

const ATTRIBUTES = /\s*([a-zA-Z:-]+)="([^"]*)"/y;

function attributes(source: string): Attributes | null {
  const out: Attributes = {};
  ATTRIBUTES.lastIndex = 0;
  let at = 0;
  while (at < source.length) {
    ATTRIBUTES.lastIndex = at;
    const m = ATTRIBUTES.exec(source);
    if (!m) return source.slice(at).trim() === '' ? out : null;
    out[m[1]!] = decodeXml(m[2]!);
    at = ATTRIBUTES.lastIndex;
  }
  return out;
}

const ALLOWED: Readonly<Record<string, ReadonlySet<string>>> = {
  svg: new Set(['xmlns', 'x', 'y', 'width', 'height', 'viewBox', 'overflow']),
  path: new Set(['d', 'fill', 'fill-opacity', 'fill-rule', 'stroke', 'stroke-width', 'stroke-opacity', 'stroke-dasharray', 'stroke-dashoffset', 'stroke-linecap', 'stroke-linejoin']),
  text: new Set(['x', 'y', 'font-family', 'font-size', 'font-weight', 'fill', 'fill-opacity', 'transform']),
};

/** The canvas's painting state as last written, so that only changes are written. */
interface Paint {
  fill: string;
  stroke: string;
  width: string;
  cap: string;
  join: string;
  dash: string;
  /** Opacity of fills and strokes. */
  opacity: [number, number];
}

/**
 * Path data (absolute M, L, C, Q, A, Z) as PDF path operators, or null for anything else. Arcs
 * become cubic Béziers of at most a quarter turn each (SVG 1.1 F.6.5 centre parameterisation).
 */
export function pathOperators(d: string): string | null {
  const out: string[] = [];
  let x = 0;
  let y = 0;
  let startX = 0;
  let startY = 0;
  let at = 0;
  COMMAND.lastIndex = 0;
  for (let m = COMMAND.exec(d); m; m = COMMAND.exec(d)) {
    if (m.index !== at && d.slice(at, m.index).trim() !== '') return null;
    at = COMMAND.lastIndex;
    const command = m[1]!;
    const args = m[2]!.trim() === '' ? [] : m[2]!.trim().split(/[\s,]+/);
    if (!args.every((a) => NUMBER.test(a))) return null;
    if (command === 'Z' || command === 'z') {
      if (args.length > 0) return null;
      out.push('h');
      x = startX;
      y = startY;
      continue;
    }
    const arity = ARITY[command];
    if (arity === undefined || args.length === 0 || args.length % arity !== 0) return null;
    for (let k = 0; k < args.length; k += arity) {
      const a = args.slice(k, k + arity);
      // Pairs after a move are lines (SVG 1.1 §8.3.2).
      const kind = command === 'M' && k > 0 ? 'L' : command;
      if (kind === 'M' || kind === 'L') {
        out.push(`${a[0]} ${a[1]} ${kind === 'M' ? 'm' : 'l'}`);
        x = Number(a[0]);
        y = Number(a[1]);
        if (kind === 'M') {
          startX = x;
          startY = y;
        }
      } else if (kind === 'C') {
        out.push(`${a.join(' ')} c`);
        x = Number(a[4]);
        y = Number(a[5]);
      } else if (kind === 'Q') {
        const [qx, qy, ex, ey] = a.map(Number) as [number, number, number, number];
        out.push(`${fixed(x + (2 / 3) * (qx - x))} ${fixed(y + (2 / 3) * (qy - y))} ${fixed(ex + (2 / 3) * (qx - ex))} ${fixed(ey + (2 / 3) * (qy - ey))} ${fixed(ex)} ${fixed(ey)} c`);
        x = ex;
        y = ey;
      } else {
        const [rx, ry, rotation, large, sweep, ex, ey] = a.map(Number) as [number, number, number, number, number, number, number];
        if (rx !== ry || rotation !== 0) return null;
        out.push(...arcCurves(x, y, rx, large !== 0, sweep !== 0, ex, ey));
        x = ex;
        y = ey;
      }
    }
  }
  if (d.slice(at).trim() !== '') return null;
  return out.join(' ');
}

/** A path command and its arguments. */
const COMMAND = /([A-Za-z])([^A-Za-z]*)/g;
/** Numbers each absolute command takes (relative commands and the rest are not written by the canvas). */
const ARITY: Readonly<Record<string, number>> = { M: 2, L: 2, C: 6, Q: 4, A: 7 };

/** A circular SVG arc from (x0, y0) to (x1, y1) as cubic Bézier operators (SVG 1.1 F.6.5, F.6.6). */
function arcCurves(x0: number, y0: number, radius: number, large: boolean, sweep: boolean, x1: number, y1: number): string[] {
  if (x0 === x1 && y0 === y1) return [];
  if (radius === 0) return [`${fixed(x1)} ${fixed(y1)} l`];
  const dx = (x0 - x1) / 2;
  const dy = (y0 - y1) / 2;
  const d2 = dx * dx + dy * dy;
  // F.6.6: a radius too small to reach is scaled up until it just does.
  const r = Math.max(radius, Math.sqrt(d2));
  const root = Math.sqrt(Math.max(0, (r * r - d2) / d2)) * (large === sweep ? -1 : 1);
  const cx = (x0 + x1) / 2 + root * dy;
  const cy = (y0 + y1) / 2 - root * dx;
  const start = Math.atan2(y0 - cy, x0 - cx);
  let turn = Math.atan2(y1 - cy, x1 - cx) - start;
  if (sweep && turn < 0) turn += 2 * Math.PI;
  if (!sweep && turn > 0) turn -= 2 * Math.PI;
  const pieces = Math.max(1, Math.ceil(Math.abs(turn) / (Math.PI / 2) - 1e-9));
  const step = turn / pieces;
  const k = (4 / 3) * Math.tan(step / 4);
  const out: string[] = [];
  for (let p = 0; p < pieces; p++) {
    const a0 = start + p * step;
    const a1 = a0 + step;
    const [c0, s0, c1, s1] = [Math.cos(a0), Math.sin(a0), Math.cos(a1), Math.sin(a1)];
    const ex = p === pieces - 1 ? x1 : cx + r * c1;
    const ey = p === pieces - 1 ? y1 : cy + r * s1;
    out.push(`${fixed(cx + r * (c0 - k * s0))} ${fixed(cy + r * (s0 + k * c0))} ${fixed(cx + r * (c1 + k * s1))} ${fixed(cy + r * (s1 - k * c1))} ${fixed(ex)} ${fixed(ey)} c`);
  }
  return out;
}

/** An SVG dash array and offset as the PDF `d` operator ('' for a solid line), as SVG repeats an odd list. */
function dashOperator(array: string | undefined, offset: string | undefined): string | null {
  if (array === undefined || array === 'none') return '[] 0 d';
  const values = array.split(/[\s,]+/).filter((v) => v !== '').map(Number);
  if (values.some((v) => !Number.isFinite(v) || v < 0)) return null;
  const sum = values.reduce((a, b) => a + b, 0);
  if (values.length === 0 || sum === 0) return '[] 0 d';
  const list = values.length % 2 === 1 ? [...values, ...values] : values;
  return `[${list.map((v) => fixed(v)).join(' ')}] ${fixed(Number(offset ?? 0))} d`;
}

const CAPS: Readonly<Record<string, string>> = { butt: '0', round: '1', square: '2' };
const JOINS: Readonly<Record<string, string>> = { miter: '0', round: '1', bevel: '2' };

/** An opacity attribute as a number in 0–1 (1 when absent), or null when unreadable. */
function opacityOf(value: string | undefined): number | null {
  if (value === undefined) return 1;
  const v = Number(value);
  return Number.isFinite(v) ? Math.max(0, Math.min(1, v)) : null;
}

/**
 * Writes one text: the glyphs from the host, placed as pdfmake's SVG reader placed them (a text
 * matrix at the start, then one TJ with the kerning between glyphs); a glyph the shaper offsets
 * from the pen (a combining mark) gets a text matrix of its own.
 */
function textOperators(glyphs: FigureGlyphs, size: number, matrix: readonly number[], x: number, y: number): string {
  const [a, b, c, d, e, f] = matrix as [number, number, number, number, number, number];
  const scale = size / 1000;
  // The glyphs' y axis points up, the figure's down: the text matrix flips it back.
  const tm = (px: number, py: number) => `${fixed(a, 6)} ${fixed(b, 6)} ${fixed(-c, 6)} ${fixed(-d, 6)} ${fixed(a * px + c * py + e)} ${fixed(b * px + d * py + f)} Tm`;
  const out: string[] = [`BT /${glyphs.font} ${fixed(size)} Tf`];
  let run: string[] = [];
  let hex = '';
  const flush = () => {
    if (hex) run.push(`<${hex}> 0`);
    hex = '';
    if (run.length > 0) out.push(`[${run.join(' ')}] TJ`);
    run = [];
  };
  let pen = x;
  let place = true;
  glyphs.positions.forEach((p, i) => {
    const offset = p.xOffset !== 0 || p.yOffset !== 0;
    if (place || offset) {
      flush();
      out.push(tm(pen + p.xOffset * scale, y - p.yOffset * scale));
    }
    hex += glyphs.codes[i]!;
    if (offset) {
      flush();
      place = true;
    } else {
      place = false;
      const kern = p.advanceWidth - p.xAdvance;
      if (kern !== 0) {
        run.push(`<${hex}> ${fixed(kern)}`);
        hex = '';
      }
    }
    pen += p.xAdvance * scale;
  });
  flush();
  out.push('ET');
  return out.join(' ');
}

/**
 * The chart `svg` (as the recording canvas writes it) as a figure program (see FIGURE_PROGRAM), or
 * null when it holds anything outside the subset in the module comment.
 */
export function figureProgram(svg: string): string | null {
  const tags = /<(\/?)([a-z]+)((?:\s+[a-zA-Z:-]+="[^"]*")*)\s*(\/?)>|([^<]+)/y;
  const out: string[] = [];
  const paint: Paint = { fill: '', stroke: '', width: '', cap: '', join: '', dash: '', opacity: [1, 1] };
  const saved: Paint[] = [];
  let depth = 0;
  let end = 0;
  let size: { width: number; height: number } | null = null;
  let text: { attrs: Attributes; content: string } | null = null;
  let done = false;
  for (let m = tags.exec(svg); m; m = tags.exec(svg)) {
    end = tags.lastIndex;
    const [, closing, name, rawAttributes, selfClosing, characters] = m;
    if (characters !== undefined) {
      if (text) text.content += characters;
      else if (characters.trim() !== '') return null;
      continue;
    }
    if (done || (text && !(closing && name === 'text'))) return null;
    if (closing) {
      if (name === 'svg' && depth > 0) {
        depth -= 1;
        if (depth === 0) done = true;
        else {
          out.push('Q');
          Object.assign(paint, saved.pop());
        }
      } else if (name === 'text' && text) {
        if (!writeText(text.attrs, text.content, paint, out)) return null;
        text = null;
      } else return null;
      continue;
    }
    const allowed = ALLOWED[name!];
    const attrs = allowed ? attributes(rawAttributes!) : null;
    if (!allowed || !attrs || Object.keys(attrs).some((k) => !allowed.has(k))) return null;
    if (name === 'svg') {
      const width = Number(attrs.width);
      const height = Number(attrs.height);
      if (selfClosing || !(width >= 0) || !(height >= 0)) return null;
      const box = attrs.viewBox?.split(/[\s,]+/).map(Number).join(' ');
      if (depth === 0) {
        if (box !== undefined && box !== `0 0 ${width} ${height}`) return null;
        size = { width, height };
      } else {
        // A clip: a viewport whose viewBox is its own rectangle, so nothing moves or scales.
        const x = Number(attrs.x ?? 0);
        const y = Number(attrs.y ?? 0);
        if (!Number.isFinite(x) || !Number.isFinite(y) || attrs.overflow !== 'hidden' || box !== `${x} ${y} ${width} ${height}`) return null;
        saved.push({ ...paint });
        out.push(`q ${fixed(x)} ${fixed(y)} ${fixed(width)} ${fixed(height)} re W n`);
      }
      depth += 1;
    } else if (depth === 0) {
      return null;
    } else if (name === 'text') {
      if (!selfClosing) text = { attrs, content: '' };
    } else if (!selfClosing || !writePath(attrs, paint, out)) {
      return null;
    }
  }
  if (!done || !size || svg.slice(end).trim() !== '') return null;
  return [`${FIGURE_PROGRAM} ${size.width} ${size.height}`, ...out].join('\n');
}

/** Writes a graphics-state line when the opacity of fills or strokes (null: either will do) changes. */
function setOpacity(paint: Paint, out: string[], fill: number | null, stroke: number | null): void {
  const next: [number, number] = [fill ?? paint.opacity[0], stroke ?? paint.opacity[1]];
  if (next[0] === paint.opacity[0] && next[1] === paint.opacity[1]) return;
  out.push(`${MARK}G\t${next[0]}\t${next[1]}`);
  paint.opacity = next;
}

/** Appends one path's operators to `out`; false when it is outside the subset. */
function writePath(attrs: Attributes, paint: Paint, out: string[]): boolean {
  const path = pathOperators(attrs.d ?? '');
  if (path === null) return false;
  // SVG's defaults: fill black, no stroke, width 1, butt caps, miter joins with a limit of 4.
  const fillColour = attrs.fill ?? '#000000';
  const strokeColour = attrs.stroke ?? 'none';
  const fill = fillColour === 'none' ? null : rgb(fillColour);
  const stroke = strokeColour === 'none' ? null : rgb(strokeColour);
  if ((fill === null && fillColour !== 'none') || (stroke === null && strokeColour !== 'none')) return false;
  const fillOpacity = opacityOf(attrs['fill-opacity']);
  const strokeOpacity = opacityOf(attrs['stroke-opacity']);
  if (fillOpacity === null || strokeOpacity === null) return false;
  if (path === '' || (!fill && !stroke)) return true;
  const ops: string[] = [];
  if (stroke) {
    const width = Number(attrs['stroke-width'] ?? 1);
    const cap = CAPS[attrs['stroke-linecap'] ?? 'butt'];
    const join = JOINS[attrs['stroke-linejoin'] ?? 'miter'];
    const dash = dashOperator(attrs['stroke-dasharray'], attrs['stroke-dashoffset']);
    if (!(width >= 0) || cap === undefined || join === undefined || dash === null) return false;
    if (paint.stroke !== stroke) ops.push(`${stroke} RG`);
    if (paint.width !== fixed(width)) ops.push(`${fixed(width)} w`);
    if (paint.cap !== cap) ops.push(`${cap} J`);
    if (paint.join !== join) ops.push(`${join} j${paint.join === '' ? ' 4 M' : ''}`);
    if (paint.dash !== dash) ops.push(dash);
    Object.assign(paint, { stroke, width: fixed(width), cap, join, dash });
  }
  if (fill && paint.fill !== fill) {
    ops.push(`${fill} rg`);
    paint.fill = fill;
  }
  setOpacity(paint, out, fill ? fillOpacity : null, stroke ? strokeOpacity : null);
  const evenOdd = attrs['fill-rule'] === 'evenodd' ? '*' : '';
  ops.push(path, fill && stroke ? `B${evenOdd}` : fill ? `f${evenOdd}` : 'S');
  out.push(ops.join(' '));
  return true;
}

/** Appends one text's line (completed by the PDF writer) to `out`; false when it is outside the subset. */
function writeText(attrs: Attributes, content: string, paint: Paint, out: string[]): boolean {
  // SVG's default white space handling: runs collapse to one space, none at either end.
  const value = decodeXml(content).replace(/\s+/g, ' ').trim();
  const x = Number(attrs.x ?? 0);
  const y = Number(attrs.y ?? 0);
  const size = Number(attrs['font-size'] ?? 16);
  const weight = attrs['font-weight'] ?? 'normal';
  const opacity = opacityOf(attrs['fill-opacity']);
  if (!Number.isFinite(x) || !Number.isFinite(y) || !(size > 0) || (weight !== 'bold' && weight !== 'normal') || opacity === null) return false;
  let matrix = '1 0 0 1 0 0';
  if (attrs.transform !== undefined) {
    const values = /^matrix\(([^)]*)\)$/.exec(attrs.transform.trim())?.[1]!.trim().split(/[\s,]+/).map(Number);
    if (!values || values.length !== 6 || !values.every(Number.isFinite)) return false;
    matrix = values.join(' ');
  }
  if (attrs.fill === 'none') return true;
  const fill = rgb(attrs.fill ?? '#000000');
  if (fill === null) return false;
  if (value === '') return true;
  const family = (attrs['font-family'] ?? '').split(',')[0]!.trim().replace(/^['"]|['"]$/g, '');
  if (paint.fill !== fill) {
    out.push(`${fill} rg`);
    paint.fill = fill;
  }
  setOpacity(paint, out, opacity, null);
  out.push([`${MARK}T`, family, weight === 'bold' ? '1' : '0', size, matrix, x, y, value].join('\t'));
  return true;
}

/** Size (points) and PDF operators of a figure program, with its text and graphics states completed by `host`. */
export function figureContent(program: string, host: FigurePdfHost): { readonly width: number; readonly height: number; readonly content: string } {
  const lines = program.split('\n');
  const head = lines[0]!.split(' ');
  if (`${head[0]} ${head[1]}` !== FIGURE_PROGRAM) throw new Error('not a figure program');
  const content = lines.slice(1).map((line) => {
    if (!line.startsWith(MARK)) return line;
    const parts = line.slice(2).split('\t');
    if (line[1] === 'G') return `/${host.opacity(Number(parts[1]), Number(parts[2]))} gs`;
    const [, family, bold, size, matrix, x, y, text] = parts as [string, string, string, string, string, string, string, string];
    return textOperators(host.glyphs(family, bold === '1', text), Number(size), matrix.split(' ').map(Number), Number(x), Number(y));
  });
  return { width: Number(head[2]), height: Number(head[3]), content: content.join('\n') };
}
