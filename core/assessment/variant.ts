/**
 * The one place that runs a beam variant (the design beam, the beam as found, or a strengthened
 * beam): its sections → the member engine (core/member) → the flexural strength check (flexure.ts)
 * → shear (shear.ts) → brittleness (brittle.ts) → status and governing mode (verdict.ts).
 * core/analysis.ts reaches it through assessMember (member.ts), and the comparison of an existing
 * beam's variants runs each of them here. A new check is a module called from assessBeam.
 * Pure and deterministic. Units: mm, N, N·mm, MPa.
 */
import { BugError, InputError, type Problem } from '../diagnostics.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import type { CodeBasis, UltimateStrainChoice } from '../materials/specs.ts';
import { analyzeBeam, unanalysedBeam, type MemberContext } from '../member/analyze.ts';
import type { BeamDefinition } from '../member/definition.ts';
import type { AddedItem, Library } from '../retrofit/types.ts';
import { analyzeSection, type SectionAnalysis } from '../section/analyze.ts';
import type { SectionAdditions } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BilinearMethod } from '../section/results.ts';
import { brittleFindings } from './brittle.ts';
import { strengthCombinations, type CombinationSettings } from './combinations.ts';
import { flexuralCheck } from './flexure.ts';
import type { MemberResult } from './results.ts';
import { memberShear, type ShearResult } from './shear.ts';
import type { ShearZone } from './shear-section.ts';
import type { AciEdition } from './shear-aci.ts';
import { memberVerdict } from './verdict.ts';

/** How the sections of a variant are analysed (the project's analysis settings). */
export interface SectionSettings {
  readonly momentDropFraction: number;
  readonly bilinearMethod: BilinearMethod;
  /** Where εcu of unconfined concrete comes from when a concrete says nothing (the project's setting). */
  readonly concreteUltimateStrain?: UltimateStrainChoice;
}

/** What every variant of a member shares. */
export interface Setup {
  /** The project's materials and sections. */
  readonly library: Library;
  readonly code: CodeBasis;
  /** Path of the member in the project file, e.g. `members[3] "B-12"`. */
  readonly path: string;
  readonly segments: number;
  readonly sectionSettings: SectionSettings;
  /** The project's unit system: which form of ACI's unit-dependent expressions applies (λs). */
  readonly unitSystem?: AciEdition;
  /** How the code's combinations are formed (EN 1990 6.10 or 6.10a/b, ψ0). */
  readonly combinations: CombinationSettings;
}

/** One analysed beam variant. */
export interface VariantRun {
  readonly key: string;
  readonly label: string;
  /** The member as analysed: zones point at the variant's section ids; added self-weight included. */
  readonly member: BeamDefinition;
  readonly analyses: ReadonlyMap<string, SectionAnalysis>;
  readonly definitions: ReadonlyMap<string, SectionDefinition>;
  /** Variant section id → library section id. */
  readonly baseOf: ReadonlyMap<string, string>;
  readonly added: ReadonlyMap<string, readonly AddedItem[]>;
  readonly result: MemberResult;
  readonly shear: ShearResult | null;
  readonly zones: readonly ShearZone[];
}

/** What a variant is made of. */
export interface VariantInput {
  readonly key: string;
  readonly label: string;
  readonly member: BeamDefinition;
  readonly definitions: ReadonlyMap<string, SectionDefinition>;
  readonly baseOf: ReadonlyMap<string, string>;
  readonly additions?: ReadonlyMap<string, SectionAdditions>;
  readonly added?: ReadonlyMap<string, readonly AddedItem[]>;
  readonly materials: MaterialLibrary;
  /** Analyses already at hand (shared project sections, or a reference's unchanged sections). */
  readonly analyses?: ReadonlyMap<string, SectionAnalysis>;
}

/**
 * The result of a member that could not be analysed because of an exception: an input error the
 * builders threw, or a defect (reported as such, never blamed on the input).
 */
export function notAnalysed(member: BeamDefinition, error: unknown, path: string): MemberResult {
  const message = error instanceof InputError
    ? error.message
    : `internal error (please report): ${error instanceof BugError ? error.message : String(error instanceof Error ? error.message : error)}`;
  return {
    ...unanalysedBeam(member, []),
    status: error instanceof InputError ? 'input-error' : 'not-converged',
    governingMode: `Not analysed: ${message.split('\n')[0]}`,
    strength: null,
    brittle: [],
    ductilityUnavailable: null,
    errors: error instanceof InputError ? error.diagnostics.map((d) => ({ path: d.path, message: d.message })) : [{ path, message }],
  };
}

