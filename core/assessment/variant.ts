/**
 * The one place that runs a beam variant (the design beam, the beam as found, or a strengthened
 * beam): its sections → the member engine (core/member) → the strength check → shear → status and
 * governing mode. core/analysis.ts reaches it through assessMember (member.ts), and the comparison
 * of an existing beam's variants runs each of them here.
 * Pure and deterministic. Units: mm, N, N·mm, MPa.
 */
import { BugError, InputError } from '../diagnostics.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import type { CodeBasis, UltimateStrainChoice } from '../materials/specs.ts';
import { analyzeBeam, unanalysedBeam, type MemberContext } from '../member/analyze.ts';
import type { BeamDefinition } from '../member/definition.ts';
import type { AddedItem, Library } from '../retrofit/types.ts';
import { analyzeSection, type SectionAnalysis } from '../section/analyze.ts';
import type { SectionAdditions } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BilinearMethod } from '../section/results.ts';
import { strengthCombination } from './combinations.ts';
import type { MemberResult } from './results.ts';
import { memberShear, type ShearResult } from './shear.ts';
import type { ShearZone } from './shear-section.ts';
import type { AciEdition } from './shear-aci.ts';
import { memberStrength } from './strength.ts';
import { OUTSIDE_SMALL_DEFLECTION, serviceOutsideRange } from '../member/small-deflection.ts';

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
  /** Result already at hand (the design beam). */
  readonly result?: MemberResult;
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
    errors: error instanceof InputError ? error.diagnostics.map((d) => ({ path: d.path, message: d.message })) : [{ path, message }],
  };
}

/**
 * A beam through the member engine and its strength check: status and governing mode (before
 * shear). Input problems come back as an input-error result.
 */
export function assessBeam(member: BeamDefinition, context: MemberContext): MemberResult {
  const beam = analyzeBeam(member, context);
  if (beam.inputErrors.length > 0) {
    const count = beam.inputErrors.length;
    return { ...beam.result, status: 'input-error', governingMode: `Not analysed: ${count} input problem${count === 1 ? '' : 's'} to fix first.`, strength: null };
  }
  const analyses = member.zones.map((z) => context.section(z.sectionId)!);
  const strength = memberStrength(member, analyses, context.code, context.segments);
  const { text: combination } = strengthCombination(member, context.code);
  const result = beam.result;
  const checks = result.service?.checks ?? [];
  const serviceFails = checks.filter((c) => !c.pass);
  const status: MemberResult['status'] = !beam.converged ? 'not-converged' : serviceFails.length > 0 || !strength.pass ? 'check-fails' : 'ok';
  const proportional = member.capacity.pattern === 'proportional';
  const parts: string[] = [];
  const capacity = beam.capacity;
  if (capacity && capacity.ultimateLoadFactor !== null) {
    const mu = result.ductility.displacementDuctility;
    parts.push(`Flexure: ${capacity.failureCause} at ${capacity.ultimateLoadFactor.toFixed(2)} × the ${proportional ? 'service load' : 'live load (dead load held)'}${mu ? `, displacement ductility μΔ = ${mu.toFixed(1)}` : ''}`);
  } else if (capacity) {
    parts.push(`Flexure: ${capacity.status}`);
  }
  parts.push(`strength check ${strength.pass ? 'passes' : 'fails'} (utilisation ${strength.utilisation.toFixed(2)} under ${combination})`);
  if (serviceFails.length > 0) {
    const worst = serviceFails.reduce((a, b) => (b.utilisation > a.utilisation ? b : a));
    parts.push(serviceOutsideRange(result.service, result.span) ? `deflection checks fail: ${OUTSIDE_SMALL_DEFLECTION}` : `deflection check fails: ${worst.utilisation.toFixed(2)} × ℓ/${worst.ratio} (${worst.quantity})`);
  } else if (checks.length > 0) {
    parts.push('deflection checks pass');
  }
  return { ...result, status, governingMode: `${parts.join('; ')}.`, strength };
}

/** assessBeam, with an unexpected exception turned into a reported result. */
function safeAssessBeam(member: BeamDefinition, context: MemberContext): MemberResult {
  try {
    return assessBeam(member, context);
  } catch (error) {
    return notAnalysed(member, error, context.path);
  }
}

/** Analyses one variant: its sections, the member, and its shear. */
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
    if (!def) throw new BugError(`variant ${input.key}: no definition for section ${id}`);
    const additions = input.additions?.get(id);
    analyses.set(id, analyzeSection(def, `${setup.path} (${input.label}) section "${def.name}"`, input.materials, {
      code,
      momentDropFraction: setup.sectionSettings.momentDropFraction,
      bilinearMethod: setup.sectionSettings.bilinearMethod,
      ...(additions ? { additions } : {}),
    }));
  }
  const context: MemberContext = { code, segments: setup.segments, section: (id) => analyses.get(id), sectionIds: new Set(analyses.keys()), path: setup.path };
  const result = input.result ?? safeAssessBeam(input.member, context);
  const zones: ShearZone[] = input.member.zones.map((z) => {
    const analysis = analyses.get(z.sectionId)!;
    const definition = input.definitions.get(z.sectionId)!;
    const concrete = input.materials.concreteSpec(definition.concreteId);
    const stirrupYield = definition.hoops ? input.materials.steel(definition.hoops.steelId)?.yieldStress : undefined;
    return { from: z.from, to: z.to, definition, analysis, concrete: concrete!, ...(stirrupYield !== undefined ? { stirrupYield } : {}) };
  });
  let shear: ShearResult | null = null;
  if (result.status !== 'input-error' && zones.every((z) => z.analysis.model && z.concrete)) {
    const { factors, text } = strengthCombination(input.member, code);
    shear = memberShear({ code, member: input.member, zones, factors, combination: text, segments: setup.segments, ...(setup.unitSystem ? { edition: setup.unitSystem } : {}) });
  }
  return { key: input.key, label: input.label, member: input.member, analyses, definitions: input.definitions, baseOf: input.baseOf, added: input.added ?? new Map(), result, shear, zones };
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
