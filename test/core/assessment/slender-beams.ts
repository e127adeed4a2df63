/**
 * Invented beams of the assessment tests. A slender 20 m simply supported beam: 300 × 600, 4-T25 bottom, 2-T12 top, C30, B500,
 * 1 N/mm superimposed and 1 N/mm live. Its checks pass, but its load–deflection curve passes
 * span/50 = 400 mm at 1.5 × the service load, before its ultimate. SI internal units.
 */
import type { Project } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

/** A 300 × 600 rectangle of the fixtures' C30 and B500: `bottom` bars at d = 540, `top` bars at 50 mm, Ø10 two-leg hoops at 150. */
export function rectangle300x600(id: string, name: string, bottom: { count: number; diameter: number }, top: { count: number; diameter: number }): SectionDefinition {
  return {
    id, name, shape: { kind: 'rectangle', width: 300, height: 600 }, concreteId: 'c30',
    bars: [{ steelId: 'b500', depth: 540, ...bottom }, { steelId: 'b500', depth: 50, ...top }],
    hoops: { steelId: 'b500', diameter: 10, spacing: 150, verticalLegs: 2, clearCover: 30, confineCore: false },
  };
}

export function slenderProject(): Project {
  const base = smallProject('ACI 318-19');
  return {
    ...base,
    sections: [rectangle300x600('slender', '300 × 600 slender', { count: 4, diameter: 25 }, { count: 2, diameter: 12 })],
    members: [member('S-20', 'simply-supported', 20000, 'slender', {
      loads: [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 1 }, { kind: 'uniform', loadCase: 'live', magnitude: 1 }],
      service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
    })],
  };
}

/** The start of the 20 m beam's reason (the load factor follows). */
export const REASON_20M = 'Load–deflection: outside the small-deflection range of the method — the curve passes span/50 = 400 mm at';
