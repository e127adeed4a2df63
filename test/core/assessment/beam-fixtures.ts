/**
 * Invented beams of the assessment tests (SI internal units): a 300 × 600 rectangle with given bars,
 * and the 60 m span of issue 17 whose load–deflection curve leaves the small-deflection range.
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

/**
 * The 60 m span of issue 17 on the fixtures' 300 × 600 section "r1" (it printed μΔ 3.3 and Δu 7.7 m):
 * its load–deflection curve passes span/50 = 1200 mm while still elastic, at 0.01 × its service load.
 */
export function longProject(): Project {
  return smallProject('ACI 318-19', [member('B-60', 'simply-supported', 60000, 'r1')]);
}

/** The 60 m beam's reason, in SI. */
export const REASON_60M = 'Load–deflection: outside the small-deflection range of the method — the curve passes span/50 = 1200 mm at 0.01 × the load pattern, before its tension steel first yields: the member is too flexible to be analysed as a beam; the ultimate deflection Δu and the displacement ductility μΔ are not given.';
