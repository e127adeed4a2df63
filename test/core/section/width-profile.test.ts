/**
 * Geometry: exact width profiles and section properties of the shapes, against handbook formulas.
 */
import { describe, expect, it } from 'vitest';
import { shapeOutline, type SectionShape } from '../../../core/section/shapes.ts';
import { chordIntervals, profileMoments, subtractProfile, widthProfile, profileWidthAt } from '../../../core/section/width-profile.ts';

function props(shape: SectionShape) {
  const profile = widthProfile(shapeOutline(shape));
  const { area, firstMoment } = profileMoments(profile);
  const centroid = firstMoment / area;
  return { area, centroid, inertia: profileMoments(profile, centroid).secondMoment, profile };
}

describe('section properties of standard shapes', () => {
  it('rectangle: A = bh, ȳ = h/2, I = bh³/12', () => {
    // Roark's Formulas for Stress and Strain, Table A.1 case 2 (from memory) — common practice
    const p = props({ kind: 'rectangle', width: 300, height: 600 });
    expect(p.area).toBeCloseTo(180000, 6);
    expect(p.centroid).toBeCloseTo(300, 9);
    expect(p.inertia / ((300 * 600 ** 3) / 12)).toBeCloseTo(1, 12);
  });

  it('tee: centroid and I by the parallel-axis theorem', () => {
    // Parallel-axis theorem (common practice, no source): flange 1200 × 120 on a 300-wide web, h = 600
    const p = props({ kind: 'tee', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120 });
    const af = 1200 * 120;
    const aw = 300 * 480;
    const y = (af * 60 + aw * (120 + 240)) / (af + aw);
    const i = (1200 * 120 ** 3) / 12 + af * (y - 60) ** 2 + (300 * 480 ** 3) / 12 + aw * (360 - y) ** 2;
    expect(p.area).toBeCloseTo(af + aw, 6);
    expect(p.centroid).toBeCloseTo(y, 9);
    expect(p.inertia / i).toBeCloseTo(1, 12);
  });

  it('inverted tee is the tee turned over: same I, centroid at h − ȳ', () => {
    const t = props({ kind: 'tee', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120 });
    const u = props({ kind: 'inverted-tee', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120 });
    expect(u.centroid).toBeCloseTo(600 - t.centroid, 9);
    expect(u.inertia / t.inertia).toBeCloseTo(1, 12);
  });

  it('ell has the properties of the tee with the same flange area (bending about a horizontal axis)', () => {
    const t = props({ kind: 'tee', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120 });
    for (const flangeSide of ['left', 'right'] as const) {
      const l = props({ kind: 'ell', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120, flangeSide });
      expect(l.area).toBeCloseTo(t.area, 6);
      expect(l.inertia / t.inertia).toBeCloseTo(1, 12);
    }
  });

  it('box: I = (BH³ − bh³)/12 for a doubly symmetric hollow rectangle', () => {
    // Roark's Formulas for Stress and Strain, Table A.1 (hollow rectangle, from memory)
    const p = props({ kind: 'box', height: 800, width: 600, topThickness: 150, bottomThickness: 150, wallThickness: 120 });
    expect(p.area).toBeCloseTo(600 * 800 - 360 * 500, 6);
    expect(p.inertia / ((600 * 800 ** 3 - 360 * 500 ** 3) / 12)).toBeCloseTo(1, 12);
    expect(profileWidthAt(p.profile, 400)).toBeCloseTo(240, 9);
    expect(chordIntervals(shapeOutline({ kind: 'box', height: 800, width: 600, topThickness: 150, bottomThickness: 150, wallThickness: 120 }), 400)).toEqual([[0, 120], [480, 600]]);
  });

  it('I-shape with equal flanges: I = (B·H³ − (B − bw)·hw³)/12', () => {
    // Handbook formula for a symmetric I-section (common practice, no source)
    const p = props({ kind: 'i-shape', height: 900, webWidth: 200, topFlangeWidth: 600, topFlangeThickness: 150, bottomFlangeWidth: 600, bottomFlangeThickness: 150 });
    expect(p.centroid).toBeCloseTo(450, 9);
    expect(p.inertia / ((600 * 900 ** 3 - 400 * 600 ** 3) / 12)).toBeCloseTo(1, 12);
  });

  it('polygon: a symmetric trapezoid has A = (a + b)h/2 and centroid h(2a + b)/(3(a + b)) from the wide side', () => {
    // Roark's Formulas for Stress and Strain, Table A.1 (trapezoid, from memory)
    const p = props({ kind: 'polygon', outline: [{ x: 0, y: 0 }, { x: 400, y: 0 }, { x: 300, y: 500 }, { x: 100, y: 500 }] });
    const a = 400;
    const b = 200;
    expect(p.area).toBeCloseTo(((a + b) * 500) / 2, 6);
    expect(p.centroid).toBeCloseTo((500 * (a + 2 * b)) / (3 * (a + b)), 9);
    // I about the centroid: h³(a² + 4ab + b²)/(36(a + b))
    expect(p.inertia / ((500 ** 3 * (a * a + 4 * a * b + b * b)) / (36 * (a + b)))).toBeCloseTo(1, 12);
  });

  it('subtracting a core rectangle leaves the cover with the right area', () => {
    const total = widthProfile(shapeOutline({ kind: 'rectangle', width: 300, height: 600 }));
    const core = [{ top: 45, bottom: 555, widthTop: 210, widthBottom: 210 }];
    const cover = subtractProfile(total, core);
    expect(profileMoments(cover).area).toBeCloseTo(300 * 600 - 210 * 510, 6);
    expect(profileWidthAt(cover, 300)).toBeCloseTo(90, 9);
    expect(profileWidthAt(cover, 20)).toBeCloseTo(300, 9);
  });
});
