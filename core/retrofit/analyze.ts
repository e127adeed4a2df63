/**
 * The member analysis with shear, the as-found condition and strengthening schemes:
 *
 *   design beam (library data) ── analyzeMember ─┐
 *   as-found beam (derived data) ── analyzeMember ┼─ shear (core/member/shear.ts) for each
 *   each scheme (derived from the as-found beam) ─┘   compact results and comparisons
 *
 * The member's main result describes the beam as it is: the as-found beam when a valid condition
 * is given, otherwise the design beam. `retrofit` holds the design beam, the as-found beam and each
 * scheme compactly, with curve points for shared charts. Input problems of the condition or of a
 * scheme are reported on the member (path, value, range) without losing the other results; a
 * scheme that cannot be built is reported and the others go on.
 *
 * Pure and deterministic. Units: mm, N, N·mm, MPa.
 */
import { BugError, InputError, type Diagnostic } from '../diagnostics.ts';
import { quantityText, type QuantityText } from '../units/text.ts';
import type { CodeBasis, FrpSpec, MaterialSpec } from '../materials/specs.ts';
import { analyzeMember, type MemberContext } from '../member/analyze.ts';
import type { MemberDefinition, MemberLoad } from '../member/definition.ts';
import type { MemberResult } from '../member/results.ts';
import { combinedLoads, elasticSupportMoments, memberForcesAt, memberLoadSets, memberShear, type ElasticZone, type ShearResult, type ShearZone } from '../member/shear.ts';
import type { Project } from '../project/types.ts';
import { projectMaterials, type ProjectMaterials } from '../project/resolver.ts';
import { analyzeSection, STANDARD_GRAVITY, type SectionAnalysis } from '../section/analyze.ts';
import type { SectionAdditions } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { elasticProperties, type CrackedProperties } from '../section/elastic.ts';
import type { BendingDirection, DiscreteElement } from '../section/model.ts';
import { deriveAsFound, derivedId, type AsFoundDerivation } from './as-found.ts';
import { compactVariant, compareVariants, composeGoverningMode, flexuralCheck, strengthCombination, variantFlexureSentence, type VariantRun } from './compact.ts';
import { crackedSubstrateStrain, frpDesign, frpElement, substrateStrainFromCurve } from './frp.ts';
import { bondedSection, concreteLayerSection, exposedElements, faceOf, STEEL_DENSITY, type ReferenceSection, type SchemeSection } from './schemes.ts';
import { RETROFIT_CAUTION, type AddedItem, type FrpDesign, type FrpScheme, type InstallationStrain, type RetrofitResult, type SchemeResult, type SteelPlateScheme, type StrengtheningScheme, type VariantResult } from './types.ts';
import { validateAsFound, validateSchemes } from './validate.ts';

type Problem = { readonly path: string; readonly message: string };
const asProblems = (d: readonly Diagnostic[]): Problem[] => d.filter((x) => x.severity === 'error').map((x) => ({ path: x.path, message: x.message }));
const warningsOf = (d: readonly Diagnostic[]): string[] => d.filter((x) => x.severity === 'warning').map((x) => `${x.path}: ${x.message}`);

/** Runs analyzeMember and turns an unexpected exception into a reported result (as core/analysis.ts does). */
function safeAnalyzeMember(member: MemberDefinition, context: MemberContext): MemberResult {
  try {
    return analyzeMember(member, context);
  } catch (error) {
    const message = error instanceof InputError ? error.message : `internal error (please report): ${String(error instanceof Error ? error.message : error)}`;
    return {
      memberId: member.id, memberName: member.name, supports: member.supports, span: Number.isFinite(member.span) ? member.span : 0,
      status: error instanceof InputError ? 'input-error' : 'not-converged',
      governingMode: `Not analysed: ${message.split('\n')[0]}`,
      sections: [], loadDeflection: { pattern: '', controlPosition: 0, points: [], events: [], status: 'not analysed' },
      ductility: { firstYieldDeflection: null, yieldDeflection: null, ultimateDeflection: null, displacementDuctility: null, hinges: [], failureCause: '' },
      distributions: [], service: null, strength: null, warnings: [],
      errors: error instanceof InputError ? error.diagnostics.map((d) => ({ path: d.path, message: d.message })) : [{ path: context.path, message }],
    };
  }
}

