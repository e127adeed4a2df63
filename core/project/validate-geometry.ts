/**
 * Project validation's share of the geometry checks. Sections (core/section/geometry-checks.ts): the
 * clear-spacing warnings of the project's code and the section without bars, which the section
 * builder does not give, and — where the builder could not be run (no code basis, a missing
 * material, a bar layer's numbers out of range) — the geometry errors it would have given. Members
 * (core/member/proportions.ts): deep beams, which the member engine also refuses.
 */
import type { Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { memberProportionProblems } from '../member/proportions.ts';
import { barPositions, shapeHeight, validateShape } from '../section/build.ts';
import type { MemberDefinition } from './types.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { barLayoutProblems } from '../section/geometry-checks.ts';

/**
 * @param path the section's path, e.g. `sections[2] "S-3"`
 * @param built whether the section builder's own diagnostics (which hold the geometry errors) are reported
 */
export function sectionGeometryDiagnostics(section: SectionDefinition, path: string, code: CodeBasis | undefined, built: boolean): Diagnostic[] {
  // Bars are placed in the concrete only when the shape itself is sound (a broken outline is the shape's error, not the bars').
  if (validateShape(section.shape, `${path}.shape`).length > 0) return [];
  const all = barLayoutProblems(section, path, (layer) => barPositions(section, layer), { ...(code ? { code } : {}), ...(built ? {} : { containment: 'all' as const }) });
  return built ? all.filter((d) => d.severity === 'warning') : all;
}

/**
 * A member too short for its depth to be a beam (core/member/proportions.ts), against the heights of
 * the project's sections whose shapes are sound.
 * @param path the member's path, e.g. `members[3] "B-12"`
 */
export function memberGeometryDiagnostics(member: MemberDefinition, path: string, code: CodeBasis | undefined, sections: readonly SectionDefinition[]): Diagnostic[] {
  if (!code) return [];
  const heightOf = (id: string) => {
    const section = sections.find((s) => s.id === id);
    return section && validateShape(section.shape, 'shape').length === 0 ? shapeHeight(section.shape) : undefined;
  };
  return memberProportionProblems(member, path, code, heightOf);
}
