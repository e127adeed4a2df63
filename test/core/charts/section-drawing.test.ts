import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../core/project/demo.ts';
import { sectionDrawingSvg } from '../../../core/charts/section-drawing.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { reportTestProject } from '../report/fixtures.ts';

const r1 = () => reportTestProject().sections[0]!;

describe('scaled section drawing', () => {
  it('draws the outline, the hoop and one circle per bar, and labels each layer', () => {
    const { svg } = sectionDrawingSvg(r1(), 'si');
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.match(/<circle /g)).toHaveLength(3 + 2);
    expect(svg.match(/<rect /g)).toHaveLength(1);
    expect(svg).toContain('>bottom bars: 3 Ø20 (942 mm²)</text>');
    expect(svg).toContain('>top bars: 2 Ø16 (402 mm²)</text>');
    expect(svg).toContain('>300 mm</text>');
    expect(svg).toContain('>550 mm</text>');
  });

  it('is drawn to a standard scale that fits the space: 1:n with n the smallest that fits', () => {
    // 1 pt = 25.4/72 mm (definition of the point); a 550 mm deep section at 1:10 is 55 mm = 155.9 pt
    const d = sectionDrawingSvg(r1(), 'si', { maxWidth: 300, maxHeight: 240 });
    expect(d.scale).toBe(10);
    expect(d.scaleText).toBe('scale 1:10 at the printed size');
    const tight = sectionDrawingSvg(r1(), 'si', { maxWidth: 300, maxHeight: 120 });
    expect(tight.scale).toBe(20);
    expect(tight.height).toBeLessThanOrEqual(120);
    expect(d.width).toBeLessThanOrEqual(300);
  });

  it('prints dimensions in inches for US units', () => {
    const { svg } = sectionDrawingSvg(r1(), 'us');
    // 300 mm / 25.4 = 11.81 in (NIST SP 811 B.8), four figures as the leading digit is 1
    expect(svg).toContain('>11.81 in</text>');
    // 550 mm / 25.4 = 21.65 in, three figures
    expect(svg).toContain('>21.7 in</text>');
  });

  it('escapes text for XML and survives a shape with no area', () => {
    const odd: SectionDefinition = { ...r1(), bars: [{ ...r1().bars[0]!, label: 'A & B <main>' }] };
    expect(sectionDrawingSvg(odd, 'si').svg).toContain('A &amp; B &lt;main&gt;');
    const flat: SectionDefinition = { ...r1(), shape: { kind: 'rectangle', width: 0, height: 550 } };
    const d = sectionDrawingSvg(flat, 'si');
    expect(d.scale).toBeNull();
    expect(d.svg).toContain('cannot be drawn');
  });

  it('is the same text for the same section', () => {
    expect(sectionDrawingSvg(r1(), 'si').svg).toBe(sectionDrawingSvg(r1(), 'si').svg);
  });

  it('writes bars as drawings do (3 #8) and falls back to count × diameter for other sizes', () => {
    const section = demoProject().sections.find((x) => x.id === 'T24')!;
    const us = sectionDrawingSvg(section, 'us').svg;
    // B-201's T-beam: 3 #8 at the bottom, 2 #5 at the top (ASTM A615 bar numbers); its labels
    // already say so ("bottom 3 #8"), and the drawing does not say it twice.
    expect(us).toContain('>bottom 3 #8 (');
    expect(us).not.toContain('3 #8: 3 #8');
    const unlabelled = { ...section, bars: section.bars.map(({ label: _label, ...bar }) => bar) };
    expect(sectionDrawingSvg(unlabelled, 'us').svg).toContain('>layer 1: 3 #8 (');
    const odd = { ...section, bars: [{ ...section.bars[0]!, diameter: 23.7 }] };
    expect(sectionDrawingSvg(odd, 'si').svg).toMatch(/3 × 23\.7 mm/);
  });
});
