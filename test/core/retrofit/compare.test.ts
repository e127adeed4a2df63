/**
 * The comparison of a strengthened beam with the beam it strengthens: gains in percent worked by
 * hand, and the plain statement — a ductility loss is said, and so is a scheme that adds nothing at
 * ultimate.
 */
import { describe, expect, it } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { compareVariants } from '../../../core/assessment/compact.ts';
import type { UltimateCause } from '../../../core/section/results.ts';
import type { CurveSummary, VariantResult } from '../../../core/assessment/results.ts';

function variant(key: string, o: { peak: number; design: number; firstYield: number; cause: UltimateCause; phiDuctility: number; mu: number; load: number; theta: number }): VariantResult {
  const curve: CurveSummary = {
    direction: 'sagging', points: [], keyPoints: [], ultimateCause: o.cause, status: '', peakMoment: o.peak, firstYieldMoment: o.firstYield,
    curvatureDuctility: o.phiDuctility, designResistance: o.design, designResistanceNote: '',
  };
  return {
    key, label: key, status: 'ok', governingMode: `${key} sentence`,
    sections: [{ sectionId: `s~${key}`, baseSectionId: 's', sectionName: 's', definition: { id: 's', name: 's', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c', bars: [] }, added: [], curves: [curve] }],
    loadDeflection: { pattern: '', controlPosition: 3000, points: [], events: [] },
    capacity: { peakLoadFactor: 1, peakTotalLoad: o.load, ultimateDeflection: 50, failureCause: '' },
    ductility: {
      available: true, note: '', yieldDeflection: 10, ultimateDeflection: 10 * o.mu, displacementDuctility: o.mu,
      hinges: [{ position: 3000, direction: 'sagging', sectionId: `s~${key}`, length: 300, lengthMethod: 'priestley-2007', lengthFormula: '', shearSpan: 6000, rotationCapacity: o.theta, rotationAtUltimate: o.theta, curvatureDuctility: o.phiDuctility, location: 'midspan', order: 1, yieldLoadFactor: 1, plasticZone: [2800, 3200], localised: true, localisationLoadFactor: 1.1, rotationParts: { spread: 0, localised: o.theta, penetration: 0 } }],
    },
    strength: { combination: '', combinations: [], utilisation: 0.8, pass: true, position: 3000, sectionId: `s~${key}`, direction: 'sagging', demand: 1, resistance: o.design, saggingDemand: 1, saggingPosition: 3000, saggingResistance: o.design, hoggingDemand: 0, hoggingPosition: 0, hoggingResistance: null, zones: [], notes: '' },
    deflectionChecks: [], shear: null, warnings: [], errors: [],
  };
}

const reference = variant('as-found', { peak: 240e6, design: 200e6, firstYield: 180e6, cause: 'concrete-crushing', phiDuctility: 8, mu: 4, load: 300e3, theta: 0.02 });

describe('comparison with the reference beam', () => {
  it('gains and changes in percent: 200 → 250 kN·m is +25 %, μΔ 4 → 2 is −50 %; the ductility loss is said plainly', () => {
    const scheme = variant('frp', { peak: 290e6, design: 250e6, firstYield: 210e6, cause: 'frp-debonding', phiDuctility: 3, mu: 2, load: 360e3, theta: 0.005 });
    const c = compareVariants(reference, scheme, 'CFRP');
    const m = c.moments[0]!;
    expect(m.designGainPercent).toBeCloseTo(25, 10);
    expect(m.peakGainPercent).toBeCloseTo((290 / 240 - 1) * 100, 10);
    expect(m.firstYieldGainPercent).toBeCloseTo((210 / 180 - 1) * 100, 10);
    expect(c.memberCapacity.gainPercent).toBeCloseTo(20, 10);
    expect(c.displacementDuctility.changePercent).toBeCloseTo(-50, 10);
    expect(c.hingeRotation.changePercent).toBeCloseTo(-75, 10);
    expect(c.critical).toEqual({ baseSectionId: 's', direction: 'sagging' });
    expect(say(c.statement, 'si')).toBe('CFRP: design moment +25 % at section "s" sagging (200 kN·m → 250 kN·m), member load capacity +20 %; displacement ductility falls from 4.0 to 2.0 (−50 %) and curvature ductility falls from 8.0 to 3.0 (−63 %): the strengthening lowers the ductility.');
  });

  it('an FRP that debonds before the unstrengthened beam\'s hardened capacity: "adds no strength at ultimate", with the first-yield gain', () => {
    const scheme = variant('frp', { peak: 230e6, design: 190e6, firstYield: 200e6, cause: 'frp-debonding', phiDuctility: 2, mu: 1.5, load: 290e3, theta: 0.004 });
    const c = compareVariants(reference, scheme, 'CFRP');
    expect(say(c.statement, 'si')).toMatch(/design moment −5 %/);
    expect(say(c.statement, 'si')).toMatch(/at ultimate the scheme adds no strength: the FRP reaches its debonding limit before the unstrengthened section develops its strain-hardened capacity/);
    expect(say(c.statement, 'si')).toMatch(/raises the first-yield moment by \+11 %/);
  });

  it('ductility within ±2 % is "practically unchanged" and not called a loss', () => {
    const scheme = variant('overlay', { peak: 300e6, design: 260e6, firstYield: 230e6, cause: 'concrete-crushing', phiDuctility: 7.9, mu: 3.95, load: 380e3, theta: 0.02 });
    const c = compareVariants(reference, scheme, 'Overlay');
    expect(say(c.statement, 'si')).toMatch(/displacement ductility practically unchanged \(4\.0 → 4\.0\)/);
    expect(say(c.statement, 'si')).not.toMatch(/lowers the ductility/);
  });
});
