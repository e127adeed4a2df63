import { BasicPlatform, Chart, registerables } from 'chart.js';
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { chartSvg } from '../../../core/report/chart-svg.ts';
import { FIGURE_PROGRAM, figureContent, figureProgram, pathOperators, type FigurePdfHost } from '../../../core/report/figure-pdf.ts';
import { SvgCanvasContext } from '../../../core/report/svg-canvas.ts';
import { reportTestProject } from './fixtures.ts';
import { testFontSet } from './report-fonts.ts';

const fonts = testFontSet();

/** A host that encodes each character as its code point with a fixed advance of 500/1000 em. */
function fakeHost(log: string[] = []): FigurePdfHost {
  return {
    glyphs(family, bold, text) {
      log.push(`${family}${bold ? ' bold' : ''}: ${text}`);
      const chars = [...text];
      return { font: bold ? 'F2' : 'F1', codes: chars.map((c) => c.codePointAt(0)!.toString(16).padStart(4, '0')), positions: chars.map(() => ({ xAdvance: 500, advanceWidth: 500, xOffset: 0, yOffset: 0 })) };
    },
    opacity: (fill, stroke) => `G${fill}_${stroke}`,
  };
}

/** Points of the cubic Bézier operators in `ops` sampled at `t`, with the start point before each. */
function bezierPoints(ops: string, x0: number, y0: number, samples = 9): [number, number][] {
  const out: [number, number][] = [];
  let [px, py] = [x0, y0];
  for (const m of ops.matchAll(/([-\d.e]+) ([-\d.e]+) ([-\d.e]+) ([-\d.e]+) ([-\d.e]+) ([-\d.e]+) c/g)) {
    const [a, b, c, d, e, f] = m.slice(1).map(Number) as [number, number, number, number, number, number];
    for (let i = 0; i <= samples; i++) {
      const t = i / samples;
      const u = 1 - t;
      out.push([u * u * u * px + 3 * u * u * t * a + 3 * u * t * t * c + t * t * t * e, u * u * u * py + 3 * u * u * t * b + 3 * u * t * t * d + t * t * t * f]);
    }
    [px, py] = [e, f];
  }
  return out;
}

describe('path data as PDF path operators', () => {
  it('writes moves, lines and closes with the numbers as written, and a quadratic curve as the equivalent cubic', () => {
    expect(pathOperators('M0 10L100 10.5M0 -20.25L3 4Z')).toBe('0 10 m 100 10.5 l 0 -20.25 m 3 4 l h');
    // SVG 1.1 §8.3.7: a quadratic Bézier Q1 equals the cubic with control points P0 + 2/3 (Q1 − P0) and P2 + 2/3 (Q1 − P2).
    expect(pathOperators('M0 0Q30 60 90 0')).toBe('0 0 m 20 40 50 40 90 0 c');
  });

  it('draws a circular arc as cubic Béziers of at most a quarter turn that stay on the circle', () => {
    // A full circle as the recording canvas writes a chart.js marker: two half circles of radius 4 around (10, 20).
    const ops = pathOperators('M14 20A4 4 0 0 1 6 20A4 4 0 0 1 14 20Z')!;
    expect(ops.match(/ c/g)).toHaveLength(4);
    expect(ops.endsWith('14 20 c h')).toBe(true);
    // A quarter turn with control distance 4/3·tan(θ/4)·r deviates from the circle by at most about 2.7e-4·r (common practice, no source; from memory).
    for (const [x, y] of bezierPoints(ops, 14, 20)) expect(Math.abs(Math.hypot(x - 10, y - 20) - 4)).toBeLessThan(4 * 3e-4 + 2e-3);
    // Sweep flag 1 turns clockwise on the page (y downwards): from (14, 20) through (10, 24).
    const quarter = bezierPoints(ops, 14, 20)[9]!;
    expect(quarter[0]).toBeCloseTo(10, 2);
    expect(quarter[1]).toBeCloseTo(24, 2);
  });

  it('scales a radius too small to reach the end point up until it does (SVG 1.1 F.6.6)', () => {
    const ops = pathOperators('M0 0A1 1 0 0 1 10 0')!;
    const points = bezierPoints(ops, 0, 0);
    for (const [x, y] of points) expect(Math.abs(Math.hypot(x - 5, y) - 5)).toBeLessThan(5 * 3e-4 + 2e-3);
    expect(points.at(-1)).toEqual([10, 0]);
  });

  it('refuses what the recording canvas never writes: relative commands, elliptical or rotated arcs', () => {
    expect(pathOperators('m0 0l10 10')).toBeNull();
    expect(pathOperators('M0 0A4 2 0 0 1 8 0')).toBeNull();
    expect(pathOperators('M0 0A4 4 30 0 1 8 0')).toBeNull();
    expect(pathOperators('M0 0H10')).toBeNull();
  });
});

