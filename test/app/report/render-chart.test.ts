import { describe, expect, it } from 'vitest';
import { renderChartPng, renderChartSvg } from '../../../app/report/render-chart.ts';
import { loadDeflectionChart } from '../../../core/charts/load-deflection.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { reportTestProject } from '../../core/report/fixtures.ts';

const results = analyzeProject(reportTestProject());
const spec = loadDeflectionChart(results.members[0]!, 'si');

describe('charts drawn in Node with chart.js', () => {
  it('draws a spec as an SVG document with its title, axis titles and marker labels as text', () => {
    const svg = renderChartSvg(spec, 495, 250);
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('width="495" height="250"');
    const text = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]).join(' ');
    for (const word of ['Load–deflection', 'Deflection', 'Δ', '(mm)', 'Total', 'load', '(kN)', 'cracking', 'service']) expect(text).toContain(word);
    expect(svg).toContain('font-family="Roboto"');
  });

  it('is deterministic', () => {
    expect(renderChartSvg(spec, 495, 250)).toBe(renderChartSvg(spec, 495, 250));
  });

  it('draws a spec as a PNG data URL at twice the size in device pixels', async () => {
    const png = await renderChartPng(spec, 300, 200);
    expect(png.startsWith('data:image/png;base64,')).toBe(true);
    const bytes = Buffer.from(png.slice('data:image/png;base64,'.length), 'base64');
    expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)]).toEqual([600, 400]);
  });

});
