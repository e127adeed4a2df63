import { describe, expect, it } from 'vitest';
import { memberKeyResults } from '../../../core/project/key-results.ts';
import type { DeflectionCheck, PlasticHinge, SectionResult } from '../../../core/member/results.ts';
import type { MomentCurvatureResult } from '../../../core/section/results.ts';
import type { MemberDefinition } from '../../../core/project/types.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';

function curve(yieldMoment: number, ultimateMoment: number, ductility: number | null): MomentCurvatureResult {
  return {
    direction: 'sagging', status: { kind: 'complete', ultimateCause: 'concrete-crushing', message: '' }, points: [], keyPoints: {},
      concreteLimits: { codeCrushingStrain: 0.003, codeCrushingSource: 'ACI 318-19 22.2.2.1', ultimateStrain: null },
    bilinear: { method: 'priestley-2007', yieldCurvature: 1e-5, yieldMoment, ultimateCurvature: 1e-4, ultimateMoment, effectiveStiffness: 1, description: '' },
    curvatureDuctility: ductility, firstYieldCurvatureDuctility: null, warnings: [], solves: 0,
  };
}

const section = (id: string, sag: MomentCurvatureResult, hog: MomentCurvatureResult): SectionResult => ({
  sectionId: id, sectionName: `section ${id}`, elastic: {} as SectionResult['elastic'], sagging: sag, hogging: hog, selfWeight: 5, warnings: [],
});

const hinge = (position: number, direction: 'sagging' | 'hogging', sectionId: string, rotationCapacity: number): PlasticHinge => ({
  position, direction, sectionId, length: 300, lengthMethod: 'priestley-2007', lengthFormula: '', shearSpan: 2000, rotationCapacity, rotationAtUltimate: rotationCapacity, curvatureDuctility: 8,
  location: 'midspan', order: 1, yieldLoadFactor: 1, plasticZone: [2800, 3200], localised: true, localisationLoadFactor: 1.1, rotationParts: { spread: 0, localised: 0, penetration: 0 },
});

const check = (limitCase: DeflectionCheck['limitCase'], governing: number, limit: number): DeflectionCheck => ({
  limitCase, description: limitCase, quantity: '', ratio: 480, limit, byIntegration: governing, byCode: governing, governing, utilisation: governing / limit, pass: governing <= limit,
});

function result(overrides: Partial<MemberResult>): MemberResult {
  return {
    memberId: 'P-1', memberName: 'P-1', supports: 'propped-cantilever', span: 8000, status: 'ok', governingMode: 'mode',
    sections: [section('end', curve(300e6, 320e6, 6), curve(250e6, 260e6, 4)), section('mid', curve(200e6, 230e6, 12), curve(90e6, 95e6, 9))],
    loadDeflection: { pattern: '', controlPosition: 4000, points: [], events: [], status: '' },
    ductility: { firstYieldDeflection: 10, yieldDeflection: 12, ultimateDeflection: 60, displacementDuctility: 5, hinges: [], failureCause: '' },
    distributions: [], service: null, strength: null, brittle: [], ductilityUnavailable: null, warnings: ['w'], errors: [],
    ...overrides,
  };
}

