/**
 * As-found strengths (issue 11 item 3): the measured mean of the cores for behaviour (laws, Ec,
 * tensile strength, deflections), the lower fractile for the code checks (ACI 214.4R-10 f′c,eq,
 * EN 1990 Annex D fck,is), both carried by the derived material; under EN fcm is the measured mean,
 * never fck,is + 8.
 */
import { describe, expect, it } from 'vitest';
import { buildConcrete } from '../../core/materials/build/concrete.ts';
import { resolveConcrete } from '../../core/materials/build/concrete-defaults.ts';
import type { ConcreteSpec } from '../../core/materials/specs.ts';
import { deriveAsFound } from '../../core/retrofit/as-found.ts';
import { aciCoreToleranceFactor, en1990CharacteristicFactor } from '../../core/retrofit/in-place-strength.ts';
import { retrofitProject } from '../core/retrofit/retrofit-project.ts';

const project = retrofitProject();
const member = project.members[0]!;
const cores = { meanStrength: 27, count: 4, coefficientOfVariation: 0.12 };

describe('as-found concrete: mean for behaviour, lower fractile for the code checks', () => {
  it('ACI basis: f′c,eq = f̄c(1 − K·V) is the strength, the mean 27 MPa drives the laws, Ec and fr', () => {
    const d = deriveAsFound(member, { cores: [cores] }, project, 'ACI 318-19', 'members[0] "B1"');
    const spec = d.materials.find((m) => m.kind === 'concrete') as ConcreteSpec;
    // ACI 214.4R-10 tolerance-factor approach (from memory), K(n = 4) = 2.134 (Natrella 1963, Table A-7)
    expect(spec.strength).toBeCloseTo(27 * (1 - aciCoreToleranceFactor(4) * 0.12), 10);
    expect(spec.meanStrength).toBe(27);
    const r = resolveConcrete(spec, 'ACI 318-19');
    expect(r.modelStrength).toBe(27);
    // ACI 318-19 Eq. (19.2.2.1.b) and Eq. (19.2.3.1) with the mean strength
    expect(r.elasticModulus).toBeCloseTo(4700 * Math.sqrt(27), 9);
    expect(r.codeTensileStrength).toBeCloseTo(0.62 * Math.sqrt(27), 9);
    // Hognestad (1951): the curve peaks at f″c = 0.85 f′c — here of the mean
    expect(buildConcrete(spec, 'ACI 318-19').cover.peakStress).toBeCloseTo(0.85 * 27, 9);
  });

  it('EN basis: fck,is = f̄c(1 − kn·V) is the strength, and fcm is the measured mean, not fck,is + 8', () => {
    const d = deriveAsFound(member, { cores: [cores] }, project, 'EN 1992-1-1', 'members[0] "B1"');
    const spec = d.materials.find((m) => m.kind === 'concrete') as ConcreteSpec;
    // EN 1990 Annex D, Eq. (D.1) with Table D1, kn(n = 4) = 2.63 for VX unknown (from memory)
    expect(en1990CharacteristicFactor(4)).toBe(2.63);
    const fckIs = 27 * (1 - 2.63 * 0.12);
    expect(spec.strength).toBeCloseTo(fckIs, 10);
    const r = resolveConcrete(spec, 'EN 1992-1-1');
    expect(r.modelStrength).toBe(27);
    expect(r.modelStrength).toBeGreaterThan(fckIs + 8);
    // EN 1992-1-1 Table 3.1: Ecm = 22 (fcm/10)^0.3 GPa, fctm = 0.30 fck^(2/3) with fck = fcm − 8
    expect(r.elasticModulus).toBeCloseTo(22_000 * (27 / 10) ** 0.3, 6);
    expect(r.tensileStrength).toBeCloseTo(0.3 * (27 - 8) ** (2 / 3), 9);
    // EN 1992-1-1 Eq. (3.14): the nonlinear law peaks at fcm
    expect(buildConcrete({ ...spec, compressionModel: 'en1992-nonlinear' }, 'EN 1992-1-1').cover.peakStress).toBeCloseTo(27, 9);
  });

  it('a mean below the strength it is the mean of is refused, naming the field', () => {
    const built = () => buildConcrete({ kind: 'concrete', id: 'c', name: 'c', strength: 30, meanStrength: 25, compressionModel: 'hognestad', tensionModel: 'linear-brittle' }, 'ACI 318-19', undefined, { path: 'materials[0]' });
    expect(built).toThrow(/meanStrength|mean compressive strength/);
  });
});
