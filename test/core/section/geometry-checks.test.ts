/**
 * Section geometry checks (core/section/geometry-checks.ts) through project validation and the
 * section builder: what issue 17 found accepted in silence is an error naming the field, clear
 * spacing below the code's minimum is a warning naming the clause. SI internal units (mm).
 */
import { describe, expect, it } from 'vitest';
import { InputError, type Diagnostic } from '../../../core/diagnostics.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { CodeBasis } from '../../../core/materials/specs.ts';
import { validateProjectData } from '../../../core/project/validate.ts';
import type { Project } from '../../../core/project/types.ts';
import { buildSectionModel } from '../../../core/section/build.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { MAX_BAR_LAYERS, minimumClearSpacing } from '../../../core/section/geometry-checks.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

const R1 = 'sections[0] "300 × 600"';
type Edit = (s: { -readonly [K in keyof SectionDefinition]: SectionDefinition[K] }) => void;

/** The small project's r1 (300 × 600, hoops Ø10 with 30 mm cover, 3 Ø20 at 540 and 2 Ø16 at 55) edited. */
function project(edit: Edit, code: CodeBasis = 'ACI 318-19'): Project {
  const p = structuredClone(smallProject(code, [member('B-1', 'simply-supported', 6000, 'r1')]));
  edit(p.sections[0] as never);
  return p;
}
function diagnosticsOf(edit: Edit, code: CodeBasis = 'ACI 318-19'): Diagnostic[] {
  return validateProjectData(JSON.parse(JSON.stringify(project(edit, code)))).diagnostics;
}
const at = (list: Diagnostic[], path: string, severity: Diagnostic['severity'] = 'error') => list.filter((d) => d.path === path && d.severity === severity);
const polygon = (outline: { x: number; y: number }[], voids?: { x: number; y: number }[][]): Edit => (s) => {
  s.shape = { kind: 'polygon', outline, ...(voids ? { voids } : {}) };
  delete s.hoops;
  s.bars = [{ steelId: 'b500', depth: 540, count: 2, diameter: 20 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }];
};
const rect = (x0: number, y0: number, x1: number, y1: number) => [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }];

/** The errors the section builder throws for the edited r1 (none: []). */
function builderErrors(edit: Edit): Diagnostic[] {
  const p = project(edit);
  try {
    buildSectionModel(p.sections[0]!, materialLibrary(p.materials, 'ACI 318-19', {}), R1);
    return [];
  } catch (error) {
    if (error instanceof InputError) return [...error.diagnostics];
    throw error;
  }
}

describe('bar layers on top of each other', () => {
  it('a repeated layer is an error naming both layers', () => {
    const d = diagnosticsOf((s) => { s.bars = [...s.bars, { ...s.bars[0]! }]; });
    expect(at(d, `${R1}.bars[2]`)[0]?.message).toMatch(/repeats bars\[0\].*counted twice/);
  });

  it(`1,000 identical layers are refused (at most ${MAX_BAR_LAYERS}), and no longer give a result`, () => {
    const edit: Edit = (s) => { s.bars = Array.from({ length: 1000 }, () => ({ ...s.bars[0]! })); };
    expect(at(diagnosticsOf(edit), `${R1}.bars`)[0]?.message).toBe(`a section may have at most ${MAX_BAR_LAYERS} bar layers, got 1000`);
    // Issue 17 had Mu = 2,515 kN·m and status ok for a 210 kN·m beam.
    const result = analyzeProject(project(edit)).members[0]!;
    expect(result.status).toBe('input-error');
    expect(result.errors.some((e) => e.path === `${R1}.bars`)).toBe(true);
  });

  it('bars of a second layer at the same depth on those of the first: an error with both bars and the distance', () => {
    // 3 Ø20 across the web put bars at both edges and the middle; 2 Ø16 at the edges land on them.
    const d = diagnosticsOf((s) => { s.bars = [...s.bars, { steelId: 'b500', depth: 540, count: 2, diameter: 16 }]; });
    const e = at(d, `${R1}.bars[2]`);
    expect(e).toHaveLength(1);
    // Bar centres: 30 mm cover + 10 mm hoop + d/2 from the web's edge (x 48 mm for Ø16, 50 mm for Ø20).
    expect(e[0]!.message).toBe('its bars overlap those of bars[0]: a 16 mm bar at x 48 mm, depth 540 mm and a 20 mm bar at x 50 mm, depth 540 mm have centres 2 mm apart, at least 18 mm needed; the steel would be counted twice where it overlaps');
    expect(builderErrors((s) => { s.bars = [...s.bars, { steelId: 'b500', depth: 540, count: 2, diameter: 16 }]; }).map((x) => x.path)).toEqual([`${R1}.bars[2]`]);
  });

  it('a mixed row that fits (2 Ø25 at the corners, 1 Ø20 between) is accepted', () => {
    const d = diagnosticsOf((s) => { s.bars = [{ steelId: 'b500', depth: 540, count: 2, diameter: 25 }, { steelId: 'b500', depth: 540, count: 1, diameter: 20 }, s.bars[1]!]; });
    expect(d.filter((x) => x.path.startsWith(`${R1}.bars`))).toEqual([]);
  });

  it('a bar cutting into a void between the depths the builder samples is an error', () => {
    // The void's tip at (57, 525) lies 8.6 mm from the centre of the Ø20 bar at (50, 520).
    const edit = polygon(rect(0, 0, 400, 600), [[{ x: 57, y: 525 }, { x: 150, y: 522 }, { x: 150, y: 528 }]]);
    const withBar: Edit = (s) => { edit(s); s.bars = [{ steelId: 'b500', depth: 520, count: 2, diameter: 20 }, { steelId: 'b500', depth: 55, count: 2, diameter: 16 }]; };
    const e = at(diagnosticsOf(withBar), `${R1}.bars[0]`);
    expect(e.map((x) => x.message)).toEqual(['bar 1 of 2 (20 mm at x 50 mm, depth 520 mm) cuts into void 0']);
  });
});