describe('memberKeyResults', () => {
  it('takes the hinge nearest to the ultimate event, in its direction, with that section’s bilinear moments', () => {
    const r = result({
      loadDeflection: { pattern: '', controlPosition: 4000, points: [], status: '', events: [{ kind: 'ultimate', loadFactor: 2.4, deflection: 60, position: 4800, description: '' }] },
      ductility: { firstYieldDeflection: 10, yieldDeflection: 12, ultimateDeflection: 60, displacementDuctility: 5, failureCause: '', hinges: [hinge(0, 'hogging', 'end', 0.01), hinge(4700, 'sagging', 'mid', 0.03)] },
    });
    const k = memberKeyResults(r);
    expect(k.critical).toEqual({ sectionId: 'mid', sectionName: 'section mid', direction: 'sagging', position: 4700 });
    expect([k.yieldMoment, k.ultimateMoment, k.curvatureDuctility, k.plasticRotationCapacity, k.ultimateLoadFactor]).toEqual([200e6, 230e6, 12, 0.03, 2.4]);
    expect(k.displacementDuctility).toBe(5);
  });

  it('without hinges, takes the zone at the ultimate position and the sign of the moment there', () => {
    const definition = { zones: [{ from: 0, to: 1600, sectionId: 'end' }, { from: 1600, to: 8000, sectionId: 'mid' }] } as unknown as MemberDefinition;
    const r = result({
      loadDeflection: { pattern: '', controlPosition: 4000, points: [], status: '', events: [{ kind: 'ultimate', loadFactor: 1.7, deflection: 20, position: 0, description: '' }] },
      distributions: [{ label: 'ultimate', loadFactor: 1.7, x: [0, 4000, 8000], moment: [-250e6, 120e6, 0], curvature: [0, 0, 0], deflection: [0, 20, 0], hingeZones: [] }],
    });
    const k = memberKeyResults(r, definition);
    expect(k.critical).toMatchObject({ sectionId: 'end', direction: 'hogging', position: 0 });
    expect(k.yieldMoment).toBe(250e6);
    expect(k.plasticRotationCapacity).toBeNull();
  });

  it('reports the deflection check with the highest utilisation and counts the failing ones', () => {
    const service = { checks: [check('aci-floor-immediate', 5, 20), check('aci-sensitive-after-attachment', 18, 16.9), check('custom', 10, 30)] } as unknown as MemberResult['service'];
    const k = memberKeyResults(result({ service }));
    expect(k.deflection).toMatchObject({ limitCase: 'aci-sensitive-after-attachment', deflection: 18, limit: 16.9, pass: false });
    expect([k.deflectionChecksFailed, k.deflectionChecks]).toEqual([1, 3]);
  });

  it('gives null, never NaN or Infinity, for values that do not exist', () => {
    const r = result({
      sections: [], ductility: { firstYieldDeflection: null, yieldDeflection: null, ultimateDeflection: null, displacementDuctility: Number.NaN, hinges: [], failureCause: '' },
      strength: { combination: '', combinations: [], position: 0, sectionId: '', direction: 'sagging', demand: 0, resistance: null, saggingDemand: 0, saggingPosition: 0, hoggingDemand: 0, hoggingPosition: 0, saggingResistance: null, hoggingResistance: null, zones: [], utilisation: Number.POSITIVE_INFINITY, pass: false, notes: '' },
    });
    const k = memberKeyResults(r);
    expect(k.critical).toBeNull();
    expect([k.yieldMoment, k.ultimateMoment, k.displacementDuctility, k.strengthUtilisation, k.deflection]).toEqual([null, null, null, null, null]);
    expect(k.strengthPass).toBe(false);
  });

  it('names each moment for what it is: first yield, the idealisation\'s yield (never first yield in its place), the peak', () => {
    const withPoints = (c: MomentCurvatureResult, firstYield: number, peak: number): MomentCurvatureResult => ({
      ...c,
      keyPoints: {
        firstYield: { name: 'firstYield', curvature: 1e-6, moment: firstYield } as NonNullable<MomentCurvatureResult['keyPoints']['firstYield']>,
        peak: { name: 'peak', curvature: 1e-4, moment: peak } as NonNullable<MomentCurvatureResult['keyPoints']['peak']>,
      },
    });
    const hinged = { firstYieldDeflection: 10, yieldDeflection: 12, ultimateDeflection: 60, displacementDuctility: 5, failureCause: '', hinges: [hinge(4000, 'sagging', 'mid', 0.03)] };
    // First yield above the idealised yield (a curve that dips after first yield): both are shown, each by its name.
    const mid = withPoints(curve(200e6, 230e6, 12), 215e6, 236e6);
    const k = memberKeyResults(result({ sections: [section('mid', mid, curve(90e6, 95e6, 9))], ductility: hinged }));
    expect([k.firstYieldMoment, k.yieldMoment, k.peakMoment]).toEqual([215e6, 200e6, 236e6]);
    // A curve without an idealisation has no My: first yield never stands in for it.
    const { bilinear: _b, ...bare } = mid;
    const k2 = memberKeyResults(result({ sections: [section('mid', bare, curve(90e6, 95e6, 9))], ductility: hinged }));
    expect([k2.firstYieldMoment, k2.yieldMoment]).toEqual([215e6, null]);
  });

  it('says for an existing beam whether it needs strengthening and how the preferred scheme fares', () => {
    const definition = { zones: [], asFound: {}, schemes: [{ kind: 'frp', id: 'f1', name: 'CFRP' }], preferredSchemeId: 'f1' } as unknown as MemberDefinition;
    const scheme = { schemeId: 'f1', name: 'CFRP', variant: { status: 'ok' } } as unknown as NonNullable<MemberResult['retrofit']>['schemes'][number];
    const retrofit = { schemes: [scheme] } as unknown as MemberResult['retrofit'];
    const k = memberKeyResults(result({ status: 'check-fails', retrofit }), definition);
    expect(k.strengthening).toEqual({ needed: true, schemes: 1, preferred: { schemeId: 'f1', name: 'CFRP', status: 'ok' } });
    expect(memberKeyResults(result({ status: 'ok', retrofit }), { ...definition, preferredSchemeId: undefined } as MemberDefinition).strengthening).toEqual({ needed: false, schemes: 1, preferred: null });
    // A member without any as-found data or schemes is not an existing-beam case.
    expect(memberKeyResults(result({}), { zones: [] } as unknown as MemberDefinition).strengthening).toBeNull();
  });
});