interface Setup {
  readonly project: Project;
  readonly code: CodeBasis;
  readonly path: string;
  readonly segments: number;
  /** Quantities in sentences, in the project's display units. */
  readonly text: QuantityText;
}

interface VariantInput {
  readonly key: string;
  readonly label: string;
  readonly member: MemberDefinition;
  readonly definitions: ReadonlyMap<string, SectionDefinition>;
  readonly baseOf: ReadonlyMap<string, string>;
  readonly additions?: ReadonlyMap<string, SectionAdditions>;
  readonly added?: ReadonlyMap<string, readonly AddedItem[]>;
  readonly materials: ProjectMaterials;
  /** Analyses already at hand (shared project sections, or a reference's unchanged sections). */
  readonly analyses?: ReadonlyMap<string, SectionAnalysis>;
  /** Result already at hand (the design beam). */
  readonly result?: MemberResult;
}

/** Analyses one variant: its sections, the member, and its shear. */
function runVariant(setup: Setup, input: VariantInput): VariantRun {
  const { project, code } = setup;
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
      momentDropFraction: project.settings.momentDropFraction,
      bilinearMethod: project.settings.bilinearMethod,
      ...(additions ? { additions } : {}),
    }));
  }
  const context: MemberContext = { code, segments: setup.segments, section: (id) => analyses.get(id), sectionIds: new Set(analyses.keys()), path: setup.path, text: setup.text };
  const result = input.result ?? safeAnalyzeMember(input.member, context);
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
    shear = memberShear({ code, member: input.member, zones, factors, combination: text, segments: setup.segments, text: setup.text });
  }
  return { key: input.key, label: input.label, member: input.member, analyses, definitions: input.definitions, baseOf: input.baseOf, added: input.added ?? new Map(), result, shear, zones };
}

/** The station-by-station strength check of a variant (ψf on FRP). */
function strengthOf(setup: Setup, run: VariantRun) {
  if (run.result.status === 'input-error') return null;
  const { factors, text } = strengthCombination(run.member, setup.code);
  return flexuralCheck(setup.code, run.member, run.zones, factors, text, setup.segments, setup.text);
}

/** Compact result of a run, with its sentence. */
function compactOf(setup: Setup, run: VariantRun, prefix: string): VariantResult {
  const strength = strengthOf(setup, run);
  const sentence = composeGoverningMode(variantFlexureSentence(run.result, strength, run.member.capacity.pattern, setup.text), run.shear, prefix);
  return compactVariant(setup.code, run, strength, sentence);
}

/** A member zone list pointing at other section ids. */
function withZones(member: MemberDefinition, idOf: (libraryId: string) => string, extraLoads: readonly MemberLoad[] = []): MemberDefinition {
  return { ...member, zones: member.zones.map((z) => ({ ...z, sectionId: idOf(z.sectionId) })), loads: [...member.loads, ...extraLoads] };
}

/** Library sections of the member by id. */
function librarySections(member: MemberDefinition, project: Project): Map<string, SectionDefinition> {
  const map = new Map<string, SectionDefinition>();
  for (const z of member.zones) {
    const s = project.sections.find((x) => x.id === z.sectionId);
    if (s) map.set(s.id, s);
  }
  return map;
}