describe('clear spacing of bars (warnings naming the clause)', () => {
  // 5 Ø25 in the 300 mm web: centres from 30 + 10 + 12.5 = 52.5 mm to 247.5 mm, pitch 48.75 mm, clear 23.75 mm.
  const fiveBars: Edit = (s) => { s.bars = [{ steelId: 'b500', depth: 540, count: 5, diameter: 25 }, s.bars[1]!]; };
  const fourBars: Edit = (s) => { s.bars = [{ steelId: 'b500', depth: 540, count: 4, diameter: 25 }, s.bars[1]!]; };

  it('ACI 318-19 25.2.1: the greatest of 25 mm, db and 4/3·dagg within a layer', () => {
    // ACI 318-19 25.2.1: max(1 in. (25 mm), db, 4/3·dagg) = max(25, 25, 26.7) mm with a 20 mm aggregate.
    expect(minimumClearSpacing('ACI 318-19', 25, 25, true).spacing).toBeCloseTo(80 / 3, 9);
    const w = at(diagnosticsOf(fiveBars), `${R1}.bars[0]`, 'warning');
    expect(w.map((x) => x.message)).toEqual(['the clear spacing of its bars, 23.75 mm, is less than 26.67 mm (ACI 318-19 25.2.1: the greatest of 25 mm, db and 4/3·dagg, with dagg = 20 mm assumed)']);
    // 4 Ø25: pitch 65 mm, clear 40 mm.
    expect(at(diagnosticsOf(fourBars), `${R1}.bars[0]`, 'warning')).toEqual([]);
  });

  it('ACI 318-19 25.2.2: 25 mm between layers', () => {
    // ACI 318-19 25.2.2: parallel layers at least 1 in. (25 mm) apart.
    expect(minimumClearSpacing('ACI 318-19', 20, 32, false).spacing).toBe(25);
    // A second row of 3 Ø20 30 mm above the first: clear 30 − 20 = 10 mm.
    const w = at(diagnosticsOf((s) => { s.bars = [...s.bars, { steelId: 'b500', depth: 510, count: 3, diameter: 20 }]; }), `${R1}.bars[2]`, 'warning');
    expect(w[0]?.message).toMatch(/^the clear distance between its bars and those of bars\[0\] is 10 mm .* less than 25 mm \(ACI 318-19 25\.2\.2/);
    // 45 mm apart: clear 25 mm, just enough.
    expect(at(diagnosticsOf((s) => { s.bars = [...s.bars, { steelId: 'b500', depth: 495, count: 3, diameter: 20 }]; }), `${R1}.bars[2]`, 'warning')).toEqual([]);
  });

  it('EN 1992-1-1 8.2(2): the greatest of k1·ø, dg + k2 and 20 mm, horizontally and vertically', () => {
    // EN 1992-1-1 8.2(2), recommended k1 = 1, k2 = 5 mm: max(25, 20 + 5, 20) = 25 mm for Ø25; 32 mm for Ø32.
    expect(minimumClearSpacing('EN 1992-1-1', 25, 25, true).spacing).toBe(25);
    expect(minimumClearSpacing('EN 1992-1-1', 32, 20, false).spacing).toBe(32);
    const w = at(diagnosticsOf(fiveBars, 'EN 1992-1-1'), `${R1}.bars[0]`, 'warning');
    expect(w[0]?.message).toMatch(/23\.75 mm, is less than 25 mm \(EN 1992-1-1 8\.2\(2\)/);
  });
});

describe('polygon outlines and voids', () => {
  it('a self-intersecting outline is an error naming the edges, not the bars', () => {
    // A 300 × 600 rectangle with points 1 and 2 typed in the wrong order: a bow-tie.
    const bowTie = polygon([{ x: 0, y: 0 }, { x: 300, y: 600 }, { x: 300, y: 0 }, { x: 0, y: 600 }]);
    const d = diagnosticsOf(bowTie);
    expect(at(d, `${R1}.shape.outline`).map((x) => x.message)).toEqual([
      'the outline crosses or touches itself: edge 0 (point 0 (x 0 mm, y 0 mm) to point 1 (x 300 mm, y 600 mm)) meets edge 2 (point 2 (x 300 mm, y 0 mm) to point 3 (x 0 mm, y 600 mm)); it must be a simple polygon',
    ]);
    expect(d.filter((x) => x.path.includes('.bars'))).toEqual([]);
    expect(builderErrors(bowTie).map((x) => x.path)).toEqual([`${R1}.shape.outline`]);
  });

  it('the coordinates follow the display units', () => {
    const p = project(polygon([{ x: 0, y: 0 }, { x: 300, y: 600 }, { x: 300, y: 0 }, { x: 0, y: 600 }]));
    const us = validateProjectData(JSON.parse(JSON.stringify({ ...p, info: { ...p.info, unitSystem: 'us' } }))).diagnostics;
    expect(at(us, `${R1}.shape.outline`)[0]?.message).toContain('point 1 (x 11.81 in, y 23.62 in)');
  });

  it('a void reaching outside the outline, a void outside it, overlapping and nested voids are errors', () => {
    const outline = rect(0, 0, 300, 600);
    expect(at(diagnosticsOf(polygon(outline, [rect(100, 200, 400, 300)])), `${R1}.shape.voids[0]`)[0]?.message)
      .toMatch(/^reaches the outline: its edge 0 \(point 0 \(x 100 mm, y 200 mm\) to point 1 \(x 400 mm, y 200 mm\)\) meets outline edge 1/);
    expect(at(diagnosticsOf(polygon(outline, [rect(500, 200, 600, 300)])), `${R1}.shape.voids[0]`)[0]?.message).toMatch(/^lies outside the outline/);
    expect(at(diagnosticsOf(polygon(outline, [rect(100, 200, 200, 300), rect(150, 250, 250, 350)])), `${R1}.shape.voids[1]`)[0]?.message).toMatch(/^overlaps voids\[0\]/);
    expect(at(diagnosticsOf(polygon(outline, [rect(50, 150, 250, 450), rect(100, 200, 200, 300)])), `${R1}.shape.voids[1]`)[0]?.message).toMatch(/nest/);
    // A void touching the outline leaves a wall of no thickness.
    expect(at(diagnosticsOf(polygon(outline, [rect(100, 200, 300, 300)])), `${R1}.shape.voids[0]`)).toHaveLength(1);
  });

  it('a box-like polygon with a proper void is accepted and analysed', () => {
    const edit = polygon(rect(0, 0, 400, 600), [rect(100, 150, 300, 400)]);
    expect(diagnosticsOf(edit).filter((d) => d.severity === 'error')).toEqual([]);
    expect(builderErrors(edit)).toEqual([]);
  });

  it('the zero-width spike a new concrete layer leaves in a strengthened outline is not a crossing', () => {
    // core/retrofit/outline.ts: depth added on top is a zero-width edge up to y = 0 at the top-left corner.
    const spiked = [{ x: 300, y: 50 }, { x: 300, y: 650 }, { x: 0, y: 650 }, { x: 0, y: 50 }, { x: 0, y: 0 }, { x: 0, y: 50 }];
    const edit: Edit = (s) => { polygon(spiked)(s); s.bars = [{ steelId: 'b500', depth: 600, count: 2, diameter: 20 }, { steelId: 'b500', depth: 110, count: 2, diameter: 16 }]; };
    expect(builderErrors(edit)).toEqual([]);
  });
});

describe('hoops and bars', () => {
  it('a non-whole number of hoop legs is an error with the allowed range', () => {
    const d = diagnosticsOf((s) => { s.hoops = { ...s.hoops!, verticalLegs: 2.5 }; });
    expect(at(d, `${R1}.hoops.verticalLegs`).map((x) => [x.code, x.message])).toEqual([['must-be-integer', 'must be a whole number of legs from 2 to 12, got 2.5']]);
    expect(at(diagnosticsOf((s) => { s.hoops = { ...s.hoops!, verticalLegs: 3 }; }), `${R1}.hoops.verticalLegs`)).toEqual([]);
  });

  it('a section without bars gets the no-tension-steel diagnostic', () => {
    const d = at(diagnosticsOf((s) => { s.bars = []; }), `${R1}.bars`, 'warning');
    expect(d.map((x) => x.code)).toEqual(['no-tension-steel']);
  });

  it('validation never rewrites what was typed', () => {
    const p = project((s) => { s.bars = [...s.bars, { ...s.bars[0]! }]; s.hoops = { ...s.hoops!, verticalLegs: 2.5 }; });
    const text = JSON.stringify(p);
    const { project: read } = validateProjectData(JSON.parse(text));
    expect(JSON.stringify(read)).toBe(text);
  });
});
