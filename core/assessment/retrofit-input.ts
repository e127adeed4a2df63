/**
 * The input checks of an existing beam's as-found condition and strengthening schemes: the one rule
 * set that project validation (core/project/validate.ts, `hingeline validate`) and the assessment
 * (member.ts, `hingeline analyze`) both apply, so the two never disagree. Beyond the field checks of
 * core/retrofit/validate.ts it derives what the analysis derives — the as-found materials and sections
 * (a coupon yield stress outside the law's range, cover loss that leaves nothing) — and builds the
 * sections the schemes make (a bonded item wider than its face, bars outside a new layer). Checks
 * that need an analysis (a strengthening installed above the beam's capacity) stay with the analysis.
 * Every problem carries the path of the field to fix and the allowed range.
 * Units: mm, MPa.
 */
import { diagnostic, errorsOf, InputError, reworded, type Diagnostic } from '../diagnostics.ts';
import { materialLibrary, type MaterialLibrary, type MaterialSettings } from '../materials/library.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { BeamDefinition } from '../member/definition.ts';
import { deriveAsFound, derivedId, type AsFoundDerivation } from '../retrofit/as-found.ts';
import { concreteLayerSection, exposedElements, faceOf, type ReferenceSection } from '../retrofit/schemes.ts';
import type { AsFoundCondition, FrpScheme, Library, SteelPlateScheme, StrengtheningScheme } from '../retrofit/types.ts';
import { MAX_SCHEMES, validateAsFound, validateSchemes } from '../retrofit/validate.ts';
import { buildSectionModel } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { phrase, q } from '../units/phrase.ts';

/**
 * A bonded item (FRP, plate) wider than the face it is bonded to, or null.
 * @param at path of the scheme, e.g. `members[0] "B1".schemes[1]`
 */
export function bondedWidthProblem(scheme: FrpScheme | SteelPlateScheme, definition: SectionDefinition, baseSectionId: string, at: string): Diagnostic | null {
  const face = scheme.face ?? 'bottom';
  const width = faceOf(definition, face).width;
  if (!(scheme.width > width + 1e-6)) return null;
  return diagnostic('out-of-range', `${at}.width`, 'error', phrase`must be at most the ${q('sectionLength', width, { compact: true })} width of the ${face} face of section "${baseSectionId}", got ${q('sectionLength', scheme.width, { compact: true })}`);
}

/** The problems of building a derived section (the engine's own checks), placed on `path` and prefixed with what the section is. */
function buildProblems(definition: SectionDefinition, materials: MaterialLibrary, path: string, what: string, additions = {}): Diagnostic[] {
  try {
    buildSectionModel(definition, materials, path, additions);
    return [];
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return error.diagnostics.filter((d) => d.severity === 'error').map((d) => ({ ...reworded(d, `${what}: `), path }));
  }
}

/** The reference section a scheme strengthens: the as-found derived section, or the library section. */
function referenceOf(baseId: string, library: Library, derivation: AsFoundDerivation | null): ReferenceSection | null {
  const d = derivation?.sections.get(baseId);
  if (d) return { id: d.id, baseSectionId: baseId, definition: d.definition, exposedBars: d.exposedBars };
  const definition = library.sections.find((s) => s.id === baseId);
  return definition ? { id: baseId, baseSectionId: baseId, definition, exposedBars: [] } : null;
}

/** The scheme's own section problems on each section it strengthens. */
function schemeProblems(scheme: StrengtheningScheme, member: BeamDefinition, library: Library, derivation: AsFoundDerivation | null, materials: MaterialLibrary, at: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  const targets = scheme.sectionIds ?? [...new Set(member.zones.map((z) => z.sectionId))];
  for (const baseId of targets) {
    const ref = referenceOf(baseId, library, derivation);
    if (!ref) continue; // an unknown section id is a field error of validateSchemes
    if (scheme.kind === 'concrete-layer') {
      const built = concreteLayerSection(ref, scheme, derivedId(baseId, member.id, scheme.id), materials, at);
      if (Array.isArray(built)) out.push(...built);
    } else {
      const wide = bondedWidthProblem(scheme, ref.definition, baseId, at);
      if (wide) out.push(wide);
    }
  }
  return out;
}

export interface RetrofitInputSettings extends MaterialSettings {
  /** Path of the member in the project file, e.g. `members[3] "B-12"`. */
  readonly path: string;
  readonly code: CodeBasis;
}

/**
 * Every input problem of a member's as-found condition and strengthening schemes (see the module
 * comment), errors and warnings, with field paths below `${path}.asFound` and `${path}.schemes`.
 */
export function retrofitInputProblems(member: BeamDefinition & { readonly asFound?: AsFoundCondition; readonly schemes?: readonly StrengtheningScheme[] }, library: Library, settings: RetrofitInputSettings): Diagnostic[] {
  const { path, code } = settings;
  const out: Diagnostic[] = [];
  let derivation: AsFoundDerivation | null = null;
  if (member.asFound) {
    const at = `${path}.asFound`;
    const fields = validateAsFound(member.asFound, member, library, at);
    out.push(...fields);
    if (errorsOf(fields).length === 0) {
      const d = deriveAsFound(member, member.asFound, library, code, path);
      out.push(...d.diagnostics.filter((x) => x.severity === 'error'));
      if (errorsOf(d.diagnostics).length === 0 && !d.unchanged) {
        derivation = d;
        const materials = materialLibrary([...library.materials, ...d.materials], code, settings);
        for (const s of d.sections.values()) {
          const exposed = exposedElements(s.exposedBars, materials);
          out.push(...buildProblems(s.definition, materials, at, `as-found section "${s.baseSectionId}"`, exposed.elements.length > 0 ? { elements: exposed.elements } : {}));
        }
      }
    }
  }
  const schemes = member.schemes ?? [];
  if (schemes.length > 0) {
    const fields = validateSchemes(schemes, member, library, `${path}.schemes`);
    out.push(...fields);
    // The sections a scheme makes are built on the beam as it stands: only once that is known; and
    // not for more schemes than a member may have (each is a full analysis; the field checks say so).
    if (member.asFound && errorsOf(out).length > errorsOf(fields).length) return out;
    if (schemes.length > MAX_SCHEMES) return out;
    const materials = materialLibrary([...library.materials, ...(derivation?.materials ?? [])], code, settings);
    schemes.forEach((scheme, i) => {
      const at = `${path}.schemes[${i}]`;
      const own = fields.filter((p) => p.severity === 'error' && (p.path === at || p.path.startsWith(`${at}.`) || p.path.startsWith(`${at}[`)));
      if (own.length === 0) out.push(...schemeProblems(scheme, member, library, derivation, materials, at));
    });
  }
  return out;
}
