/**
 * A member of the project assessed as a whole: the design beam (library data) and, for an existing
 * beam, its as-found beam and each strengthening scheme — each run as a variant (variant.ts: the
 * sections, the member engine, the strength check and shear), derived by core/retrofit, and
 * compared (compact.ts):
 *
 *   design beam (library data) ───────────────────┐
 *   as-found beam (derived by core/retrofit) ──────┼─ runVariant → compact results and comparisons
 *   each scheme (derived from the as-found beam) ──┘
 *
 * The member's main result describes the beam as it is: the as-found beam when a valid condition
 * is given, otherwise the design beam. `retrofit` holds the design beam, the as-found beam and each
 * scheme compactly, with curve points for shared charts. Input problems of the condition or of a
 * scheme are reported on the member (path, value, range) without losing the other results; a
 * scheme that cannot be built is reported and the others go on.
 *
 * Pure and deterministic. Units: mm, N, N·mm, MPa.
 */
import { errorsOf, warningsOf, type Diagnostic, type Problem } from '../diagnostics.ts';
import { materialLibrary, type MaterialLibrary } from '../materials/library.ts';
import { unanalysedBeam, type MemberContext } from '../member/analyze.ts';
import type { BeamDefinition, MemberLoad } from '../member/definition.ts';
import { deriveAsFound, type AsFoundDerivation } from '../retrofit/as-found.ts';
import { exposedElements } from '../retrofit/schemes.ts';
import type { AddedItem, AsFoundCondition, Library, StrengtheningScheme } from '../retrofit/types.ts';
import { MAX_SCHEMES, validateAsFound, validateSchemes } from '../retrofit/validate.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { SectionAdditions } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { phrase, type Text } from '../units/phrase.ts';
import { compactOf } from './compact.ts';
import { RETROFIT_CAUTION, type MemberResult, type RetrofitResult, type SchemeResult } from './results.ts';
import { buildScheme, describeScheme } from './scheme.ts';
import type { CombinationSettings } from './combinations.ts';
import { librarySections, runVariant, type SectionSettings, type Setup, type VariantRun } from './variant.ts';
import { prefixed } from './verdict.ts';
import { retrofitInputProblems } from './retrofit-input.ts';

/** What is known of an existing beam as it stands (core/retrofit). */
export interface RetrofitInput {
  readonly asFound?: AsFoundCondition;
  readonly schemes?: readonly StrengtheningScheme[];
}

/** A member to assess: the beam and, for an existing beam, its as-found condition and schemes. */
export type AssessedMember = BeamDefinition & RetrofitInput;

/** What the assessment of one member needs from its project. */
export interface AssessmentContext extends MemberContext {
  /** The project's materials and sections (variants derive from them). */
  readonly library: Library;
  readonly sectionSettings: SectionSettings;
  /** The project's unit system (the form of ACI's unit-dependent expressions). */
  readonly unitSystem?: Setup['unitSystem'];
  /** How the code's strength combinations are formed (the project settings). */
  readonly combinations: CombinationSettings;
}

/** A member zone list pointing at other section ids. */
function withZones(member: BeamDefinition, idOf: (libraryId: string) => string, extraLoads: readonly MemberLoad[] = []): BeamDefinition {
  return { ...member, zones: member.zones.map((z) => ({ ...z, sectionId: idOf(z.sectionId) })), loads: [...member.loads, ...extraLoads] };
}

/** Analysis of an as-found derivation as a variant. */
function asFoundRun(setup: Setup, member: BeamDefinition, derivation: AsFoundDerivation, key: string, label: string): { run: VariantRun; materials: MaterialLibrary } {
  const materials = materialLibrary([...setup.library.materials, ...derivation.materials], setup.code, setup.sectionSettings);
  const definitions = new Map<string, SectionDefinition>();
  const baseOf = new Map<string, string>();
  const additions = new Map<string, SectionAdditions>();
  const added = new Map<string, readonly AddedItem[]>();
  for (const d of derivation.sections.values()) {
    definitions.set(d.id, d.definition);
    baseOf.set(d.id, d.baseSectionId);
    const exposed = exposedElements(d.exposedBars, materials);
    if (exposed.elements.length > 0) {
      additions.set(d.id, { elements: exposed.elements });
      added.set(d.id, exposed.added);
    }
  }
  const variantMember = withZones(member, (id) => derivation.sections.get(id)?.id ?? id);
  return { run: runVariant(setup, { key, label, member: variantMember, definitions, baseOf, additions, added, materials }), materials };
}

