/**
 * A defect inside the shear or retrofit analysis is reported on the member without losing its
 * flexural results (the defect is simulated by making the shear assessment throw).
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

describe('a defect in the shear or retrofit analysis', () => {
  it('keeps the design beam\'s results and names the defect on the member', () => {
    const r = analyzeProject(retrofitProject('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME] })).members[0]!;
    expect(r.status).not.toBe('input-error');
    expect(r.loadDeflection.points.length).toBeGreaterThan(10);
    expect(r.sections[0]!.sectionId).toBe('r1');
    expect(say(r.errors.at(-1)!.message, 'si')).toMatch(/^internal error in the shear or retrofit analysis \(please report\): simulated defect/);
    expect(r.retrofit).toBeUndefined();
  });
});
