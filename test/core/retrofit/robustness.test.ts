/**
 * A defect inside a check is reported on the member without losing its flexural results, and the
 * verdict is withheld (the defect is simulated by making the shear assessment throw).
 */
import { describe, expect, it, vi } from 'vitest';
import { say } from '../../../core/units/phrase.ts';
import { analyzeProject } from '../../../core/analysis.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, retrofitProject } from './retrofit-project.ts';
import type * as Shear from '../../../core/assessment/shear.ts';

vi.mock('../../../core/assessment/shear.ts', async (importOriginal) => ({
  ...(await importOriginal<typeof Shear>()),
  memberShear: () => {
    throw new Error('simulated defect');
  },
}));

describe('a defect in the shear check', () => {
  it('keeps the beam\'s flexural results, names the defect on the member and withholds the verdict (never OK)', () => {
    const r = analyzeProject(retrofitProject('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME] })).members[0]!;
    expect(r.status).toBe('not-converged');
    expect(r.loadDeflection.points.length).toBeGreaterThan(10);
    expect(r.strength).not.toBeNull();
    expect(r.shear).toBeUndefined();
    expect(r.errors.map((e) => say(e.message, 'si'))).toContain('internal error in the shear check (please report): simulated defect');
    expect(r.retrofit!.schemes[0]!.variant!.status).toBe('not-converged');
  });
});