/**
 * Assesses a member with its shear and, when given, its as-found condition and strengthening
 * schemes. Returns the member's result (see the module comment) with `shear` and `retrofit`.
 * A defect in the design beam's analysis is reported on its result (runVariant); one in the
 * retrofit analysis is reported on the design beam's result.
 * @param context the project's shared section analyses, library and settings
 */
export function assessMember(member: AssessedMember, context: AssessmentContext): MemberResult {
  const setup: Setup = { library: context.library, code: context.code, path: context.path, segments: context.segments, sectionSettings: context.sectionSettings, combinations: context.combinations, ...(context.unitSystem ? { unitSystem: context.unitSystem } : {}) };
  const designSections = librarySections(member, context.library);
  const designAnalyses = new Map<string, SectionAnalysis>();
  for (const z of member.zones) {
    const a = context.section(z.sectionId);
    if (a) designAnalyses.set(z.sectionId, a);
  }
  const designRun = runVariant(setup, {
    key: 'original', label: 'Design beam', member, definitions: designSections, baseOf: new Map([...designSections.keys()].map((id) => [id, id])),
    materials: materialLibrary(context.library.materials, context.code, context.sectionSettings), analyses: designAnalyses,
  });
  try {
    return extend(member, setup, designRun);
  } catch (error) {
    // A defect in the retrofit analysis must not cost the member its design-beam results.
    const design = designRun.result;
    const message = `internal error in the retrofit analysis (please report): ${String(error instanceof Error ? error.message : error)}`;
    return { ...design, errors: [...design.errors, { path: context.path, message }] };
  }
}

/**
 * The result of a member whose as-found condition or schemes have input errors: not analysed as it
 * stands (no numbers of the design beam in its place), with the problems; `retrofit` keeps the design
 * beam compactly for reference.
 */
function retrofitInputError(member: AssessedMember, setup: Setup, designRun: VariantRun, problems: readonly Diagnostic[]): MemberResult {
  const errors = errorsOf(problems);
  const count = errors.length;
  const where = member.asFound && problems.some((p) => p.severity === 'error' && p.path.startsWith(`${setup.path}.asFound`)) ? 'the as-found condition' : 'the strengthening schemes';
  const retrofit: RetrofitResult = {
    basis: 'design', original: compactOf(setup, designRun, 'Design beam: '), asFound: null, referenceKey: 'original', schemes: [],
    derivedMaterials: [], caution: RETROFIT_CAUTION, warnings: warningsOf(problems), errors,
  };
  return {
    ...unanalysedBeam(member, []),
    status: 'input-error',
    governingMode: `Not analysed: ${count} input problem${count === 1 ? '' : 's'} in ${where} to fix first.`,
    strength: null,
    brittle: [],
    ductilityUnavailable: null,
    retrofit,
    errors,
  };
}