/** The zones of a beam with their sections, definitions and concrete, for the checks. */
function checkZones(member: BeamDefinition, analyses: ReadonlyMap<string, SectionAnalysis>, definitions: ReadonlyMap<string, SectionDefinition>, materials: MaterialLibrary): ShearZone[] | null {
  const zones: ShearZone[] = [];
  for (const z of member.zones) {
    const analysis = analyses.get(z.sectionId);
    const definition = definitions.get(z.sectionId);
    const concrete = definition ? materials.concreteSpec(definition.concreteId) : undefined;
    if (!analysis || !definition || !concrete) return null;
    const stirrupYield = definition.hoops ? materials.steel(definition.hoops.steelId)?.yieldStress : undefined;
    zones.push({ from: z.from, to: z.to, definition, analysis, concrete, ...(stirrupYield !== undefined ? { stirrupYield } : {}) });
  }
  return zones;
}

/**
 * A beam through the pipeline: the member engine (core/member), the flexural strength check
 * (flexure.ts), shear (shear.ts), brittleness (brittle.ts) and the verdict (verdict.ts). Input
 * problems come back as an input-error result; exceptions propagate (runVariant reports them).
 */
function assessBeam(setup: Setup, member: BeamDefinition, context: MemberContext, zones: readonly ShearZone[] | null): { result: MemberResult; shear: ShearResult | null } {
  const beam = analyzeBeam(member, context);
  if (beam.inputErrors.length > 0 || !zones) {
    const count = Math.max(1, beam.inputErrors.length);
    return { result: { ...beam.result, status: 'input-error', governingMode: `Not analysed: ${count} input problem${count === 1 ? '' : 's'} to fix first.`, strength: null, brittle: [], ductilityUnavailable: null }, shear: null };
  }
  const { code } = setup;
  // A defect in one check must not cost the beam its other results: it is reported and the verdict
  // is withheld (status not-converged), never a silent pass.
  const defects: Problem[] = [];
  const guarded = <T>(what: string, run: () => T, fallback: T): T => {
    try {
      return run();
    } catch (error) {
      defects.push({ path: setup.path, message: `internal error in the ${what} (please report): ${error instanceof Error ? error.message : String(error)}` });
      return fallback;
    }
  };
  const combinations = strengthCombinations(member, code, setup.combinations);
  const strength = guarded('flexural strength check', () => flexuralCheck({ code, member, zones, combinations, segments: setup.segments }), null);
  const shear = zones.every((z) => z.analysis.model) ? guarded('shear check', () => memberShear({ code, member, zones, combinations, segments: setup.segments, ...(setup.unitSystem ? { edition: setup.unitSystem } : {}) }), null) : null;
  const brittle = guarded('brittleness check', () => brittleFindings(code, member.supports, zones, strength, shear, beam.result), []);
  const result = memberVerdict({ member, beam, strength, shear, brittle, defects });
  return { result, shear };
}

/** Analyses one variant: its sections and the whole pipeline (assessBeam); an exception becomes a reported result. */
export function runVariant(setup: Setup, input: VariantInput): VariantRun {
  const { code } = setup;
  const analyses = new Map<string, SectionAnalysis>();
  for (const id of new Set(input.member.zones.map((z) => z.sectionId))) {
    const given = input.analyses?.get(id);
    if (given) {
      analyses.set(id, given);
      continue;
    }
    const def = input.definitions.get(id);
    if (!def) continue;
    const additions = input.additions?.get(id);
    analyses.set(id, analyzeSection(def, `${setup.path} (${input.label}) section "${def.name}"`, input.materials, {
      code,
      momentDropFraction: setup.sectionSettings.momentDropFraction,
      bilinearMethod: setup.sectionSettings.bilinearMethod,
      ...(additions ? { additions } : {}),
    }));
  }
  const context: MemberContext = { code, segments: setup.segments, section: (id) => analyses.get(id), sectionIds: new Set(analyses.keys()), path: setup.path };
  const zones = checkZones(input.member, analyses, input.definitions, input.materials);
  let result: MemberResult;
  let shear: ShearResult | null = null;
  try {
    ({ result, shear } = assessBeam(setup, input.member, context, zones));
  } catch (error) {
    result = notAnalysed(input.member, error, setup.path);
  }
  return { key: input.key, label: input.label, member: input.member, analyses, definitions: input.definitions, baseOf: input.baseOf, added: input.added ?? new Map(), result, shear, zones: zones ?? [] };
}

/** Library sections of the member by id. */
export function librarySections(member: BeamDefinition, library: Library): Map<string, SectionDefinition> {
  const map = new Map<string, SectionDefinition>();
  for (const z of member.zones) {
    const s = library.sections.find((x) => x.id === z.sectionId);
    if (s) map.set(s.id, s);
  }
  return map;
}