describe('figure programs from the recording canvas', () => {
  it('writes each painting state once, fills and strokes of one path as one operator, dashes, opacities and clips', () => {
    const ctx = new SvgCanvasContext(100, 50, fonts);
    ctx.strokeStyle = '#2364aa';
    ctx.lineWidth = 1.5;
    ctx.setLineDash([6, 3]);
    ctx.beginPath();
    ctx.moveTo(0, 10);
    ctx.lineTo(100, 10);
    ctx.stroke();
    ctx.setLineDash([]);
    ctx.save();
    ctx.beginPath();
    ctx.rect(10, 10, 50, 30);
    ctx.clip();
    ctx.fillStyle = 'rgba(210, 105, 30, 0.5)';
    ctx.fillRect(0, 0, 40, 40);
    ctx.restore();
    ctx.fillStyle = '#ffffff';
    ctx.beginPath();
    ctx.rect(70, 20, 10, 10);
    ctx.fill();
    ctx.stroke();
    const program = figureProgram(ctx.toSvg())!;
    expect(program.split('\n')).toEqual([
      `${FIGURE_PROGRAM} 100 50`,
      '0.1373 0.3922 0.6667 RG 1.5 w 0 J 0 j 4 M [6 3] 0 d 0 10 m 100 10 l S',
      'q 10 10 50 30 re W n',
      '\u0001G\t0.5\t1',
      '0.8235 0.4118 0.1176 rg 0 0 m 40 0 l 40 40 l 0 40 l h f',
      // The clip's end restores the state from before it: opacity 1 again, the fill colour unknown.
      'Q',
      '[] 0 d 1 1 1 rg 70 20 m 80 20 l 80 30 l 70 30 l h B',
    ]);
  });

  it('keeps the text, its font, weight, colour and rotation, and places glyphs with the kerning the font writer gives', () => {
    const ctx = new SvgCanvasContext(200, 100, fonts);
    ctx.fillStyle = '#39424c';
    ctx.font = '500 10px Roboto';
    ctx.fillText('Load & <P>', 20, 30);
    ctx.translate(15, 80);
    ctx.rotate(-Math.PI / 2);
    ctx.font = '9px Roboto';
    ctx.fillText('Δ (mm)', 0, 0);
    const program = figureProgram(ctx.toSvg())!;
    const log: string[] = [];
    const { width, height, content } = figureContent(program, fakeHost(log));
    expect([width, height]).toEqual([200, 100]);
    expect(log).toEqual(['Roboto bold: Load & <P>', 'Roboto: Δ (mm)']);
    const lines = content.split('\n');
    expect(lines[0]).toBe('0.2235 0.2588 0.298 rg');
    // Upright text: the text matrix flips the figure's downward y back up.
    expect(lines[1]).toMatch(/^BT \/F2 10 Tf 1 0 0 -1 20 30 Tm \[<004c006f0061006400200026002000[0-9a-f]{2}00[0-9a-f]{2}00[0-9a-f]{2}> 0\] TJ ET$/);
    // Rotated a quarter turn anticlockwise on the page, at (15, 80).
    expect(lines[2]).toMatch(/^BT \/F1 9 Tf 0 -1 -1 0 15 80 Tm \[<0394.*> 0\] TJ ET$/);

    // Kerning between glyphs goes into the TJ array (thousandths of the font size); an offset glyph (a mark) gets its own matrix.
    const kerned: FigurePdfHost = {
      glyphs: () => ({ font: 'F1', codes: ['0001', '0002', '0003', '0004'], positions: [
        { xAdvance: 600, advanceWidth: 600, xOffset: 0, yOffset: 0 },
        { xAdvance: 480, advanceWidth: 500, xOffset: 0, yOffset: 0 },
        { xAdvance: 0, advanceWidth: 0, xOffset: -250, yOffset: 100 },
        { xAdvance: 500, advanceWidth: 500, xOffset: 0, yOffset: 0 },
      ] }),
      opacity: () => 'G',
    };
    const one = figureContent(`${FIGURE_PROGRAM} 100 50\n\u0001T\tRoboto\t0\t10\t1 0 0 1 0 0\t10\t20\tabc`, kerned).content;
    expect(one).toBe('BT /F1 10 Tf 1 0 0 -1 10 20 Tm [<00010002> 20] TJ 1 0 0 -1 18.3 19 Tm [<0003> 0] TJ 1 0 0 -1 20.8 20 Tm [<0004> 0] TJ ET');
  });

  it('reads a whole chart drawn by chart.js, with one text line per text element and balanced clips', () => {
    Chart.register(...registerables);
    const results = analyzeProject(reportTestProject());
    const svg = chartSvg({ Chart, BasicPlatform } as never, loadDeflectionChart(results.members[0]!, 'si'), 495, 250, fonts);
    const program = figureProgram(svg)!;
    expect(program).not.toBeNull();
    const lines = program.split('\n');
    expect(lines.filter((l) => l.startsWith('\u0001T')).length).toBe(svg.match(/<text /g)!.length);
    expect(lines.filter((l) => l.startsWith('q ')).length).toBe(lines.filter((l) => l === 'Q').length);
    expect(lines.filter((l) => l.startsWith('q ')).length).toBe(svg.match(/<svg /g)!.length - 1);
    // Every path drawn: one painting operator per path element.
    const painted = lines.filter((l) => / (S|f|B|f\*|B\*)$/.test(l)).length;
    expect(painted).toBe(svg.match(/<path /g)!.length);
    const { content } = figureContent(program, fakeHost());
    expect(content).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('refuses anything outside the subset, so that the caller keeps the SVG', () => {
    const wrap = (inner: string) => `<svg xmlns="http://www.w3.org/2000/svg" width="100" height="50" viewBox="0 0 100 50">${inner}</svg>`;
    expect(figureProgram(wrap('<path fill="none" stroke="#000000" d="M0 0L1 1"/>'))).not.toBeNull();
    expect(figureProgram(wrap('<circle cx="1" cy="1" r="1"/>'))).toBeNull();
    expect(figureProgram(wrap('<path fill="url(#g)" d="M0 0L1 1L0 1Z"/>'))).toBeNull();
    expect(figureProgram(wrap('<path fill="#000000" filter="blur" d="M0 0L1 1L0 1Z"/>'))).toBeNull();
    expect(figureProgram(wrap('<text x="1" y="2" text-anchor="middle">a</text>'))).toBeNull();
    expect(figureProgram(wrap('<svg x="0" y="0" width="10" height="10" viewBox="0 0 20 20" overflow="hidden"></svg>'))).toBeNull();
    expect(figureProgram('<svg xmlns="http://www.w3.org/2000/svg" width="100" height="50" viewBox="0 0 200 100"></svg>')).toBeNull();
    expect(figureProgram(wrap('<path d="M0 0L1 1"/>') + '<path d="M0 0"/>')).toBeNull();
    expect(figureProgram(wrap('<path d="M0 0L1 1">'))).toBeNull();
    expect(figureProgram('<?xml version="1.0"?>' + wrap(''))).toBeNull();
  });
});
