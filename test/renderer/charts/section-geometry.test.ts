/**
 * The section drawing is to scale: one factor for x and y, bars drawn with their diameter at the
 * positions core gives (barPositions), the hoop and cover where the hoop set puts them.
 */
import { describe, expect, it } from 'vitest';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { barPositions } from '../../../core/section/build.ts';
import { roundLength, sectionGeometry } from '../../../renderer/src/charts/section-geometry.ts';

const section: SectionDefinition = {
  id: 's', name: '300 × 600', concreteId: 'c', shape: { kind: 'rectangle', width: 300, height: 600 },
  bars: [{ steelId: 'b', depth: 545, count: 3, diameter: 20, label: 'bottom' }, { steelId: 'b', depth: 50, count: 2, diameter: 16 }],
  hoops: { steelId: 'b', diameter: 10, spacing: 150, verticalLegs: 2, clearCover: 30, confineCore: true, closedAndAnchored: true },
};

describe('sectionGeometry', () => {
  const g = sectionGeometry(section, 'si')!;

  it('draws every bar with its diameter to the same scale as the outline', () => {
    expect(g.bars).toHaveLength(5);
    const bottom = g.bars.filter((b) => b.layer === 0);
    for (const bar of bottom) expect(bar.r).toBeCloseTo(10 * g.scale, 1);
    const xs = barPositions(section, section.bars[0]!);
    expect(bottom[2]!.cx - bottom[0]!.cx).toBeCloseTo((xs[2]! - xs[0]!) * g.scale, 1);
  });

  it('keeps the proportions: the outline is twice as high as wide', () => {
    const numbers = g.outline.match(/-?\d+(\.\d+)?/g)!.map(Number);
    const xs = numbers.filter((_, i) => i % 2 === 0);
    const ys = numbers.filter((_, i) => i % 2 === 1);
    expect((Math.max(...ys) - Math.min(...ys)) / (Math.max(...xs) - Math.min(...xs))).toBeCloseTo(2, 2);
  });

  it('puts the hoop centreline at cover + half its diameter and shades the confined core', () => {
    expect(g.hoop!.w).toBeCloseTo((300 - 2 * 35) * g.scale, 1);
    expect(g.cover!.w).toBeCloseTo((300 - 2 * 30) * g.scale, 1);
    expect(g.core).toEqual({ x: g.hoop!.x, y: g.hoop!.y, w: g.hoop!.w, h: g.hoop!.h });
  });

  it('labels the layers in the display units and dimensions the section', () => {
    // Top to bottom; 16.00 mm to four figures (core/units: four significant figures when the leading digit is 1).
    expect(g.labels.map((l) => l.text)).toEqual(['2 Ø16 at 50.0 mm', 'bottom: 3 Ø20 at 545 mm']);
    expect(g.dimensions.map((d) => d.text)).toEqual(['300 mm', '600 mm']);
    const us = sectionGeometry(section, 'us')!;
    // 300 mm = 11.8 in (1 in = 25.4 mm, NIST SP 811 B.8)
    expect(us.dimensions[0]!.text).toBe('11.81 in');
  });

  it('does not repeat bars a label already names, and never takes 13 #8 for 3 #8', () => {
    const named: SectionDefinition = { ...section, bars: [{ ...section.bars[0]!, label: 'bottom 3 Ø20' }, { ...section.bars[1]!, label: 'top 12 Ø16' }] };
    expect(sectionGeometry(named, 'si')!.labels.map((l) => l.text)).toEqual(['top 12 Ø16: 2 Ø16 at 50.0 mm', 'bottom 3 Ø20 at 545 mm']);
  });

  it('never lets two layer labels overlap', () => {
    const crowded: SectionDefinition = { ...section, bars: [40, 45, 50, 55].map((depth) => ({ steelId: 'b', depth, count: 2, diameter: 12 })) };
    const labels = sectionGeometry(crowded, 'si')!.labels;
    for (let i = 1; i < labels.length; i++) expect(labels[i]!.y - labels[i - 1]!.y).toBeGreaterThanOrEqual(14 - 1e-9);
  });

  it('cannot draw a shape without area or with numbers that are not finite', () => {
    expect(sectionGeometry({ ...section, shape: { kind: 'rectangle', width: 0, height: 600 } }, 'si')).toBeNull();
    expect(sectionGeometry({ ...section, shape: { kind: 'rectangle', width: Number.NaN, height: 600 } }, 'si')).toBeNull();
  });

  it('skips a layer it cannot draw and says so', () => {
    const g2 = sectionGeometry({ ...section, bars: [{ steelId: 'b', depth: Number.NaN, count: 2, diameter: 12 }] }, 'si')!;
    expect(g2.bars).toHaveLength(0);
    expect(g2.problems[0]).toMatch(/Layer 1 cannot be drawn/);
  });
});

describe('roundLength', () => {
  it('picks 1, 2 or 5 times a power of ten near a quarter of the width', () => {
    expect(roundLength(300)).toBe(100);
    expect(roundLength(12)).toBe(2);
    expect(roundLength(54)).toBe(10);
    expect(roundLength(0)).toBe(1);
  });
});
