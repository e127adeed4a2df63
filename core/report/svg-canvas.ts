/**
 * A recording 2D canvas for the report's charts: chart.js draws on it exactly as on a screen canvas
 * (through the same `toChartJsConfig`), and it writes what was drawn as a small SVG document that
 * pdfmake embeds as vectors. The same code runs in Node (the command line) and in the browser's
 * report worker, so the app and the command line print identical charts.
 *
 * Why not the canvas libraries' own SVG output: a dashed line came out as hundreds of filled
 * polygons and every element carried its own clip path (30 kB per chart, ~30 ms each in pdfmake's
 * SVG reader). Here a dashed line stays one path with `stroke-dasharray`, stroked lines with the same
 * style that follow each other become one path, and a clip is written only when a drawing reaches
 * outside it (chart.js clips to the plot area while drawing the data).
 *
 * What cannot be seen is not written, and what is drawn twice is written once: a fill of a path
 * without area (chart.js fills its cross markers, which are bare lines) is left out; a fill followed
 * by a stroke of the same path is one element with both paints (SVG paints the fill first, as the
 * canvas did); a polyline's points closer than `SIMPLIFY_TOLERANCE` (0.05 pt, far below what
 * print resolves) to the straight line their neighbours span are dropped — every dropped point is
 * checked against the segment that replaces it, so the drawn line never moves by more than that.
 * pdfmake reads each element and each path point of the SVG again for every page it draws, so these
 * are most of its time on a chart besides the text.
 *
 * A clip is written as a nested `<svg>` viewport around the elements it applies to (consecutive
 * elements with the same clip share one), not as a `clip-path`: pdfmake's SVG reader draws a
 * `clip-path` as a transparency group with a soft mask (a form, a mask and their streams per
 * element), but a nested viewport as a plain clipping rectangle. The printed chart is the same.
 *
 * Supported: the subset of CanvasRenderingContext2D that chart.js 4 and the overlay plugin use —
 * paths (moveTo, lineTo, rect, arc, bezierCurveTo, quadraticCurveTo, closePath), fill, stroke,
 * fillRect, strokeRect, fillText, strokeText (as fill), measureText, rectangular clips,
 * save/restore, translate/rotate/scale/setTransform/resetTransform, line dashes, caps and joins.
 * Text is measured with the fonts' own advance widths (font-metrics.ts), so layout does not depend
 * on the host. clearRect is ignored (the chart is drawn once on a blank canvas).
 */
import { textPieces, textWidth, type ReportFontSet } from './scripts.ts';

type Matrix = readonly [number, number, number, number, number, number];
const IDENTITY: Matrix = [1, 0, 0, 1, 0, 0];

/**
 * Largest distance (canvas pixels = points in the report) by which dropping a polyline's point may
 * move the drawn line: 0.05 pt = 0.018 mm, less than half a dot of a 600 dpi printer (0.12 pt) and a
 * twelfth of the thinnest line the charts draw (0.6 pt).
 */
export const SIMPLIFY_TOLERANCE = 0.05;

/** Distance from (px, py) to the segment (ax, ay)–(bx, by). */
function segmentDistance(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const length2 = dx * dx + dy * dy;
  const t = length2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / length2));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

