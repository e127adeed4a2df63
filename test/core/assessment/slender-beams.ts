/**
 * A slender 20 m simply supported beam (invented): 300 × 600, 4-T25 bottom, 2-T12 top, C30, B500,
 * 1 N/mm superimposed and 1 N/mm live. Its checks pass, but its load–deflection curve passes
 * span/50 = 400 mm at 1.5 × the service load, before its ultimate. SI internal units.
 */
import type { Project } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

export function slenderProject(): Project {
  const base = smallProject('ACI 318-19');
  return {
    ...base,
    sections: [{
      id: 'slender', name: '300 × 600 slender', shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30',
      bars: [{ steelId: 'b500', depth: 540, count: 4, diameter: 25 }, { steelId: 'b500', depth: 50, count: 2, diameter: 12 }],
      hoops: { steelId: 'b500', diameter: 10, spacing: 150, verticalLegs: 2, clearCover: 30, confineCore: false },
    }],
    members: [member('S-20', 'simply-supported', 20000, 'slender', {
      loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 1 }, { kind: 'uniform', loadCase: 'live', magnitude: 1 }],
      service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
    })],
  };
}

/** The start of the 20 m beam's reason (the load factor follows). */
export const REASON_20M = 'Load–deflection: outside the small-deflection range of the method — the curve passes span/50 = 400 mm at';