/** Analysis of an as-found derivation as a variant. */
function asFoundRun(setup: Setup, member: MemberDefinition, derivation: AsFoundDerivation, key: string, label: string): { run: VariantRun; materials: ProjectMaterials } {
  const materials = projectMaterials([...setup.project.materials, ...derivation.materials], setup.code);
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
 * Analyses a member with its shear and, when given, its as-found condition and strengthening
 * schemes. Returns the member's result (see the module comment) with `shear` and `retrofit`.
 * @param context the member context of core/analysis.ts (shared section cache of the project)
 */
export function analyzeMemberWithRetrofit(member: MemberDefinition, context: MemberContext, project: Project): MemberResult {
  const design = analyzeMember(member, context);
  try {
    return extend(member, context, project, design);
  } catch (error) {
    // A defect in the shear or retrofit analysis must not cost the member its flexural results.
    const message = `internal error in the shear or retrofit analysis (please report): ${String(error instanceof Error ? error.message : error)}`;
    return { ...design, errors: [...design.errors, { path: context.path, message }] };
  }
}

function extend(member: MemberDefinition, context: MemberContext, project: Project, design: MemberResult): MemberResult {
  const setup: Setup = { project, code: context.code, path: context.path, segments: context.segments, text: context.text ?? quantityText(project.info.unitSystem) };
  const hasRetrofit = member.asFound !== undefined || (member.schemes !== undefined && member.schemes.length > 0);
  if (design.status === 'input-error') {
    if (!hasRetrofit) return design;
    const problems = [
      ...(member.asFound ? validateAsFound(member.asFound, member, project, `${context.path}.asFound`) : []),
      ...(member.schemes ? validateSchemes(member.schemes, member, project, `${context.path}.schemes`) : []),
    ];
    return { ...design, errors: [...design.errors, ...asProblems(problems)] };
  }
  const libraryMaterials = projectMaterials(project.materials, setup.code);
  const library = librarySections(member, project);
  const designAnalyses = new Map<string, SectionAnalysis>();
  for (const id of library.keys()) {
    const a = context.section(id);
    if (a) designAnalyses.set(id, a);
  }
  const designRun = runVariant(setup, {
    key: 'original', label: 'Design beam', member, definitions: library, baseOf: new Map([...library.keys()].map((id) => [id, id])),
    materials: libraryMaterials, analyses: designAnalyses, result: design,
  });
  if (!hasRetrofit) return finishMain(design, designRun, null);

  const warnings: string[] = [];
  const errors: Problem[] = [];

  // --- as found ------------------------------------------------------------------------------------
  let derivation: AsFoundDerivation | null = null;
  let found: { run: VariantRun; materials: ProjectMaterials } | null = null;
  if (member.asFound) {
    derivation = deriveAsFound(member, member.asFound, project, setup.code, context.path);
    errors.push(...asProblems(derivation.diagnostics));
    warnings.push(...warningsOf(derivation.diagnostics));
    if (errors.length === 0) {
      if (derivation.unchanged) warnings.push(`${context.path}.asFound: gives no core, steel or defect data: the as-found beam is the design beam.`);
      else {
        found = asFoundRun(setup, member, derivation, 'as-found', 'As found');
        if (found.run.result.status === 'input-error') {
          // The engine refused a derived section: report why and keep the design beam as the result.
          errors.push(...found.run.result.errors.map((e) => ({ path: e.path, message: `as-found beam: ${e.message}` })));
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
  const schemes = member.schemes ?? [];
  if (schemes.length > 0) {
    const schemeProblems = validateSchemes(schemes, member, project, `${context.path}.schemes`);
    const asFoundBroken = member.asFound !== undefined && errors.length > 0;
    let repaired: { derivation: AsFoundDerivation; run: VariantRun; materials: ProjectMaterials } | null | undefined;
    const repairedReference = () => {
      if (repaired !== undefined) return repaired;
      if (!member.asFound || !derivation || derivation.unchanged) return (repaired = null);
      const hasSpalls = (member.asFound.defects ?? []).some((d) => d.kind === 'cover-loss');
      if (!hasSpalls) return (repaired = null);
      const d = deriveAsFound(member, member.asFound, project, setup.code, context.path, { repairSpalls: true, variant: 'repaired' });
      if (d.diagnostics.some((x) => x.severity === 'error')) return (repaired = null);
      const r = asFoundRun(setup, member, d, 'repaired', 'As found, spalls repaired');
      return (repaired = { derivation: d, ...r });
    };
    schemes.forEach((scheme, index) => {
      const at = `${context.path}.schemes[${index}]`;
      const own = schemeProblems.filter((p) => p.path === at || p.path.startsWith(`${at}.`) || p.path.startsWith(`${at}[`));
      const description = describeScheme(scheme);
      const base: SchemeResult = {
        schemeId: String(scheme.id), name: String(scheme.name), kind: scheme.kind, description,
        variant: null, frp: null, installation: [], comparison: null, lossOfStrengthening: null,
        warnings: warningsOf(own), errors: asProblems(own),
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
      schemeResults.push(buildScheme(setup, member, scheme, at, base, ref, refMaterials, refDerivation, reference, referenceCompact, found ? [...(derivation?.materials ?? []), ...(rep?.derivation.materials ?? [])] : []));
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
  const mainRun = found ? found.run : designRun;
  const schemeErrors = schemeResults.flatMap((s) => s.errors);
  const result = finishMain(main, mainRun, retrofit, found ? 'As found: ' : '');
  return {
    ...result,
    warnings: [...result.warnings, ...warnings, ...schemeResults.flatMap((s) => s.warnings.map((w) => `Scheme "${s.name}": ${w}`))],
    errors: [...result.errors, ...errors, ...schemeErrors],
  };
}

/** The member's main result with shear, the extended governing mode, status and retrofit data. */
function finishMain(result: MemberResult, run: VariantRun, retrofit: RetrofitResult | null, prefix = ''): MemberResult {
  const shear = run.shear;
  const status = result.status === 'ok' && shear?.factored && !shear.factored.pass ? 'check-fails' : result.status;
  const extra: string[] = [...(shear?.warnings ?? [])];
  if (shear && !shear.flexuralDuctilityAvailable) extra.push('Shear governs before the flexural mechanism: the displacement ductility and plastic hinge rotations are not available (kept for reference only).');
  return {
    ...result,
    status,
    governingMode: composeGoverningMode(result.governingMode, shear, prefix),
    warnings: [...result.warnings, ...extra],
    ...(shear ? { shear } : {}),
    ...(retrofit ? { retrofit } : {}),
  };
}

function describeScheme(s: StrengtheningScheme): string {
  switch (s.kind) {
    case 'frp':
      return `externally bonded FRP on the ${s.face ?? 'bottom'} face: ${s.plies} × ${s.plyThickness} mm × ${s.width} mm (${s.frpId})`;
    case 'steel-plate':
      return `bonded steel plate on the ${s.face ?? 'bottom'} face: ${s.thickness} × ${s.width} mm (${s.steelId})`;
    case 'concrete-layer':
      return `new concrete ${s.face === 'top' ? 'overlay' : 'layer under the soffit'} ${s.thickness} mm (${s.concreteId}) with ${s.bars.length} bar layer${s.bars.length === 1 ? '' : 's'}`;
  }
}

/** Reference section of a library section for a scheme: the reference variant's derived section, or the library one. */
function referenceSection(baseId: string, ref: VariantRun, derivation: AsFoundDerivation | null): ReferenceSection {
  const d = derivation?.sections.get(baseId);
  if (d) return { id: d.id, baseSectionId: baseId, definition: d.definition, exposedBars: d.exposedBars };
  const id = [...ref.baseOf.entries()].find(([, b]) => b === baseId)?.[0] ?? baseId;
  return { id, baseSectionId: baseId, definition: ref.definitions.get(id)!, exposedBars: [] };
}

/** Largest moment of one sense (N·mm magnitude) within a set of zones under installation loads, and where. */
function installationMoment(setup: Setup, ref: VariantRun, scheme: FrpScheme | SteelPlateScheme, zoneIndices: readonly number[], direction: BendingDirection): { moment: number; position: number } {
  const member = ref.member;
  const f = scheme.installation ?? {};
  const loads = combinedLoads(memberLoadSets(member, ref.zones.map((z) => z.analysis.selfWeight)), { dead: f.dead ?? 1, superimposed: f.superimposed ?? 1, live: f.live ?? 0 });
  const elastic: ElasticZone[] = ref.zones.map((z) => ({ from: z.from, to: z.to, sectionId: z.analysis.sectionId, stiffness: z.analysis.codeModulus * (z.analysis.elastic?.grossInertia ?? 0) }));
  const ends = elasticSupportMoments(member, elastic, loads, setup.segments);
  let best = { moment: 0, position: 0 };
  const sign = direction === 'sagging' ? 1 : -1;
  for (const i of zoneIndices) {
    const z = member.zones[i]!;
    const n = Math.max(8, Math.ceil((setup.segments * (z.to - z.from)) / member.span));
    for (let k = 0; k <= n; k++) {
      const x = z.from + ((z.to - z.from) * k) / n;
      for (const side of ['left', 'right'] as const) {
        const mx = sign * memberForcesAt(member.supports, member.span, loads, ends, x, side).moment;
        if (mx > best.moment) best = { moment: mx, position: x };
      }
    }
  }
  return best;
}

/** Builds, analyses and compares one scheme. */
function buildScheme(
  setup: Setup,
  member: MemberDefinition,
  scheme: StrengtheningScheme,
  at: string,
  base: SchemeResult,
  ref: VariantRun,
  refMaterials: ProjectMaterials,
  refDerivation: AsFoundDerivation | null,
  comparisonRun: VariantRun,
  comparisonCompact: VariantResult,
  derivedSpecs: readonly MaterialSpec[],
): SchemeResult {
  const { project, code } = setup;
  const errors: Problem[] = [...base.errors];
  const warnings: string[] = [...base.warnings];
  const library = librarySections(member, project);
  const targets = new Set(scheme.sectionIds ?? [...library.keys()]);
  const materials = projectMaterials([...project.materials, ...derivedSpecs], code);
  const sections = new Map<string, SchemeSection>();
  const installation: InstallationStrain[] = [];
  let frp: FrpDesign | null = null;
  for (const baseId of targets) {
    const refSection = referenceSection(baseId, ref, refDerivation);
    const id = derivedId(baseId, member.id, scheme.id);
    const name = `${refSection.definition.name} + ${scheme.name}`;
    if (scheme.kind === 'concrete-layer') {
      const built = concreteLayerSection(refSection, scheme, id, materials, at);
      if (Array.isArray(built)) errors.push(...asProblems(built));
      else {
        sections.set(baseId, built);
        warnings.push(...built.warnings);
      }
      continue;
    }
    // Bonded items: width on the face, then the substrate strain at installation.
    const face = scheme.face ?? 'bottom';
    const faceData = faceOf(refSection.definition, face);
    if (scheme.width > faceData.width + 1e-6) {
      errors.push({ path: `${at}.width`, message: `must be at most the ${faceData.width.toFixed(0)} mm width of the ${face} face of section "${baseId}", got ${scheme.width} mm` });
      continue;
    }
    const direction: BendingDirection = face === 'bottom' ? 'sagging' : 'hogging';
    const refAnalysis = ref.analyses.get(refSection.id);
    if (!refAnalysis?.model || !refAnalysis.elastic) {
      errors.push({ path: at, message: `section "${baseId}" of the beam being strengthened has no valid model` });
      continue;
    }
    const zoneIndices = member.zones.map((z, i) => (z.sectionId === baseId ? i : -1)).filter((i) => i >= 0);
    const inst = installationMoment(setup, ref, scheme, zoneIndices, direction);
    const curve = refAnalysis.curves[direction];
    const capacity = curve?.keyPoints.peak?.moment ?? null;
    const firstYield = curve?.keyPoints.firstYield?.moment ?? null;
    if (capacity !== null && inst.moment > capacity) {
      errors.push({ path: `${at}.installation`, message: `the moment when the strengthening is bonded, ${setup.text.moment(inst.moment)} at ${setup.text.span(inst.position)}, exceeds the capacity of the unstrengthened section "${refAnalysis.sectionName}" (${setup.text.moment(capacity)}): the beam could not carry the installation load — reduce it (prop or unload the beam) before strengthening` });
      continue;
    }
    if (firstYield !== null && inst.moment > firstYield) {
      warnings.push(`the installation moment ${setup.text.moment(inst.moment)} in section "${baseId}" is above first yield (${setup.text.moment(firstYield)}): the cracked elastic substrate strain does not hold beyond yield; consider propping during installation`);
    }
    const itemDepth = scheme.kind === 'frp' ? faceData.depth : face === 'bottom' ? faceData.depth + scheme.thickness / 2 : -scheme.thickness / 2;
    const model = refAnalysis.model;
    const ec = refAnalysis.codeModulus;
    // Cracked transformed properties at the code modulus Ec (ACI 440.2R-17 10.2.3).
    const c = crackedAt(refAnalysis, direction, ec);
    const compressionFace = direction === 'sagging' ? 0 : model.height;
    const df = Math.abs(itemDepth - compressionFace);
    let elasticStrain: number | null = null;
    let kd: number | null = null;
    let icr: number | null = null;
    if (c) {
      kd = c.neutralAxisDepth;
      icr = c.inertia;
      elasticStrain = -crackedSubstrateStrain(inst.moment, df, kd, icr, ec);
    }
    const curveStrain = curve ? substrateStrainFromCurve(model, curve, inst.moment, itemDepth) : null;
    const method = scheme.installationStrainMethod ?? 'cracked-elastic';
    let strain = method === 'cracked-elastic' ? elasticStrain ?? curveStrain : curveStrain ?? elasticStrain;
    if (strain === null) {
      warnings.push(`section "${baseId}": no substrate strain could be found for the installation moment; zero used`);
      strain = 0;
    }
    const other = method === 'cracked-elastic' ? curveStrain : elasticStrain;
    installation.push({
      baseSectionId: baseId,
      sectionId: id,
      moment: inst.moment,
      position: inst.position,
      direction,
      capacity,
      firstYieldMoment: firstYield,
      method,
      neutralAxisDepth: kd,
      crackedInertia: icr,
      concreteModulus: ec,
      strain,
      otherMethodStrain: other,
      formula: kd !== null && icr !== null
        ? `εbi = M·(df − kd)/(Icr·Ec) = ${setup.text.moment(inst.moment)} × (${setup.text.section(df)} − ${setup.text.section(kd)}) / (${setup.text.secondMoment(icr)} × ${setup.text.stress(ec)}) = ${(-(elasticStrain ?? 0)).toExponential(3)} (ACI 440.2R-17 10.2.3)${method === 'moment-curvature' ? `; used: ${(-strain).toExponential(3)} from the moment–curvature curve` : ''}`
        : `εbi = ${(-strain).toExponential(3)} from the moment–curvature curve`,
    });
    if (scheme.kind === 'frp') {
      const spec = materials.frpSpec(scheme.frpId) as FrpSpec | undefined;
      const material = materials.frp(scheme.frpId);
      if (!spec || !material) {
        const cause = materials.problems.filter((p) => p.severity === 'error').map((p) => `${p.path}: ${p.message}`).join('; ');
        errors.push({ path: `${at}.frpId`, message: `the FRP material "${scheme.frpId}" could not be built${cause ? ` (${cause})` : ''}` });
        continue;
      }
      const concreteStrength = refMaterials.concreteSpec(refSection.definition.concreteId)?.strength ?? 0;
      const design = frpDesign({ plyThickness: scheme.plyThickness, plies: scheme.plies, width: scheme.width, tensileModulus: spec.tensileModulus, ruptureStrain: spec.ruptureStrain, environmentalFactor: spec.environmentalFactor }, concreteStrength);
      frp ??= design;
      const label = `${scheme.name}: FRP ${scheme.plies} × ${scheme.plyThickness} mm × ${scheme.width} mm`;
      const element = frpElement(label, material, design, itemDepth, strain);
      const item: AddedItem = { kind: 'frp', label, depth: itemDepth, width: scheme.width, area: design.area, initialStrain: strain, limitStrain: design.limitStrain, limitCause: design.limitCause, materialId: scheme.frpId };
      sections.set(baseId, bondedSection(refSection, id, name, materials, element, item, 0));
    } else {
      const steel = materials.steel(scheme.steelId);
      if (!steel) {
        errors.push({ path: `${at}.steelId`, message: `the steel "${scheme.steelId}" could not be built` });
        continue;
      }
      const label = `${scheme.name}: steel plate ${scheme.thickness} × ${scheme.width} mm`;
      const area = scheme.thickness * scheme.width;
      const element: DiscreteElement = { kind: 'plate', label, sourceIndex: 0, area, depth: itemDepth, material: steel, initialStrain: strain, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', displacedConcrete: null };
      const item: AddedItem = { kind: 'plate', label, depth: itemDepth, width: scheme.width, area, initialStrain: strain, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', materialId: scheme.steelId };
      // ρ (kg/m³) · g · A (mm²) · 1e-9 = N/mm
      sections.set(baseId, bondedSection(refSection, id, name, materials, element, item, STEEL_DENSITY * STANDARD_GRAVITY * area * 1e-9));
    }
  }
  if (errors.length > 0 || sections.size === 0) {
    if (errors.length === 0) errors.push({ path: at, message: 'the scheme applies to no section of the member' });
    return { ...base, installation, frp, errors, warnings };
  }

  // Variant member: targeted zones on the scheme's sections, the rest on the reference's.
  const definitions = new Map(ref.definitions);
  const baseOf = new Map(ref.baseOf);
  const additions = new Map<string, SectionAdditions>();
  const added = new Map(ref.added);
  for (const s of sections.values()) {
    definitions.set(s.id, s.definition);
    baseOf.set(s.id, s.baseSectionId);
    additions.set(s.id, { parts: s.parts, elements: s.elements });
    added.set(s.id, s.added);
  }
  const idOfZone = (refId: string) => {
    const baseId = ref.baseOf.get(refId) ?? refId;
    return sections.get(baseId)?.id ?? refId;
  };
  const extraLoads: MemberLoad[] = (member.includeSelfWeight ?? true)
    ? ref.member.zones.flatMap((z) => {
      const s = sections.get(ref.baseOf.get(z.sectionId) ?? z.sectionId);
      return s && s.addedWeight > 0 ? [{ kind: 'uniform' as const, loadCase: 'dead' as const, magnitude: s.addedWeight, from: z.from, to: z.to, label: `self-weight of ${scheme.name}` }] : [];
    })
    : [];
  const variantMember: MemberDefinition = { ...ref.member, zones: ref.member.zones.map((z) => ({ ...z, sectionId: idOfZone(z.sectionId) })), loads: [...ref.member.loads, ...extraLoads] };
  const unchanged = new Map([...ref.analyses].filter(([id]) => !sections.has(ref.baseOf.get(id) ?? id)));
  const run = runVariant(setup, { key: scheme.id, label: scheme.name, member: variantMember, definitions, baseOf, additions, added, materials, analyses: unchanged });
  const variant = compactOf(setup, run, `${scheme.name}: `);
  const comparison = run.result.status === 'input-error' ? null : compareVariants(comparisonCompact, variant, scheme.name, setup.text);
  // ACI 440.2R-17 9.2: the unstrengthened member under 1.1 SD + 0.75 LL (bonded schemes only).
  let lossOfStrengthening: SchemeResult['lossOfStrengthening'] = null;
  if (scheme.kind !== 'concrete-layer') {
    const combination = `1.1 SD + 0.75 LL (ACI 440.2R-17 Eq. 9.2, strengthening lost)`;
    const check = flexuralCheck(code, comparisonRun.member, comparisonRun.zones, { dead: 1.1, superimposed: 1.1, live: 0.75 }, combination, setup.segments, setup.text);
    if (check) {
      lossOfStrengthening = { combination, check, source: 'ACI 440.2R-17 9.2, Eq. (9.2) (from memory): (φRn)existing ≥ (1.1 SDL + 0.75 SLL)new, with the design resistance of the beam before strengthening' };
      if (!check.pass) warnings.push(`ACI 440.2R-17 9.2 limit not met: without the strengthening the beam could not carry 1.1 SD + 0.75 LL (utilisation ${check.utilisation.toFixed(2)} at ${setup.text.span(check.position)}): the strengthening exceeds what the existing beam allows`);
    }
  }
  if (!variant.ductility.available) warnings.push('shear governs the strengthened beam before its flexural mechanism: its ductility and hinge rotations are not available');
  return { ...base, variant, frp, installation, comparison, lossOfStrengthening, warnings: [...warnings, ...run.result.warnings.filter((w) => !comparisonRun.result.warnings.includes(w))], errors: [...errors, ...run.result.errors] };
}

/** Cracked transformed properties of an analysed section at the concrete modulus Ec (MPa); null without tension steel. */
function crackedAt(analysis: SectionAnalysis, direction: BendingDirection, ec: number): CrackedProperties | null {
  const own = analysis.elastic;
  const e = own && own.concreteModulus === ec ? own : analysis.model ? elasticProperties(analysis.model, { concreteModulus: ec }) : null;
  return e ? (direction === 'sagging' ? e.cracked.sagging : e.cracked.hogging) : null;
}
