/**
 * The member analysis with shear, the as-found condition and strengthening schemes, through the
 * project entry point (core/analysis.ts).
 */
import { say } from '../../../core/units/phrase.ts';
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { shapeHeight } from '../../../core/section/build.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, OVERLAY_SCHEME, PLATE_SCHEME, plainAndFinite, retrofitProject } from './retrofit-project.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

const analyse = (...args: Parameters<typeof retrofitProject>): MemberResult => analyzeProject(retrofitProject(...args)).members[0]!;

describe('a member without retrofit data', () => {
  it('gains a shear result and a shear part in its governing mode, and no retrofit result', () => {
    const r = analyse();
    expect(r.shear!.capacities.length).toBeGreaterThan(0);
    expect(r.retrofit).toBeUndefined();
    expect(say(r.governingMode, 'si')).toMatch(/; shear: flexure governs/);
    expect(say(r.governingMode, 'si').match(/\./g)!.length).toBeGreaterThan(0);
  });
});

describe('as found, with three schemes', () => {
  const r = analyse('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME, PLATE_SCHEME, OVERLAY_SCHEME] });
  const rf = r.retrofit!;

  it('the main result is the as-found beam (derived section ids), with the design beam beside it', () => {
    expect(rf.basis).toBe('as-found');
    expect(r.sections.map((s) => s.sectionId)).toEqual(['r1~B1~as-found']);
    expect(say(r.governingMode, 'si')).toMatch(/^As found: /);
    expect(rf.original!.key).toBe('original');
    expect(rf.original!.sections[0]!.sectionId).toBe('r1');
    expect(rf.asFound!.variant!.key).toBe('as-found');
    expect(rf.referenceKey).toBe('as-found');
    expect(rf.errors).toEqual([]);
    expect(rf.caution).toMatch(/qualified engineer/);
  });

  it('the as-found beam is weaker than designed: 20.1 MPa concrete and 12 % bar loss outweigh the 520 MPa coupons', () => {
    const design = rf.original!.sections[0]!.curves.find((c) => c.direction === 'sagging')!;
    const found = rf.asFound!.variant!.sections[0]!.curves.find((c) => c.direction === 'sagging')!;
    expect(found.peakMoment!).toBeLessThan(design.peakMoment!);
    expect(rf.asFound!.defects.map((d) => d.note)).toEqual(['bottom bars pitted near midspan', 'soffit spalled']);
    expect(rf.derivedMaterials.map((m) => m.id).sort()).toEqual(['b500~B1~as-found', 'b500~B1~as-found-r1-L1', 'c30~B1~as-found']);
  });

  it('each variant carries the curves for shared charts: moment–curvature and load–deflection points', () => {
    for (const v of [rf.original!, rf.asFound!.variant!, ...rf.schemes.map((s) => s.variant!)]) {
      expect(v.sections[0]!.curves[0]!.points.length).toBeGreaterThan(10);
      expect(v.loadDeflection.points.length).toBeGreaterThan(10);
      expect(say(v.governingMode, 'si').length).toBeGreaterThan(20);
    }
  });

  it('FRP: the substrate strain at installation is the element\'s initial strain (tension negative) and the debonding limit governs', () => {
    const s = rf.schemes[0]!;
    expect(s.errors).toEqual([]);
    expect(s.frp!.limitCause).toBe('frp-debonding');
    expect(s.frp!.concreteStrength).toBeCloseTo(rf.asFound!.concrete[0]!.inPlace.strength, 10); // εfd uses the in-place f′c
    const inst = s.installation[0]!;
    expect(inst.strain).toBeLessThan(0);
    expect(inst.method).toBe('cracked-elastic');
    expect(inst.otherMethodStrain).not.toBeNull();
    const frp = s.variant!.sections[0]!.added.find((a) => a.kind === 'frp')!;
    expect(frp.initialStrain).toBe(inst.strain);
    expect(frp.depth).toBeCloseTo(580, 9); // on the spalled soffit
    // Dead + superimposed at installation on the simple span: M = (4.24 + 8) × 6000²/8 = 55.1 kN·m (less the spalled self-weight)
    expect(inst.moment / 1e6).toBeCloseTo(((2400 * 9.80665 * 300 * 580 * 1e-9 + 8) * 36e6) / 8 / 1e6, 1);
  });

  it('FRP: strength rises, ductility falls, and the statement says so plainly', () => {
    const c = rf.schemes[0]!.comparison!;
    const critical = c.moments.find((m) => m.direction === 'sagging')!;
    expect(critical.designGainPercent!).toBeGreaterThan(5);
    expect(c.memberCapacity.gainPercent!).toBeGreaterThan(5);
    expect(c.curvatureDuctility.changePercent!).toBeLessThan(-2);
    expect(say(c.statement, 'si')).toMatch(/lowers the ductility/);
    expect(c.hingeRotation.scheme!).toBeLessThan(c.hingeRotation.reference!);
  });

  it('the design resistance of the FRP section takes ψf = 0.85 off the FRP\'s part', () => {
    const curve = rf.schemes[0]!.variant!.sections[0]!.curves.find((k) => k.direction === 'sagging')!;
    expect(say(curve.designResistanceNote, 'si')).toMatch(/ψf/);
  });

  it('the ACI 440.2R-17 9.2 check uses the as-found member under 1.1 SD + 0.75 LL, for bonded schemes only', () => {
    const frp = rf.schemes[0]!.lossOfStrengthening!;
    expect(frp.combination).toMatch(/1\.1 SD \+ 0\.75 LL/);
    expect(frp.check.pass).toBe(true);
    // Same demand and resistance for the plate (both are checked against the same as-found beam).
    expect(rf.schemes[1]!.lossOfStrengthening!.check.utilisation).toBeCloseTo(frp.check.utilisation, 12);
    expect(rf.schemes[2]!.lossOfStrengthening).toBeNull();
    // By hand: wu = 1.1 (self-weight + 8) + 0.75 × 12, M = wu L²/8 at midspan
    const sw = 2400 * 9.80665 * 300 * 580 * 1e-9;
    expect(frp.check.demand / 1e6).toBeCloseTo(((1.1 * (sw + 8) + 0.75 * 12) * 36e6) / 8 / 1e6, 3);
  });

  it('overlay: a 75 mm C40 layer on top, its bars 40 mm down, the section 75 mm deeper, its weight added as dead load', () => {
    const s = rf.schemes[2]!;
    expect(s.errors).toEqual([]);
    const section = s.variant!.sections[0]!;
    expect(shapeHeight(section.definition.shape)).toBeCloseTo(655, 9); // 580 as found + 75
    const overlay = section.added.find((a) => a.kind === 'overlay')!;
    expect([overlay.top, overlay.bottom, overlay.width]).toEqual([0, 75, 300]);
    expect(section.added.find((a) => a.kind === 'bar' && !a.exposed)!.depth).toBe(40);
    expect(section.definition.bars.map((b) => b.depth)).toEqual([615, 130]);
    expect(s.comparison!.moments.find((m) => m.direction === 'sagging')!.peakGainPercent!).toBeGreaterThan(5);
  });

  it('results are plain data with finite numbers only', () => {
    expect(plainAndFinite(rf)).toEqual([]);
    expect(plainAndFinite(r.shear)).toEqual([]);
    expect(JSON.parse(JSON.stringify(rf)).schemes).toHaveLength(3);
  });
});

describe('options', () => {
  it('schemes without an as-found condition strengthen the design beam', () => {
    const r = analyse('ACI 318-19', { schemes: [FRP_SCHEME] });
    expect(r.retrofit!.basis).toBe('design');
    expect(r.retrofit!.asFound).toBeNull();
    expect(r.retrofit!.referenceKey).toBe('original');
    expect(r.sections[0]!.sectionId).toBe('r1');
    expect(r.retrofit!.schemes[0]!.variant!.sections[0]!.added.find((a) => a.kind === 'frp')!.depth).toBe(600);
  });

  it('repairSpalls bonds the FRP to the restored soffit (600 mm), compared with the spalled as-found beam', () => {
    const r = analyse('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [{ ...FRP_SCHEME, repairSpalls: true }] });
    const s = r.retrofit!.schemes[0]!;
    expect(s.variant!.sections[0]!.added.find((a) => a.kind === 'frp')!.depth).toBe(600);
    expect(s.comparison!.referenceKey).toBe('as-found');
  });

  it('the moment–curvature method for the installation strain gives the value the cracked-elastic run reports as the other method', () => {
    const elastic = analyse('ACI 318-19', { schemes: [FRP_SCHEME] }).retrofit!.schemes[0]!.installation[0]!;
    const curve = analyse('ACI 318-19', { schemes: [{ ...FRP_SCHEME, installationStrainMethod: 'moment-curvature' }] }).retrofit!.schemes[0]!.installation[0]!;
    expect(curve.method).toBe('moment-curvature');
    expect(curve.strain).toBeCloseTo(elastic.otherMethodStrain!, 12);
    // Below cracking-to-yield the tension-stiffened curve gives a smaller strain than the cracked section.
    expect(Math.abs(curve.strain)).toBeLessThan(Math.abs(elastic.strain));
  });

  it('a scheme on one zone only leaves the other zones on the reference section', () => {
    const r = analyse('ACI 318-19', {
      zones: [{ from: 0, to: 1000, sectionId: 't1' }, { from: 1000, to: 6000, sectionId: 'r1' }],
      schemes: [{ ...FRP_SCHEME, sectionIds: ['r1'] }],
    });
    const v = r.retrofit!.schemes[0]!.variant!;
    expect(v.sections.map((s) => s.sectionId)).toEqual(['t1', 'r1~B1~frp2']);
  });

  it('EN 1992-1-1 basis: the in-place strength is the 5 % value of EN 1990 Annex D', () => {
    const r = analyse('EN 1992-1-1', { asFound: { cores: [{ meanStrength: 35, count: 6, coefficientOfVariation: 0.1 }] }, schemes: [FRP_SCHEME] });
    expect(r.retrofit!.asFound!.concrete[0]!.inPlace.strength).toBeCloseTo(27.37, 10);
    expect(r.retrofit!.asFound!.concrete[0]!.inPlace.method).toMatch(/EN 1990/);
    expect(say(r.retrofit!.schemes[0]!.variant!.sections[0]!.curves[0]!.designResistanceNote, 'si')).toMatch(/M_Rd/);
    expect(plainAndFinite(r.retrofit)).toEqual([]);
  });
});
