/**
 * One strengthening scheme of an existing beam as a variant: the substrate strain when a bonded
 * item is installed (ACI 440.2R-17 10.2.3), the derived sections (core/retrofit/schemes.ts), the
 * variant run (variant.ts), its comparison with the beam it strengthens (compact.ts) and the
 * ACI 440.2R-17 9.2 check of the beam without its strengthening.
 * Units: mm, N, N·mm, MPa.
 */
import { errorsOf, type Problem } from '../diagnostics.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import { materialLibrary } from '../materials/library.ts';
import type { FrpSpec, MaterialSpec } from '../materials/specs.ts';
import type { BeamDefinition, MemberLoad } from '../member/definition.ts';
import { derivedId, type AsFoundDerivation } from '../retrofit/as-found.ts';
import { crackedSubstrateStrain, frpDesign, frpElement, substrateStrainFromCurve } from '../retrofit/frp.ts';
import { bondedSection, concreteLayerSection, faceOf, STEEL_DENSITY, type ReferenceSection, type SchemeSection } from '../retrofit/schemes.ts';
import type { AddedItem, FrpDesign, FrpScheme, InstallationStrain, SteelPlateScheme, StrengtheningScheme } from '../retrofit/types.ts';
import { STANDARD_GRAVITY, type SectionAnalysis } from '../section/analyze.ts';
import type { SectionAdditions } from '../section/build.ts';
import { elasticProperties, type CrackedProperties } from '../section/elastic.ts';
import type { BendingDirection, DiscreteElement } from '../section/model.ts';
import { compactOf, compareVariants } from './compact.ts';
import { flexuralCheck } from './flexure.ts';
import type { SchemeResult, VariantResult } from './results.ts';
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import { largestZoneMoment } from './demand.ts';
import { strengtheningChecks } from './strengthening-checks.ts';
import { bondedWidthProblem } from './retrofit-input.ts';
import { combinationText, type LoadCombination } from './combinations.ts';
import { librarySections, runVariant, type Setup, type VariantRun } from './variant.ts';

/** The beam a scheme strengthens: its run, materials and (for an as-found beam) its derivation. */
export interface SchemeReference {
  readonly run: VariantRun;
  readonly materials: MaterialLibrary;
  readonly derivation: AsFoundDerivation | null;
}

/** What one scheme is built from and compared with. */
export interface SchemeInput {
  readonly member: BeamDefinition;
  readonly scheme: StrengtheningScheme;
  /** Path of the scheme in the project file. */
  readonly at: string;
  /** The scheme's result so far (identity, its own input warnings). */
  readonly base: SchemeResult;
  /** The beam the scheme strengthens (the as-found beam, spalls repaired when the scheme asks). */
  readonly reference: SchemeReference;
  /** The beam the scheme is compared with (the as-found beam, or the design beam). */
  readonly comparison: { readonly run: VariantRun; readonly compact: VariantResult };
  /** Derived material specs the scheme's materials are resolved with. */
  readonly derivedSpecs: readonly MaterialSpec[];
}

