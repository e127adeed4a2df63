/**
 * Derivation of the as-found beam: what each kind of data changes in the material specs and the
 * section definitions the engine then analyses unchanged.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { deriveAsFound } from '../../../core/retrofit/as-found.ts';
import { corrodedRuptureStrainFactor } from '../../../core/retrofit/corrosion.ts';
import { aciCoreToleranceFactor } from '../../../core/retrofit/in-place-strength.ts';
import type { AsFoundCondition } from '../../../core/retrofit/types.ts';
import type { ConcreteSpec, SteelSpec } from '../../../core/materials/specs.ts';
import { shapeHeight } from '../../../core/section/build.ts';
import { retrofitProject } from './retrofit-project.ts';

const project = retrofitProject();
const member = project.members[0]!;
const derive = (condition: AsFoundCondition, options = {}) => deriveAsFound(member, condition, project, 'ACI 318-19', 'members[0] "B1"', options);

describe('tested strengths', () => {
  it('cores replace the specified strength of the member\'s concrete by f′c,eq (new id with the member and variant)', () => {
    const d = derive({ cores: [{ meanStrength: 27, count: 4, coefficientOfVariation: 0.12 }] });
    expect(d.diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
    const spec = d.materials.find((m) => m.kind === 'concrete') as ConcreteSpec;
    expect(spec.id).toBe('c30~B1~as-found');
    expect(spec.strength).toBeCloseTo(27 * (1 - aciCoreToleranceFactor(4) * 0.12), 10);
    expect(spec.compressionModel).toBe('hognestad'); // the rest of the spec is kept
    const section = d.sections.get('r1')!;
    expect(section.id).toBe('r1~B1~as-found');
    expect(section.definition.concreteId).toBe('c30~B1~as-found');
    expect(say(d.summary.concrete[0]!.inPlace.formula, 'si')).toMatch(/f′c,eq/);
    // 27 → 20.1 MPa: more than 25 % below the specified 30 MPa, which is said
    expect(d.diagnostics.some((x) => x.severity === 'warning' && /below the specified/.test(x.message))).toBe(true);
  });

  it('coupons replace fy and fu of a steel for every bar and stirrup that uses it', () => {
    const d = derive({ steel: [{ steelId: 'b500', source: 'coupons', yieldStress: 520, ultimateStress: 640 }] });
    const spec = d.materials.find((m) => m.kind === 'steel') as SteelSpec;
    expect(spec.yieldStress).toBe(520);
    expect(spec.ultimateStress).toBe(640);
    expect(spec.hardeningStrain).toBe(0.01); // kept from the library steel
    const def = d.sections.get('r1')!.definition;
    expect(def.bars.every((b) => b.steelId === 'b500~B1~as-found')).toBe(true);
    expect(def.hoops!.steelId).toBe('b500~B1~as-found');
  });

  it('a coupon yield above the library fu without a coupon fu is an error on that entry', () => {
    const d = derive({ steel: [{ steelId: 'b500', source: 'coupons', yieldStress: 700 }] });
    const errors = d.diagnostics.filter((x) => x.severity === 'error');
    expect(errors.length).toBeGreaterThan(0);
    expect(errors[0]!.path).toMatch(/asFound\.steel\[0\]\.ultimateStress/);
    expect(d.sections.size).toBe(0);
  });
});

describe('corrosion section loss', () => {
  it('15 % on layer 0 (3 × 20 mm): bars of 20√0.85 = 18.44 mm, a corroded steel with εsu × 0.1521·0.15^−0.4583', () => {
    const d = derive({ defects: [{ kind: 'section-loss', layer: 0, lossPercent: 15 }] });
    const layer = d.sections.get('r1')!.definition.bars[0]!;
    expect(layer.count).toBe(3);
    expect(layer.diameter).toBeCloseTo(20 * Math.sqrt(0.85), 10);
    const steel = d.materials.find((m) => m.id === layer.steelId) as SteelSpec;
    expect(steel.ruptureStrain).toBeCloseTo(0.1 * corrodedRuptureStrainFactor(0.15), 12);
    expect(d.sections.get('r1')!.definition.bars[1]!.diameter).toBe(16); // other layers untouched
    expect(say(d.summary.defects[0]!.effect, 'si')).toMatch(/942\.5 mm² → 801\.1 mm²/);
  });

  it('two defects on one layer add up (10 % + 5 % = 15 %)', () => {
    const d = derive({ defects: [{ kind: 'section-loss', layer: 0, lossPercent: 10 }, { kind: 'section-loss', sectionId: 'r1', layer: 0, lossPercent: 5 }] });
    expect(d.sections.get('r1')!.definition.bars[0]!.diameter).toBeCloseTo(20 * Math.sqrt(0.85), 10);
  });

  it('100 % loss removes the layer and says so', () => {
    const d = derive({ defects: [{ kind: 'section-loss', layer: 1, lossPercent: 100 }] });
    const def = d.sections.get('r1')!.definition;
    expect(def.bars).toHaveLength(1);
    expect(d.sections.get('r1')!.changes.join(' ')).toMatch(/lost entirely/);
  });

  it('stirrups: 30 % loss gives 10√0.7 = 8.37 mm legs; 90 % (3.2 mm) loses them', () => {
    const d = derive({ defects: [{ kind: 'section-loss', layer: 'hoops', lossPercent: 30 }] });
    expect(d.sections.get('r1')!.definition.hoops!.diameter).toBeCloseTo(10 * Math.sqrt(0.7), 10);
    const gone = derive({ defects: [{ kind: 'section-loss', layer: 'hoops', lossPercent: 90 }] });
    expect(gone.sections.get('r1')!.definition.hoops).toBeUndefined();
  });
});

describe('spalled cover', () => {
  it('20 mm off the soffit keeps the bottom bars (their underside at 550 mm) embedded in the 580 mm section', () => {
    const d = derive({ defects: [{ kind: 'cover-loss', face: 'bottom', depth: 20 }] });
    const s = d.sections.get('r1')!;
    expect(s.definition.shape.kind).toBe('polygon');
    expect(shapeHeight(s.definition.shape)).toBeCloseTo(580, 9);
    expect(s.exposedBars).toEqual([]);
    expect(s.definition.bars[0]!.depth).toBe(540);
  });

  it('70 mm off the soffit exposes the bottom bars: they leave the definition and become bars outside the concrete', () => {
    const d = derive({ defects: [{ kind: 'cover-loss', face: 'bottom', depth: 70, note: 'delaminated' }] });
    const s = d.sections.get('r1')!;
    expect(s.exposedBars).toHaveLength(1);
    expect(s.exposedBars[0]!.depth).toBe(540);
    expect(s.exposedBars[0]!.area).toBeCloseTo(3 * Math.PI * 100, 9);
    expect(s.definition.bars.map((b) => b.depth)).toEqual([55]);
    expect(s.changes.join(' ')).toMatch(/exposed by spalling/);
    expect(d.summary.defects[0]!.note).toBe('delaminated');
  });

  it('top cover loss shifts depths up; the confined core of a spalled section is switched off with a warning', () => {
    const teeProject = { ...project, members: [{ ...member, zones: [{ from: 0, to: 6000, sectionId: 't1' }] }] };
    const d = deriveAsFound(teeProject.members[0]!, { defects: [{ kind: 'cover-loss', face: 'top', depth: 10 }] }, teeProject, 'ACI 318-19', 'm');
    const s = d.sections.get('t1')!;
    expect(s.shift).toBe(10);
    expect(s.definition.bars.map((b) => b.depth)).toEqual([530, 45]);
    expect(s.definition.hoops!.confineCore).toBe(false);
    expect(d.diagnostics.some((x) => x.severity === 'warning' && /confined core/.test(x.message))).toBe(true);
  });

  it('repairing the spalls leaves the outline as designed', () => {
    const d = derive({ defects: [{ kind: 'cover-loss', face: 'bottom', depth: 70 }] }, { repairSpalls: true, variant: 'repaired' });
    const s = d.sections.get('r1')!;
    expect(s.definition.shape.kind).toBe('rectangle');
    expect(s.id).toBe('r1~B1~repaired');
    expect(say(d.summary.defects[0]!.effect, 'si')).toBe('repaired');
  });
});

it('a condition with no data changes nothing and says so', () => {
  const d = derive({ notes: 'visual survey only' });
  expect(d.unchanged).toBe(true);
  expect(d.materials).toEqual([]);
});
