import { BasicPlatform, Chart, registerables } from 'chart.js';
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { chartSvg } from '../../../core/report/chart-svg.ts';
import { RecordedPath, SIMPLIFY_TOLERANCE, parseFont, svgPaint, SvgCanvasContext } from '../../../core/report/svg-canvas.ts';
import { reportTestProject } from './fixtures.ts';
import { testFontSet } from './report-fonts.ts';

const fonts = testFontSet();

describe('SvgCanvasContext', () => {
  it('keeps a dashed line one path with a dash array, and joins strokes of the same style', () => {
    const ctx = new SvgCanvasContext(100, 50, fonts);
    ctx.strokeStyle = '#2364aa';
    ctx.lineWidth = 1.5;
    ctx.setLineDash([6, 3]);
    for (const y of [10, 20]) {
      ctx.beginPath();
      ctx.moveTo(0, y);
      ctx.lineTo(100, y);
      ctx.stroke();
    }
    ctx.setLineDash([]);
    ctx.beginPath();
    ctx.moveTo(0, 30);
    ctx.lineTo(100, 30);
    ctx.stroke();
    expect(ctx.toSvg()).toBe('<svg xmlns="http://www.w3.org/2000/svg" width="100" height="50" viewBox="0 0 100 50">'
      + '<path fill="none" stroke="#2364aa" stroke-width="1.5" stroke-dasharray="6 3" d="M0 10L100 10M0 20L100 20"/>'
      + '<path fill="none" stroke="#2364aa" stroke-width="1.5" d="M0 30L100 30"/></svg>');
  });

  it('writes a clip only for drawings that reach outside it, as a nested viewport, and applies transforms to the path', () => {
    const ctx = new SvgCanvasContext(100, 100, fonts);
    ctx.save();
    ctx.beginPath();
    ctx.rect(10, 10, 50, 50);
    ctx.clip();
    ctx.fillStyle = 'rgba(210, 105, 30, 0.5)';
    ctx.fillRect(20, 20, 10, 10);
    ctx.translate(40, 0);
    ctx.fillRect(20, 20, 10, 10);
    ctx.restore();
    ctx.fillRect(0, 0, 5, 5);
    expect(ctx.toSvg()).toBe('<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100" viewBox="0 0 100 100">'
      + '<path fill="#d2691e" fill-opacity="0.5" d="M20 20L30 20L30 30L20 30Z"/>'
      + '<svg x="10" y="10" width="50" height="50" viewBox="10 10 50 50" overflow="hidden"><path fill="#d2691e" fill-opacity="0.5" d="M60 20L70 20L70 30L60 30Z"/></svg>'
      // restore() brought back the fill style saved before: black.
      + '<path fill="#000000" d="M0 0L5 0L5 5L0 5Z"/></svg>');
  });

  it('puts consecutive elements with the same clip in one viewport and leaves out what a clip of no area hides', () => {
    const ctx = new SvgCanvasContext(100, 100, fonts);
    ctx.beginPath();
    ctx.rect(0, 0, 40, 40);
    ctx.clip();
    ctx.fillRect(30, 30, 20, 20);
    ctx.strokeStyle = '#2364aa';
    ctx.beginPath();
    ctx.moveTo(0, 10);
    ctx.lineTo(90, 10);
    ctx.stroke();
    ctx.beginPath();
    ctx.rect(50, 50, 10, 10); // outside the clip: the clip has no area now
    ctx.clip();
    ctx.fillRect(0, 0, 100, 100);
    expect(ctx.toSvg()).toBe('<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100" viewBox="0 0 100 100">'
      + '<svg x="0" y="0" width="40" height="40" viewBox="0 0 40 40" overflow="hidden"><path fill="#000000" d="M30 30L50 30L50 50L30 50Z"/>'
      + '<path fill="none" stroke="#2364aa" stroke-width="1" d="M0 10L90 10"/></svg></svg>');
  });

  it('strokes and fills a recorded path as it would the same path built on the canvas, and keeps the current path', () => {
    const direct = new SvgCanvasContext(100, 100, fonts);
    const recorded = new SvgCanvasContext(100, 100, fonts);
    for (const ctx of [direct, recorded]) {
      ctx.translate(10, 0);
      ctx.strokeStyle = '#2364aa';
      ctx.fillStyle = '#d2691e';
      ctx.beginPath();
      ctx.rect(0, 0, 5, 5);
    }
    direct.save();
    direct.beginPath();
    direct.moveTo(0, 0);
    direct.lineTo(50, 40);
    direct.bezierCurveTo(60, 40, 70, 50, 80, 90);
    direct.closePath();
    direct.stroke();
    direct.fill();
    direct.restore();
    direct.beginPath();
    direct.rect(0, 0, 5, 5);
    const path = new RecordedPath();
    path.moveTo(0, 0);
    path.lineTo(50, 40);
    path.bezierCurveTo(60, 40, 70, 50, 80, 90);
    path.closePath();
    recorded.stroke(path);
    recorded.fill(path);
    for (const ctx of [direct, recorded]) ctx.fill(); // the 5 × 5 square, the current path in both
    expect(recorded.toSvg()).toBe(direct.toSvg());
    expect(recorded.toSvg()).toContain('d="M10 0L60 40C70 40 80 50 90 90Z"');
    expect(() => recorded.stroke({ moveTo: () => undefined })).toThrow(/cannot read/);
  });

  it('places text by the fonts’ advance widths: centred, on the middle of the em box', () => {
    const ctx = new SvgCanvasContext(200, 40, fonts);
    ctx.font = '10px Roboto';
    ctx.textAlign = 'center';
    ctx.textBaseline = 'middle';
    ctx.fillStyle = '#39424c';
    ctx.fillText('Δ = 12 mm', 100, 20);
    const width = [...'Δ = 12 mm'].reduce((sum, c) => sum + fonts.primary.normal.advance(c.codePointAt(0)!), 0) * 10;
    expect(ctx.measureText('Δ = 12 mm').width).toBeCloseTo(width, 9);
    const m = /<text x="([^"]+)" y="([^"]+)" font-family="Roboto" font-size="10" fill="#39424c">Δ = 12 mm<\/text>/.exec(ctx.toSvg());
    expect(Number(m![1])).toBeCloseTo(100 - width / 2, 3);
    const { ascent, descent } = fonts.primary.normal;
    expect(Number(m![2])).toBeCloseTo(20 + ((ascent - descent) / 2) * 10, 3);
  });

  it('writes a Hebrew name as pieces in their fonts, left to right', () => {
    const ctx = new SvgCanvasContext(200, 40, fonts);
    ctx.font = '500 11px Roboto';
    ctx.fillText('Beam קורה', 0, 20);
    const texts = [...ctx.toSvg().matchAll(/<text[^>]*font-family="([^"]+)"[^>]*font-weight="bold"[^>]*>([^<]*)<\/text>/g)].map((m) => `${m[1]}:${m[2]}`);
    expect(texts).toEqual(['Roboto:Beam ', 'NotoSansHebrew:קורה']);
  });

  it('writes a fill and a stroke of the same path as one element, and leaves out fills without area', () => {
    const ctx = new SvgCanvasContext(100, 100, fonts);
    ctx.fillStyle = 'rgba(35, 100, 170, 0.85)';
    ctx.strokeStyle = '#2364aa';
    ctx.lineWidth = 1.4;
    // A triangle marker: filled, then outlined (as chart.js draws a point).
    ctx.beginPath();
    ctx.moveTo(10, 10);
    ctx.lineTo(20, 10);
    ctx.lineTo(15, 20);
    ctx.closePath();
    ctx.fill();
    ctx.stroke();
    // A cross marker: two bare lines, "filled" then stroked — the fill has no area.
    ctx.beginPath();
    ctx.moveTo(40, 40);
    ctx.lineTo(50, 50);
    ctx.moveTo(50, 40);
    ctx.lineTo(40, 50);
    ctx.fill();
    ctx.stroke();
    // A fill followed by the stroke of another path stays two elements.
    ctx.fillRect(60, 60, 10, 10);
    ctx.beginPath();
    ctx.moveTo(60, 80);
    ctx.lineTo(90, 80);
    ctx.stroke();
    expect(ctx.toSvg()).toBe('<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100" viewBox="0 0 100 100">'
      + '<path fill="#2364aa" fill-opacity="0.85" stroke="#2364aa" stroke-width="1.4" d="M10 10L20 10L15 20Z"/>'
      + '<path fill="none" stroke="#2364aa" stroke-width="1.4" d="M40 40L50 50M50 40L40 50"/>'
      + '<path fill="#2364aa" fill-opacity="0.85" d="M60 60L70 60L70 70L60 70Z"/>'
      + '<path fill="none" stroke="#2364aa" stroke-width="1.4" d="M60 80L90 80"/></svg>');
  });

  it('drops polyline points that would move the line by less than the tolerance, and only those', () => {
    const ctx = new SvgCanvasContext(400, 200, fonts);
    ctx.beginPath();
    ctx.moveTo(0, 100);
    ctx.lineTo(0, 100); // the same point again
    ctx.lineTo(50, 100.02); // 0.02 from the chord 0,100 → 100,100
    ctx.lineTo(100, 100);
    ctx.lineTo(150, 100.2); // 0.2: a real bend, kept
    ctx.lineTo(200, 100);
    ctx.lineTo(200, 50); // a corner, kept
    ctx.lineTo(200, 150); // going back over the same line: kept (the point is not between its neighbours)
    ctx.stroke();
    const d = /d="([^"]+)"/.exec(ctx.toSvg())![1];
    expect(d).toBe('M0 100L100 100L150 100.2L200 100L200 50L200 150');
  });

  it('never lets dropped points drift: each is checked against the segment that replaces it', () => {
    // A slow arc: each point is within the tolerance of the chord of its two neighbours, but the
    // arc as a whole bends far more; the written polyline must stay within the tolerance of every point.
    const points = Array.from({ length: 400 }, (_, i) => {
      const a = (i / 399) * (Math.PI / 2);
      return [200 + 150 * Math.cos(a), 180 - 150 * Math.sin(a)] as const;
    });
    const ctx = new SvgCanvasContext(400, 200, fonts);
    ctx.beginPath();
    ctx.moveTo(points[0]![0], points[0]![1]);
    for (const [x, y] of points.slice(1)) ctx.lineTo(x, y);
    ctx.stroke();
    const kept = [...(/d="([^"]+)"/.exec(ctx.toSvg())![1]!).matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])] as const);
    expect(kept.length).toBeLessThan(points.length / 2);
    expect(kept.length).toBeGreaterThan(10);
    const distance = ([px, py]: readonly [number, number]) => Math.min(...kept.slice(1).map(([bx, by], i) => {
      const [ax, ay] = kept[i]!;
      const [dx, dy] = [bx - ax, by - ay];
      const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
      return Math.hypot(px - ax - t * dx, py - ay - t * dy);
    }));
    // 0.0005: the 3-decimal rounding of the written coordinates.
    for (const p of points) expect(distance(p)).toBeLessThanOrEqual(SIMPLIFY_TOLERANCE + 0.0005);
  });

  it('reads CSS colours and fonts', () => {
    expect(svgPaint('rgba(255, 255, 255, 0.85)')).toEqual({ colour: '#ffffff', opacity: 0.85 });
    expect(svgPaint('#2364AA')).toEqual({ colour: '#2364aa', opacity: 1 });
    expect(svgPaint('#11223380').opacity).toBeCloseTo(128 / 255, 12);
    expect(parseFont('500 11px Roboto')).toEqual({ size: 11, bold: true, family: 'Roboto' });
    expect(parseFont('normal 8.5px "Roboto", sans-serif')).toEqual({ size: 8.5, bold: false, family: '"Roboto", sans-serif' });
  });
});