export function describeScheme(s: StrengtheningScheme): Text {
  const len = (mm: number) => q('sectionLength', mm, { compact: true });
  switch (s.kind) {
    case 'frp':
      return phrase`externally bonded FRP on the ${s.face ?? 'bottom'} face: ${s.plies} × ${len(s.plyThickness)} × ${len(s.width)} (${s.frpId})`;
    case 'steel-plate':
      return phrase`bonded steel plate on the ${s.face ?? 'bottom'} face: ${len(s.thickness)} × ${len(s.width)} (${s.steelId})`;
    case 'concrete-layer':
      return phrase`new concrete ${s.face === 'top' ? 'overlay' : 'layer under the soffit'} ${len(s.thickness)} (${s.concreteId}) with ${s.bars.length} bar layer${s.bars.length === 1 ? '' : 's'}`;
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
  const f = scheme.installation ?? {};
  return largestZoneMoment(ref.member, ref.zones, { dead: f.dead ?? 1, superimposed: f.superimposed ?? 1, live: f.live ?? 0 }, zoneIndices, direction, setup.segments);
}

/** Builds, analyses and compares one scheme. */
export function buildScheme(setup: Setup, input: SchemeInput): SchemeResult {
  const { member, scheme, at, base, derivedSpecs } = input;
  const { run: ref, materials: refMaterials, derivation: refDerivation } = input.reference;
  const { run: comparisonRun, compact: comparisonCompact } = input.comparison;
  const code = setup.code;
  const errors: Problem[] = [...base.errors];
  const warnings: Text[] = [...base.warnings];
  const designSections = librarySections(member, setup.library);
  const targets = new Set(scheme.sectionIds ?? [...designSections.keys()]);
  const materials = materialLibrary([...setup.library.materials, ...derivedSpecs], code, setup.sectionSettings);
  const sections = new Map<string, SchemeSection>();
  const installation: InstallationStrain[] = [];
  let frp: FrpDesign | null = null;
  for (const baseId of targets) {
    const refSection = referenceSection(baseId, ref, refDerivation);
    const id = derivedId(baseId, member.id, scheme.id);
    const name = `${refSection.definition.name} + ${scheme.name}`;
    if (scheme.kind === 'concrete-layer') {
      const built = concreteLayerSection(refSection, scheme, id, materials, at);
      if (Array.isArray(built)) errors.push(...errorsOf(built));
      else {
        sections.set(baseId, built);
        warnings.push(...built.warnings);
      }
      continue;
    }
    // Bonded items: width on the face, then the substrate strain at installation.
    const face = scheme.face ?? 'bottom';
    const faceData = faceOf(refSection.definition, face);
    const wide = bondedWidthProblem(scheme, refSection.definition, baseId, at);
    if (wide) {
      errors.push(...errorsOf([wide]));
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
      errors.push({ path: `${at}.installation`, message: phrase`the moment when the strengthening is bonded, ${q('moment', inst.moment)} at ${q('spanLength', inst.position)}, exceeds the capacity of the unstrengthened section "${refAnalysis.sectionName}" (${q('moment', capacity)}): the beam could not carry the installation load — reduce it (prop or unload the beam) before strengthening` });
      continue;
    }
    if (firstYield !== null && inst.moment > firstYield) {
      warnings.push(phrase`the installation moment ${q('moment', inst.moment)} in section "${baseId}" is above first yield (${q('moment', firstYield)}): the cracked elastic substrate strain does not hold beyond yield; consider propping during installation`);
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
        ? phrase`εbi = M·(df − kd)/(Icr·Ec) = ${q('moment', inst.moment)} × (${q('sectionLength', df)} − ${q('sectionLength', kd)}) / (${q('secondMoment', icr)} × ${q('stress', ec)}) = ${(-(elasticStrain ?? 0)).toExponential(3)} (ACI 440.2R-17 10.2.3)${method === 'moment-curvature' ? `; used: ${(-strain).toExponential(3)} from the moment–curvature curve` : ''}`
        : `εbi = ${(-strain).toExponential(3)} from the moment–curvature curve`,
    });
    if (scheme.kind === 'frp') {
      const spec = materials.frpSpec(scheme.frpId) as FrpSpec | undefined;
      const material = materials.frp(scheme.frpId);
      if (!spec || !material) {
        const causes = errorsOf(materials.problems).map((p) => phrase`${p.path}: ${p.message}`);
        errors.push({ path: `${at}.frpId`, message: phrase`the FRP material "${scheme.frpId}" could not be built${causes.length > 0 ? phrase` (${joinTexts(causes, '; ')})` : ''}` });
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
  const variantMember: BeamDefinition = { ...ref.member, zones: ref.member.zones.map((z) => ({ ...z, sectionId: idOfZone(z.sectionId) })), loads: [...ref.member.loads, ...extraLoads] };
  const unchanged = new Map([...ref.analyses].filter(([id]) => !sections.has(ref.baseOf.get(id) ?? id)));
  const run = runVariant(setup, { key: scheme.id, label: scheme.name, member: variantMember, definitions, baseOf, additions, added, materials, analyses: unchanged });
  const variant = compactOf(setup, run, `${scheme.name}: `);
  const comparison = run.result.status === 'input-error' ? null : compareVariants(comparisonCompact, variant, scheme.name);
  // ACI 440.2R-17 9.2: the unstrengthened member under 1.1 SD + 0.75 LL (bonded schemes only).
  let lossOfStrengthening: SchemeResult['lossOfStrengthening'] = null;
  if (scheme.kind !== 'concrete-layer') {
    const lost: LoadCombination = { name: '1.1 SD + 0.75 LL', source: 'ACI 440.2R-17 Eq. 9.2, strengthening lost', factors: { dead: 1.1, superimposed: 1.1, live: 0.75 } };
    const combination = combinationText(lost);
    const check = flexuralCheck({ code, member: comparisonRun.member, zones: comparisonRun.zones, combinations: [lost], segments: setup.segments });
    if (check) {
      lossOfStrengthening = { combination, check, source: 'ACI 440.2R-17 9.2, Eq. (9.2) (from memory): (φRn)existing ≥ (1.1 SDL + 0.75 SLL)new, with the design resistance of the beam before strengthening' };
      if (!check.pass) warnings.push(phrase`ACI 440.2R-17 9.2 limit not met: without the strengthening the beam could not carry 1.1 SD + 0.75 LL (utilisation ${check.utilisation.toFixed(2)} at ${q('spanLength', check.position)}): the strengthening exceeds what the existing beam allows`);
    }
  }
  if (!variant.ductility.available) warnings.push(phrase`the strengthened beam is brittle: its ductility and hinge rotations are ${variant.ductility.note}`);
  const checks = strengtheningChecks({
    setup, scheme, run, materials, frp, lossOfStrengthening,
    sections: new Map([...sections.values()].map((s) => [s.baseSectionId, s.id])),
    sustainedLiveFraction: member.service.sustainedLiveFraction,
  });
  return { ...base, variant, frp, installation, comparison, lossOfStrengthening, checks, warnings: [...warnings, ...newWarnings(run.result.warnings, comparisonRun.result.warnings)], errors: [...errors, ...run.result.errors] };
}

/** Warnings of a variant that the beam it is compared with does not have (texts compared by content). */
function newWarnings(own: readonly Text[], reference: readonly Text[]): Text[] {
  const known = new Set(reference.map((w) => JSON.stringify(w)));
  return own.filter((w) => !known.has(JSON.stringify(w)));
}

/** Cracked transformed properties of an analysed section at the concrete modulus Ec (MPa); null without tension steel. */
function crackedAt(analysis: SectionAnalysis, direction: BendingDirection, ec: number): CrackedProperties | null {
  const own = analysis.elastic;
  const e = own && own.concreteModulus === ec ? own : analysis.model ? elasticProperties(analysis.model, { concreteModulus: ec }) : null;
  return e ? (direction === 'sagging' ? e.cracked.sagging : e.cracked.hogging) : null;
}