function extend(member: AssessedMember, setup: Setup, designRun: VariantRun): MemberResult {
  const library = setup.library;
  const design = designRun.result;
  const hasRetrofit = member.asFound !== undefined || (member.schemes !== undefined && member.schemes.length > 0);
  if (design.status === 'input-error') {
    if (!hasRetrofit) return design;
    const problems = [
      ...(member.asFound ? validateAsFound(member.asFound, member, library, `${setup.path}.asFound`) : []),
      ...(member.schemes ? validateSchemes(member.schemes, member, library, `${setup.path}.schemes`) : []),
    ];
    return { ...design, errors: [...design.errors, ...errorsOf(problems)] };
  }
  const libraryMaterials = materialLibrary(library.materials, setup.code, setup.sectionSettings);
  if (!hasRetrofit) return design;

  // The input checks `validate` makes too (retrofit-input.ts): with an error there the beam as it
  // stands is not known, so the member is an input error, not the design beam's verdict.
  const inputProblems = retrofitInputProblems(member, library, { ...setup.sectionSettings, code: setup.code, path: setup.path });
  if (errorsOf(inputProblems).length > 0) return retrofitInputError(member, setup, designRun, inputProblems);

  const warnings: Text[] = [];
  const errors: Problem[] = [];

  // --- as found ------------------------------------------------------------------------------------
  let derivation: AsFoundDerivation | null = null;
  let found: { run: VariantRun; materials: MaterialLibrary } | null = null;
  if (member.asFound) {
    derivation = deriveAsFound(member, member.asFound, library, setup.code, setup.path);
    errors.push(...errorsOf(derivation.diagnostics));
    warnings.push(...warningsOf(derivation.diagnostics));
    if (errors.length === 0) {
      if (derivation.unchanged) warnings.push(`${setup.path}.asFound: gives no core, steel or defect data: the as-found beam is the design beam.`);
      else {
        found = asFoundRun(setup, member, derivation, 'as-found', 'As found');
        if (found.run.result.status === 'input-error') {
          // The engine refused a derived section: report why and keep the design beam as the result.
          errors.push(...found.run.result.errors.map((e) => ({ path: e.path, message: phrase`as-found beam: ${e.message}` })));
          found = null;
        }
      }
    }
  }
  const reference = found?.run ?? designRun;
  const referenceMaterials = found?.materials ?? libraryMaterials;
  const designCompact = compactOf(setup, designRun, 'Design beam: ');
  const referenceCompact = found ? compactOf(setup, found.run, 'As found: ') : designCompact;

  // --- schemes --------------------------------------------------------------------------------------
  const schemeResults: SchemeResult[] = [];
  // Too many schemes (core/retrofit/validate.ts MAX_SCHEMES): none is analysed, the error says why.
  const tooManySchemes = (member.schemes?.length ?? 0) > MAX_SCHEMES;
  const schemes = tooManySchemes ? [] : member.schemes ?? [];
  if (tooManySchemes) errors.push(...errorsOf(validateSchemes(member.schemes ?? [], member, library, `${setup.path}.schemes`)));
  if (schemes.length > 0) {
    const schemeProblems = validateSchemes(schemes, member, library, `${setup.path}.schemes`);
    const asFoundBroken = member.asFound !== undefined && errors.length > 0;
    let repaired: { derivation: AsFoundDerivation; run: VariantRun; materials: MaterialLibrary } | null | undefined;
    const repairedReference = () => {
      if (repaired !== undefined) return repaired;
      if (!member.asFound || !derivation || derivation.unchanged) return (repaired = null);
      const hasSpalls = (member.asFound.defects ?? []).some((d) => d.kind === 'cover-loss');
      if (!hasSpalls) return (repaired = null);
      const d = deriveAsFound(member, member.asFound, library, setup.code, setup.path, { repairSpalls: true, variant: 'repaired' });
      if (d.diagnostics.some((x) => x.severity === 'error')) return (repaired = null);
      const r = asFoundRun(setup, member, d, 'repaired', 'As found, spalls repaired');
      return (repaired = { derivation: d, ...r });
    };
    schemes.forEach((scheme, index) => {
      const at = `${setup.path}.schemes[${index}]`;
      const own = schemeProblems.filter((p) => p.path === at || p.path.startsWith(`${at}.`) || p.path.startsWith(`${at}[`));
      const description = describeScheme(scheme);
      const base: SchemeResult = {
        schemeId: String(scheme.id), name: String(scheme.name), kind: scheme.kind, description,
        variant: null, frp: null, installation: [], comparison: null, lossOfStrengthening: null, checks: [],
        warnings: warningsOf(own), errors: errorsOf(own),
      };
      if (asFoundBroken) {
        schemeResults.push({ ...base, errors: [...base.errors, { path: at, message: 'not analysed: fix the as-found condition first' }] });
        return;
      }
      if (base.errors.length > 0) {
        schemeResults.push(base);
        return;
      }
      const rep = scheme.repairSpalls ? repairedReference() : null;
      const ref = rep?.run ?? reference;
      const refMaterials = rep?.materials ?? referenceMaterials;
      const refDerivation = rep?.derivation ?? (found ? derivation : null);
      schemeResults.push(buildScheme(setup, {
        member, scheme, at, base,
        reference: { run: ref, materials: refMaterials, derivation: refDerivation },
        comparison: { run: reference, compact: referenceCompact },
        derivedSpecs: found ? [...(derivation?.materials ?? []), ...(rep?.derivation.materials ?? [])] : [],
      }));
    });
  }

  const asFoundResult: RetrofitResult['asFound'] = member.asFound && derivation
    ? { ...derivation.summary, variant: found ? referenceCompact : null }
    : null;
  const retrofit: RetrofitResult = {
    basis: found ? 'as-found' : 'design',
    original: designCompact,
    asFound: asFoundResult,
    referenceKey: found ? 'as-found' : 'original',
    schemes: schemeResults,
    derivedMaterials: derivation?.materials ?? [],
    caution: RETROFIT_CAUTION,
    warnings,
    errors,
  };
  const main = found ? found.run.result : design;
  const schemeErrors = schemeResults.flatMap((s) => s.errors);
  return {
    ...main,
    governingMode: prefixed(main.governingMode, found ? 'As found: ' : ''),
    retrofit,
    warnings: [...main.warnings, ...warnings, ...schemeResults.flatMap((s) => s.warnings.map((w) => phrase`Scheme "${s.name}": ${w}`))],
    errors: [...main.errors, ...errors, ...schemeErrors],
  };
}
