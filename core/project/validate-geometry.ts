/**
 * Project validation's share of the section geometry checks (core/section/geometry-checks.ts): the
 * clear-spacing warnings of the project's code and the section without bars, which the section
 * builder does not give, and — where the builder could not be run (no code basis, a missing
 * material, a bar layer's numbers out of range) — the geometry errors it would have given.
 */
import type { Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { barPositions, validateShape } from '../section/build.ts';
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
