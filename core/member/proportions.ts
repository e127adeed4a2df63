/**
 * Whether a member is a beam at all for the methods of this program: plane sections, curvature
 * integrated along the span, hinges — beam theory. A member whose span is short against its depth
 * is a deep beam, which carries load by struts and ties instead (its strain is not linear over the
 * depth), and the code sends it to other methods:
 *  - ACI 318-19 9.9.1.1(a): a deep beam has a clear span ln of at most four times its overall depth h;
 *  - EN 1992-1-1 5.3.1(3): a beam has a span of at least three times its overall depth; a shorter
 *    one is a deep beam.
 * A cantilever of length L has the moment and shear of half a simple span of 2L (statics: the tip
 * is the simple span's midspan by symmetry), so the rule is applied to 2L.
 * h is the deepest section of the member's zones. Units: mm.
 */
import { diagnostic, type Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { phrase, q } from '../units/phrase.ts';
import type { BeamDefinition } from './definition.ts';

/** The least span-to-depth ratio of a beam under each code, and the clause. */
export function deepBeamLimit(code: CodeBasis): { readonly ratio: number; readonly inclusive: boolean; readonly clause: string } {
  return code === 'ACI 318-19'
    ? { ratio: 4, inclusive: true, clause: 'ACI 318-19 9.9.1.1(a): a clear span of at most 4h is a deep beam' }
    : { ratio: 3, inclusive: false, clause: 'EN 1992-1-1 5.3.1(3): a span of less than 3h is a deep beam' };
}

/**
 * A deep member is an error on its span (nothing else is checked when the span or a zone's section
 * height is not known).
 * @param heightOf overall height of a section by id, mm (undefined when not known)
 * @param path e.g. `members[3] "B-12"`
 */
export function memberProportionProblems(member: BeamDefinition, path: string, code: CodeBasis, heightOf: (sectionId: string) => number | undefined): Diagnostic[] {
  if (!(Number.isFinite(member.span) && member.span > 0) || !Array.isArray(member.zones) || member.zones.length === 0) return [];
  let depth = 0;
  for (const z of member.zones) {
    const h = heightOf(z.sectionId);
    if (h === undefined || !Number.isFinite(h)) return [];
    depth = Math.max(depth, h);
  }
  if (!(depth > 0)) return [];
  const cantilever = member.supports === 'cantilever';
  const length = cantilever ? 2 * member.span : member.span;
  const limit = deepBeamLimit(code);
  const ratio = length / depth;
  const deep = limit.inclusive ? ratio <= limit.ratio : ratio < limit.ratio;
  if (!deep) return [];
  const len = (mm: number) => q('spanLength', mm, { compact: true });
  const times = (Math.floor(ratio * 100) / 100).toFixed(2);
  const least = (limit.ratio * depth) / (cantilever ? 2 : 1);
  const what = cantilever
    ? phrase`twice the cantilever's length, ${len(length)} (a cantilever acts as half a simple span of twice its length), is ${times} times the depth of ${q('sectionLength', depth, { compact: true })}`
    : phrase`the span, ${len(length)}, is ${times} times the depth of ${q('sectionLength', depth, { compact: true })}`;
  return [diagnostic('geometry', `${path}.span`, 'error', phrase`${what}: a deep beam (${limit.clause}), outside the beam theory of this program; the ${cantilever ? 'length' : 'span'} must be ${limit.inclusive ? 'more than' : 'at least'} ${len(least)}`)];
}