interface Rect {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

interface State {
  transform: Matrix;
  fillStyle: unknown;
  strokeStyle: unknown;
  lineWidth: number;
  lineCap: string;
  lineJoin: string;
  miterLimit: number;
  dash: number[];
  dashOffset: number;
  font: string;
  textAlign: string;
  textBaseline: string;
  globalAlpha: number;
  clip: Rect | null;
}

function multiply(m: Matrix, n: Matrix): Matrix {
  return [m[0] * n[0] + m[2] * n[1], m[1] * n[0] + m[3] * n[1], m[0] * n[2] + m[2] * n[3], m[1] * n[2] + m[3] * n[3], m[0] * n[4] + m[2] * n[5] + m[4], m[1] * n[4] + m[3] * n[5] + m[5]];
}

/** Numbers for SVG: at most 3 decimals, no "-0". */
function num(v: number): string {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? '0' : String(r);
}

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** A CSS colour as SVG paint and opacity (rgba() and #rrggbbaa split; anything else passed through). */
export function svgPaint(style: unknown): { colour: string; opacity: number } {
  if (typeof style !== 'string') return { colour: '#000000', opacity: 1 };
  const s = style.trim().toLowerCase();
  const rgba = /^rgba?\(\s*([\d.]+)[\s,]+([\d.]+)[\s,]+([\d.]+)(?:[\s,/]+([\d.]+%?))?\s*\)$/.exec(s);
  if (rgba) {
    const hex = [rgba[1], rgba[2], rgba[3]].map((c) => Math.max(0, Math.min(255, Math.round(Number(c)))).toString(16).padStart(2, '0')).join('');
    const alpha = rgba[4] === undefined ? 1 : rgba[4].endsWith('%') ? Number(rgba[4].slice(0, -1)) / 100 : Number(rgba[4]);
    return { colour: `#${hex}`, opacity: Math.max(0, Math.min(1, alpha)) };
  }
  const long = /^#([0-9a-f]{6})([0-9a-f]{2})$/.exec(s);
  if (long) return { colour: `#${long[1]}`, opacity: parseInt(long[2]!, 16) / 255 };
  if (s === 'transparent') return { colour: '#000000', opacity: 0 };
  return { colour: s, opacity: 1 };
}

/** Size (px), weight and family list of a CSS font shorthand such as `500 11px Roboto`. */
export function parseFont(font: string): { size: number; bold: boolean; family: string } {
  const m = /(?:^|\s)([\d.]+)px(?:\/[\d.]+(?:px)?)?\s+(.+)$/.exec(font);
  const size = m ? Number(m[1]) : 10;
  const bold = /\b(bold|bolder|[5-9]00)\b/.test(font.slice(0, m?.index ?? font.length));
  return { size, bold, family: m ? m[2]!.trim() : 'sans-serif' };
}

/**
 * A path built apart from the canvas and drawn with `stroke(path)`: the recording canvas's Path2D.
 * chart.js builds each line's path as a `Path2D` where the host has one (a browser, the app's
 * report worker) and strokes it in one call; a browser's own Path2D cannot be read back, so
 * `chartSvg` lends this class as `Path2D` while chart.js draws (in Node chart.js draws on the
 * context's own path).
 */
export class RecordedPath {
  /** The calls made, in order, with their arguments (canvas units, before the context's transform). */
  readonly calls: { readonly name: 'moveTo' | 'lineTo' | 'bezierCurveTo' | 'quadraticCurveTo' | 'arc' | 'rect' | 'closePath'; readonly args: readonly (number | boolean)[] }[] = [];
  moveTo(x: number, y: number): void { this.calls.push({ name: 'moveTo', args: [x, y] }); }
  lineTo(x: number, y: number): void { this.calls.push({ name: 'lineTo', args: [x, y] }); }
  bezierCurveTo(c1x: number, c1y: number, c2x: number, c2y: number, x: number, y: number): void { this.calls.push({ name: 'bezierCurveTo', args: [c1x, c1y, c2x, c2y, x, y] }); }
  quadraticCurveTo(cx: number, cy: number, x: number, y: number): void { this.calls.push({ name: 'quadraticCurveTo', args: [cx, cy, x, y] }); }
  arc(x: number, y: number, radius: number, start: number, end: number, counterclockwise = false): void { this.calls.push({ name: 'arc', args: [x, y, radius, start, end, counterclockwise] }); }
  rect(x: number, y: number, w: number, h: number): void { this.calls.push({ name: 'rect', args: [x, y, w, h] }); }
  closePath(): void { this.calls.push({ name: 'closePath', args: [] }); }
}

/**
 * The current path: SVG path data in canvas pixels (transform applied), its bounds, and what the
 * simplification and the area test need (see the module comment).
 */
interface PathState {
  readonly d: string[];
  bounds: Rect | null;
  /**
   * The straight run the last `L` command ends: its fixed start (ax, ay), its end (lx, ly) when the
   * last command is a replaceable `L`, and the points already dropped from it (x, y pairs).
   */
  run: { ax: number; ay: number; last: [number, number] | null; dropped: number[] } | null;
  /** Points of the current subpath after simplification. */
  points: number;
  /** Whether the path may enclose an area (a subpath of three points or more, or a curve). */
  area: boolean;
}

const emptyPath = (): PathState => ({ d: [], bounds: null, run: null, points: 0, area: false });

/** The fake `<canvas>` chart.js asks for its context and size. */
export interface SvgCanvasElement {
  width: number;
  height: number;
  readonly style: Record<string, string>;
  getContext(kind: string): SvgCanvasContext | null;
}

/** See the module comment. */
export class SvgCanvasContext {
  readonly canvas: SvgCanvasElement;
  private readonly fonts: ReportFontSet;
  private state: State;
  private readonly stack: State[] = [];
  private path: PathState = emptyPath();
  private readonly body: string[] = [];
  /** The clip (rectangle key, see clipFor) of the nested viewport open at the end of `body`, or ''. */
  private openClip = '';
  /** The last stroked path element, kept open so that following strokes in the same style join it. */
  private pendingStroke: { attrs: string; d: string[]; clip: string } | null = null;
  /** The last filled path, kept open so that a stroke of the same path right after it joins it. */
  private pendingFill: { attrs: string; d: string; clip: string } | null = null;

  constructor(width: number, height: number, fonts: ReportFontSet) {
    this.fonts = fonts;
    this.state = {
      transform: IDENTITY, fillStyle: '#000000', strokeStyle: '#000000', lineWidth: 1, lineCap: 'butt', lineJoin: 'miter', miterLimit: 10,
      dash: [], dashOffset: 0, font: '10px sans-serif', textAlign: 'start', textBaseline: 'alphabetic', globalAlpha: 1, clip: null,
    };
    this.canvas = { width, height, style: {}, getContext: (kind) => (kind === '2d' ? this : null) };
  }

  // --- state -----------------------------------------------------------------------------------
  get fillStyle(): unknown { return this.state.fillStyle; }
  set fillStyle(v: unknown) { this.state.fillStyle = v; }
  get strokeStyle(): unknown { return this.state.strokeStyle; }
  set strokeStyle(v: unknown) { this.state.strokeStyle = v; }
  get lineWidth(): number { return this.state.lineWidth; }
  set lineWidth(v: number) { if (Number.isFinite(v) && v > 0) this.state.lineWidth = v; }
  get lineCap(): string { return this.state.lineCap; }
  set lineCap(v: string) { this.state.lineCap = v; }
  get lineJoin(): string { return this.state.lineJoin; }
  set lineJoin(v: string) { this.state.lineJoin = v; }
  get miterLimit(): number { return this.state.miterLimit; }
  set miterLimit(v: number) { this.state.miterLimit = v; }
  get lineDashOffset(): number { return this.state.dashOffset; }
  set lineDashOffset(v: number) { this.state.dashOffset = v; }
  get font(): string { return this.state.font; }
  set font(v: string) { this.state.font = v; }
  get textAlign(): string { return this.state.textAlign; }
  set textAlign(v: string) { this.state.textAlign = v; }
  get textBaseline(): string { return this.state.textBaseline; }
  set textBaseline(v: string) { this.state.textBaseline = v; }
  get globalAlpha(): number { return this.state.globalAlpha; }
  set globalAlpha(v: number) { this.state.globalAlpha = v; }

  save(): void {
    this.stack.push({ ...this.state, dash: [...this.state.dash] });
  }

  restore(): void {
    const previous = this.stack.pop();
    if (previous) this.state = previous;
  }

  setLineDash(segments: number[]): void {
    this.state.dash = segments.every((s) => Number.isFinite(s) && s >= 0) ? [...segments] : this.state.dash;
  }

  getLineDash(): number[] {
    return [...this.state.dash];
  }

  // --- transform -------------------------------------------------------------------------------
  setTransform(a: number | Matrix | { a: number; b: number; c: number; d: number; e: number; f: number } = 1, b = 0, c = 0, d = 1, e = 0, f = 0): void {
    if (typeof a === 'object') this.state.transform = Array.isArray(a) ? (a as Matrix) : [(a as { a: number }).a, (a as { b: number }).b, (a as { c: number }).c, (a as { d: number }).d, (a as { e: number }).e, (a as { f: number }).f];
    else this.state.transform = [a, b, c, d, e, f];
  }
  resetTransform(): void { this.state.transform = IDENTITY; }
  transform(a: number, b: number, c: number, d: number, e: number, f: number): void { this.state.transform = multiply(this.state.transform, [a, b, c, d, e, f]); }
  translate(x: number, y: number): void { this.transform(1, 0, 0, 1, x, y); }
  scale(x: number, y: number): void { this.transform(x, 0, 0, y, 0, 0); }
  rotate(angle: number): void { this.transform(Math.cos(angle), Math.sin(angle), -Math.sin(angle), Math.cos(angle), 0, 0); }

  private point(x: number, y: number): [number, number] {
    const m = this.state.transform;
    return [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];
  }

  private grow(x: number, y: number, pad = 0): void {
    const b = this.path.bounds;
    this.path.bounds = b ? { x0: Math.min(b.x0, x - pad), y0: Math.min(b.y0, y - pad), x1: Math.max(b.x1, x + pad), y1: Math.max(b.y1, y + pad) } : { x0: x - pad, y0: y - pad, x1: x + pad, y1: y + pad };
  }

  /** A command that ends at (x, y) and is not a straight line (a curve, an arc): the next run starts there. */
  private curveTo(command: string, x: number, y: number): void {
    this.path.d.push(command);
    this.path.run = { ax: x, ay: y, last: null, dropped: [] };
    this.path.points += 1;
    this.path.area = true;
  }

  // --- paths -----------------------------------------------------------------------------------
  beginPath(): void {
    this.path = emptyPath();
  }

  moveTo(x: number, y: number): void {
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    const [px, py] = this.point(x, y);
    this.path.d.push(`M${num(px)} ${num(py)}`);
    this.path.run = { ax: px, ay: py, last: null, dropped: [] };
    this.path.points = 1;
    this.grow(px, py);
  }

  lineTo(x: number, y: number): void {
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    const [px, py] = this.point(x, y);
    const path = this.path;
    this.grow(px, py);
    if (path.d.length === 0) {
      path.d.push(`M${num(px)} ${num(py)}`);
      path.run = { ax: px, ay: py, last: null, dropped: [] };
      path.points = 1;
      return;
    }
    const run = path.run;
    const command = `L${num(px)} ${num(py)}`;
    if (run) {
      const [lx, ly] = run.last ?? [run.ax, run.ay];
      // The same point again (as written): a segment of no length draws nothing.
      if (num(lx) === num(px) && num(ly) === num(py)) return;
      if (run.last && this.mayDrop(run, px, py)) {
        run.dropped.push(lx, ly);
        run.last = [px, py];
        path.d[path.d.length - 1] = command;
        return;
      }
      if (run.last) path.run = { ax: lx, ay: ly, last: [px, py], dropped: [] };
      else run.last = [px, py];
    } else {
      path.run = { ax: px, ay: py, last: null, dropped: [] };
    }
    path.d.push(command);
    path.points += 1;
    if (path.points >= 3) path.area = true;
  }

  /** Whether the run's last point and every point dropped before it lie within the tolerance of the segment from its start to (px, py). */
  private mayDrop(run: NonNullable<PathState['run']>, px: number, py: number): boolean {
    const [lx, ly] = run.last!;
    if (segmentDistance(lx, ly, run.ax, run.ay, px, py) > SIMPLIFY_TOLERANCE) return false;
    for (let i = 0; i < run.dropped.length; i += 2) {
      if (segmentDistance(run.dropped[i]!, run.dropped[i + 1]!, run.ax, run.ay, px, py) > SIMPLIFY_TOLERANCE) return false;
    }
    return true;
  }

  closePath(): void {
    if (this.path.d.length > 0) this.path.d.push('Z');
    // The current point is the subpath's start again, which the next line must not drop.
    this.path.run = null;
  }

  rect(x: number, y: number, w: number, h: number): void {
    this.moveTo(x, y);
    this.lineTo(x + w, y);
    this.lineTo(x + w, y + h);
    this.lineTo(x, y + h);
    this.closePath();
  }

  bezierCurveTo(c1x: number, c1y: number, c2x: number, c2y: number, x: number, y: number): void {
    const [a, b] = this.point(c1x, c1y);
    const [c, d] = this.point(c2x, c2y);
    const [e, f] = this.point(x, y);
    this.curveTo(`C${num(a)} ${num(b)} ${num(c)} ${num(d)} ${num(e)} ${num(f)}`, e, f);
    this.grow(a, b);
    this.grow(c, d);
    this.grow(e, f);
  }

  quadraticCurveTo(cx: number, cy: number, x: number, y: number): void {
    const [a, b] = this.point(cx, cy);
    const [e, f] = this.point(x, y);
    this.curveTo(`Q${num(a)} ${num(b)} ${num(e)} ${num(f)}`, e, f);
    this.grow(a, b);
    this.grow(e, f);
  }

  /** Circular arc (canvas semantics), written as SVG arcs; a full turn as two half circles. */
  arc(x: number, y: number, radius: number, start: number, end: number, counterclockwise = false): void {
    if (!(radius >= 0) || !Number.isFinite(x) || !Number.isFinite(y)) return;
    const m = this.state.transform;
    const r = radius * Math.sqrt(Math.abs(m[0] * m[3] - m[1] * m[2]));
    let sweep = end - start;
    if (!counterclockwise && sweep < 0) sweep = (sweep % (2 * Math.PI)) + 2 * Math.PI;
    if (counterclockwise && sweep > 0) sweep = (sweep % (2 * Math.PI)) - 2 * Math.PI;
    if (Math.abs(end - start) >= 2 * Math.PI) sweep = counterclockwise ? -2 * Math.PI : 2 * Math.PI;
    const at = (angle: number) => this.point(x + radius * Math.cos(angle), y + radius * Math.sin(angle));
    const [sx, sy] = at(start);
    this.path.d.push(this.path.d.length === 0 ? `M${num(sx)} ${num(sy)}` : `L${num(sx)} ${num(sy)}`);
    const flag = sweep > 0 ? 1 : 0;
    const steps = Math.abs(sweep) > Math.PI ? 2 : 1;
    for (let k = 1; k <= steps; k++) {
      const [ex, ey] = at(start + (sweep * k) / steps);
      this.curveTo(`A${num(r)} ${num(r)} 0 0 ${flag} ${num(ex)} ${num(ey)}`, ex, ey);
    }
    const [cx, cy] = this.point(x, y);
    this.grow(cx, cy, r);
  }

  // --- clipping --------------------------------------------------------------------------------
  /** Clips to the bounding box of the current path, or of `path` when given (chart.js clips to rectangles only). */
  clip(path?: unknown): void {
    if (path !== undefined && typeof path !== 'string') return this.withPath(path, () => this.clip());
    const b = this.path.bounds;
    if (!b) return;
    const c = this.state.clip;
    this.state.clip = c ? { x0: Math.max(c.x0, b.x0), y0: Math.max(c.y0, b.y0), x1: Math.min(c.x1, b.x1), y1: Math.min(c.y1, b.y1) } : b;
  }

  /**
   * The clip an element with these bounds needs, as the key `x y width height` of the clipping
   * rectangle ('' when the element lies inside the clip or nothing clips).
   */
  private clipFor(bounds: Rect): string {
    const c = this.state.clip;
    if (!c || (bounds.x0 >= c.x0 && bounds.y0 >= c.y0 && bounds.x1 <= c.x1 && bounds.y1 <= c.y1)) return '';
    return `${num(c.x0)} ${num(c.y0)} ${num(Math.max(0, c.x1 - c.x0))} ${num(Math.max(0, c.y1 - c.y0))}`;
  }

  /**
   * Appends an element clipped to `clip` (a key from clipFor): inside a nested viewport of the clip's
   * rectangle, shared with the elements before it when they have the same clip. A viewport of no
   * area shows nothing, so such an element is left out.
   */
  private emit(element: string, clip: string): void {
    if (clip !== this.openClip) {
      if (this.openClip !== '') this.body.push('</svg>');
      this.openClip = '';
      if (clip !== '') {
        const [x, y, w, h] = clip.split(' ');
        if (Number(w) <= 0 || Number(h) <= 0) return;
        this.body.push(`<svg x="${x}" y="${y}" width="${w}" height="${h}" viewBox="${clip}" overflow="hidden">`);
        this.openClip = clip;
      }
    }
    this.body.push(element);
  }

  /**
   * Runs `paint` with `path` (a RecordedPath) as the current path, then brings the current path back.
   * Throws for any other path object: a host's own Path2D cannot be read, and a chart that silently
   * lost its lines would print wrong.
   */
  private withPath(path: unknown, paint: () => void): void {
    if (!(path instanceof RecordedPath)) throw new Error('The report chart canvas was given a path it cannot read (draw through chartSvg, which lends its own Path2D).');
    const saved = this.path;
    this.beginPath();
    for (const { name, args } of path.calls) (this[name] as (...a: (number | boolean)[]) => void)(...args);
    paint();
    this.path = saved;
  }

  // --- painting --------------------------------------------------------------------------------
  /** Writes the open fill or stroke element, if any. */
  private flushPending(): void {
    const f = this.pendingFill;
    if (f) this.emit(`<path fill=${f.attrs} d="${f.d}"/>`, f.clip);
    this.pendingFill = null;
    const s = this.pendingStroke;
    if (s) this.emit(`<path fill="none"${s.attrs} d="${s.d.join('')}"/>`, s.clip);
    this.pendingStroke = null;
  }

  private paint(style: unknown): string {
    const { colour, opacity } = svgPaint(style);
    const alpha = opacity * this.state.globalAlpha;
    return alpha < 1 ? `"${colour}" opacity="${num(alpha)}"` : `"${colour}"`;
  }

  /** Fills the current path, or `path` when given (a fill rule such as 'evenodd' is accepted and ignored). */
  fill(path?: unknown): void {
    if (path !== undefined && typeof path !== 'string') return this.withPath(path, () => this.fill());
    const b = this.path.bounds;
    // Nothing to fill in a path without area (chart.js fills the line samples of a legend and its cross markers too).
    if (this.path.d.length === 0 || !b || !this.path.area) return;
    if (b.x1 - b.x0 < 1e-9 || b.y1 - b.y0 < 1e-9) return;
    const paint = svgPaint(this.state.fillStyle);
    if (paint.opacity * this.state.globalAlpha === 0) return;
    this.flushPending();
    this.pendingFill = { attrs: this.paint(this.state.fillStyle).replace(' opacity=', ' fill-opacity='), d: this.path.d.join(''), clip: this.clipFor(b) };
  }

  /** Strokes the current path, or `path` when given. */
  stroke(path?: unknown): void {
    if (path !== undefined) return this.withPath(path, () => this.stroke());
    const b = this.path.bounds;
    if (this.path.d.length === 0 || !b) return;
    const paint = svgPaint(this.state.strokeStyle);
    if (paint.opacity * this.state.globalAlpha === 0) return;
    const m = this.state.transform;
    const scale = Math.sqrt(Math.abs(m[0] * m[3] - m[1] * m[2]));
    const width = this.state.lineWidth * scale;
    const s = this.state;
    const dash = s.dash.length > 0 ? ` stroke-dasharray="${s.dash.map((d) => num(d * scale)).join(' ')}"${s.dashOffset ? ` stroke-dashoffset="${num(s.dashOffset * scale)}"` : ''}` : '';
    const attrs = ` stroke=${this.paint(s.strokeStyle).replace(' opacity=', ' stroke-opacity=')} stroke-width="${num(width)}"${s.lineCap !== 'butt' ? ` stroke-linecap="${s.lineCap}"` : ''}${s.lineJoin !== 'miter' ? ` stroke-linejoin="${s.lineJoin}"` : ''}${dash}`;
    const clip = this.clipFor({ x0: b.x0 - width / 2, y0: b.y0 - width / 2, x1: b.x1 + width / 2, y1: b.y1 + width / 2 });
    const d = this.path.d.join('');
    const fill = this.pendingFill;
    if (fill && fill.d === d && fill.clip === clip) {
      // The path just filled, now stroked: one element, painted fill first as on the canvas.
      this.pendingFill = null;
      this.emit(`<path fill=${fill.attrs}${attrs} d="${d}"/>`, clip);
      return;
    }
    const pending = this.pendingStroke;
    // Dashes restart at each subpath, as on a canvas, so joining dashed strokes is exact too.
    if (pending && pending.attrs === attrs && pending.clip === clip) pending.d.push(d);
    else {
      this.flushPending();
      this.pendingStroke = { attrs, d: [d], clip };
    }
  }

  fillRect(x: number, y: number, w: number, h: number): void {
    const path = this.path;
    this.beginPath();
    this.rect(x, y, w, h);
    this.fill();
    this.path = path;
  }

  strokeRect(x: number, y: number, w: number, h: number): void {
    const path = this.path;
    this.beginPath();
    this.rect(x, y, w, h);
    this.stroke();
    this.path = path;
  }

  clearRect(): void {
    // The chart is drawn once on a blank canvas; chart.js clears before drawing.
  }

  // --- text ------------------------------------------------------------------------------------
  measureText(text: string): { width: number; actualBoundingBoxAscent: number; actualBoundingBoxDescent: number } {
    const { size, bold } = parseFont(this.state.font);
    const face = bold ? this.fonts.primary.bold : this.fonts.primary.normal;
    return { width: textWidth(String(text), this.fonts, bold) * size, actualBoundingBoxAscent: face.ascent * size, actualBoundingBoxDescent: face.descent * size };
  }

  fillText(text: string, x: number, y: number): void {
    const value = String(text);
    if (value === '' || !Number.isFinite(x) || !Number.isFinite(y)) return;
    const paint = svgPaint(this.state.fillStyle);
    if (paint.opacity * this.state.globalAlpha === 0) return;
    this.flushPending();
    const { size, bold } = parseFont(this.state.font);
    const face = bold ? this.fonts.primary.bold : this.fonts.primary.normal;
    const width = textWidth(value, this.fonts, bold) * size;
    const align = this.state.textAlign;
    const left = align === 'center' ? x - width / 2 : align === 'right' || align === 'end' ? x - width : x;
    const base = this.state.textBaseline;
    const baseline = base === 'middle' ? y + ((face.ascent - face.descent) / 2) * size : base === 'top' || base === 'hanging' ? y + face.ascent * size : base === 'bottom' || base === 'ideographic' ? y - face.descent * size : y;
    const m = this.state.transform;
    const rotated = m[1] !== 0 || m[2] !== 0 || m[0] !== 1 || m[3] !== 1;
    const [px, py] = rotated ? [left, baseline] : this.point(left, baseline);
    const transform = rotated ? ` transform="matrix(${m.map(num).join(' ')})"` : '';
    const corners = [this.point(left, baseline - face.ascent * size), this.point(left + width, baseline + face.descent * size)];
    const clip = this.clipFor({ x0: Math.min(corners[0]![0], corners[1]![0]), y0: Math.min(corners[0]![1], corners[1]![1]), x1: Math.max(corners[0]![0], corners[1]![0]), y1: Math.max(corners[0]![1], corners[1]![1]) });
    const weight = bold ? ' font-weight="bold"' : '';
    const fill = `fill=${this.paint(this.state.fillStyle).replace(' opacity=', ' fill-opacity=')}`;
    // One text element per piece (font or direction), each at its own x: the PDF draws each piece
    // with its font, and reverses right-to-left pieces itself.
    let cursor = px;
    for (const piece of textPieces(value, this.fonts, bold)) {
      this.emit(`<text x="${num(cursor)}" y="${num(py)}" font-family="${escapeXml(piece.family)}" font-size="${num(size)}"${weight} ${fill}${transform}>${escapeXml(piece.text)}</text>`, clip);
      cursor += textWidth(piece.text, this.fonts, bold) * size;
    }
  }

  strokeText(text: string, x: number, y: number): void {
    this.fillText(text, x, y);
  }

  /** The drawing as an SVG document of the canvas size (CSS pixels = points in the report). */
  toSvg(): string {
    this.flushPending();
    const close = this.openClip === '' ? '' : '</svg>';
    return `<svg xmlns="http://www.w3.org/2000/svg" width="${num(this.canvas.width)}" height="${num(this.canvas.height)}" viewBox="0 0 ${num(this.canvas.width)} ${num(this.canvas.height)}">${this.body.join('')}${close}</svg>`;
  }
}
