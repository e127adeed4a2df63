/**
 * Outlines of spalled sections and of sections deepened by a new layer: areas and depths worked by
 * hand from the shapes' dimensions (common practice, no source).
 */
import { say } from '../../../core/units/phrase.ts';
import { describe, expect, it } from 'vitest';
import { changeOutline, NO_CHANGE } from '../../../core/retrofit/outline.ts';
import { shapeOutline, type SectionShape } from '../../../core/section/shapes.ts';
import { profileMoments, widthProfile } from '../../../core/section/width-profile.ts';
import { validateShape, shapeHeight } from '../../../core/section/build.ts';

const area = (shape: SectionShape) => profileMoments(widthProfile(shapeOutline(shape))).area;
const rect: SectionShape = { kind: 'rectangle', width: 300, height: 600 };
const tee: SectionShape = { kind: 'tee', height: 600, webWidth: 300, flangeWidth: 1000, flangeThickness: 120 };

function ok(outcome: ReturnType<typeof changeOutline>) {
  if (!outcome.ok) throw new Error(say(outcome.message, 'si'));
  expect(validateShape(outcome.shape, 'shape')).toEqual([]);
  return outcome;
}

describe('cover removed from a section', () => {
  it('20 mm off the soffit of a 300 × 600 rectangle leaves 300 × 580 = 174 000 mm², depths unchanged', () => {
    const r = ok(changeOutline(rect, { ...NO_CHANGE, bottom: 20 }));
    expect(area(r.shape)).toBeCloseTo(174_000, 6);
    expect(r.shift).toBe(0);
    expect(shapeHeight(r.shape)).toBeCloseTo(580, 9);
  });

  it('25 mm off the top and 30 mm off the left side below a depth of 400 mm: 300 × 575 − 30 × 200 = 166 500 mm², depths shift up 25 mm', () => {
    const r = ok(changeOutline(rect, { ...NO_CHANGE, top: 25, left: [{ depth: 30, from: 400, to: 600 }] }));
    expect(area(r.shape)).toBeCloseTo(166_500, 6);
    expect(r.shift).toBe(25);
    expect(r.concreteTop).toBe(0);
    expect(r.bottomChord).toEqual([30, 300]);
  });

  it('a tee losing 40 mm from its left face loses it from the flange tip and from the web side: 264 000 − 40 × 120 − 40 × 480 = 240 000 mm²', () => {
    expect(area(tee)).toBeCloseTo(264_000, 6);
    const r = ok(changeOutline(tee, { ...NO_CHANGE, left: [{ depth: 40, from: 0, to: 600 }] }));
    expect(area(r.shape)).toBeCloseTo(240_000, 6);
  });

  it('refuses a box (two pieces at the walls) and a cut that leaves no concrete, with the reason', () => {
    const box = changeOutline({ kind: 'box', height: 800, width: 600, topThickness: 150, bottomThickness: 150, wallThickness: 120 }, { ...NO_CHANGE, bottom: 20 });
    expect(box.ok).toBe(false);
    expect(!box.ok && say(box.message, 'si')).toMatch(/voids|one piece/);
    const gone = changeOutline(rect, { ...NO_CHANGE, left: [{ depth: 160, from: 0, to: 600 }], right: [{ depth: 160, from: 0, to: 600 }] });
    expect(!gone.ok && say(gone.message, 'si')).toMatch(/whole width/);
    const flat = changeOutline(rect, { ...NO_CHANGE, top: 300, bottom: 300 });
    expect(!flat.ok && say(flat.message, 'si')).toMatch(/leaves nothing/);
  });
});

describe('depth added for a new concrete layer', () => {
  it('a 75 mm overlay deepens the outline to 675 mm without adding concrete (a zero-width edge reaches y = 0)', () => {
    const r = ok(changeOutline(rect, { ...NO_CHANGE, addTop: 75 }));
    expect(shapeHeight(r.shape)).toBeCloseTo(675, 9);
    expect(area(r.shape)).toBeCloseTo(180_000, 6);
    expect(r.shift).toBe(-75);
    expect(r.concreteTop).toBe(75);
    const strips = widthProfile(shapeOutline(r.shape));
    expect(Math.min(...strips.map((s) => s.top))).toBeCloseTo(75, 9);
  });

  it('a 100 mm layer under a tee sits under its web: bottom chord = web, height 700 mm', () => {
    const r = ok(changeOutline(tee, { ...NO_CHANGE, addBottom: 100 }));
    expect(shapeHeight(r.shape)).toBeCloseTo(700, 9);
    expect(r.bottomChord).toEqual([350, 650]);
    expect(r.concreteBottom).toBe(600);
    expect(area(r.shape)).toBeCloseTo(264_000, 6);
  });
});