describe('chartSvg: a report chart drawn by chart.js on the recording canvas', () => {
  Chart.register(...registerables);
  const results = analyzeProject(reportTestProject());
  const spec = loadDeflectionChart(results.members[0]!, 'si');
  const svg = chartSvg({ Chart, BasicPlatform } as never, spec, 495, 250, fonts);

  it('holds the title, axis titles, legend and marker labels as text in the report font', () => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg" width="495" height="250"')).toBe(true);
    const text = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]).join(' | ');
    for (const words of [spec.title, spec.x.label, spec.y.label, ...spec.markers.filter((m) => m.label !== '').map((m) => m.label)]) expect(text).toContain(words);
    expect(svg).not.toMatch(/NaN|Infinity/);
  });

  it('lends chart.js its own Path2D while a chart is drawn, as a browser host would have one, and gives the global back', () => {
    // A chart library drawing as chart.js does in a browser: the line built as a Path2D and stroked in one call.
    class BrowserLikeChart {
      constructor(canvas: { getContext(kind: string): SvgCanvasContext | null }) {
        const ctx = canvas.getContext('2d')!;
        const line = new (globalThis as unknown as { Path2D: new () => RecordedPath }).Path2D();
        line.moveTo(10, 90);
        line.lineTo(90, 10);
        ctx.strokeStyle = '#2364aa';
        ctx.stroke(line);
      }
      destroy(): void {}
    }
    const before = (globalThis as { Path2D?: unknown }).Path2D;
    const svg = chartSvg({ Chart: BrowserLikeChart, BasicPlatform } as never, spec, 100, 100, fonts);
    expect(svg).toContain('<path fill="none" stroke="#2364aa" stroke-width="1" d="M10 90L90 10"/>');
    expect((globalThis as { Path2D?: unknown }).Path2D).toBe(before);
  });

  it('is small and deterministic', () => {
    expect(svg.length).toBeLessThan(20_000);
    expect(chartSvg({ Chart, BasicPlatform } as never, spec, 495, 250, fonts)).toBe(svg);
  });
});
