/**
 * Everything computed for one section of a project: the resolved model, elastic properties, and
 * the moment–curvature curves a member may need — short term and under sustained load (creep and
 * shrinkage). The code design resistance is core/assessment/resistance.ts.
 */
import { InputError, type Diagnostic } from '../diagnostics.ts';
import type { CodeBasis } from '../materials/specs.ts';
import { en1992ParabolaUltimateStrain } from '../materials/code/en1992.ts';
import { ACI_CRUSHING_STRAIN } from '../materials/code/aci318.ts';
import { sustainedConcrete } from '../materials/long-term.ts';
import { resolveConcrete } from '../materials/build/concrete-defaults.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import { buildSectionModel, type SectionAdditions } from './build.ts';
import type { SectionDefinition } from './definition.ts';
import { elasticProperties, type ElasticProperties } from './elastic.ts';
import type { BendingDirection, SectionModel } from './model.ts';
import { momentCurvature, type MomentCurvatureOptions } from './moment-curvature.ts';
import { tensionSteel } from './model.ts';
import type { BilinearMethod, MomentCurvatureResult } from './results.ts';
import { withMaterials } from './transform.ts';
import { phrase, type Text } from '../units/phrase.ts';

/** Gravity, m/s² (standard acceleration, CGPM 1901). */
export const STANDARD_GRAVITY = 9.80665;

export type DirectionCurves = { readonly sagging?: MomentCurvatureResult; readonly hogging?: MomentCurvatureResult };

export interface SectionAnalysis {
  readonly sectionId: string;
  readonly sectionName: string;
  readonly model: SectionModel | null;
  readonly elastic: ElasticProperties | null;
  /** Short-term curves (the section's own laws). */
  readonly curves: DirectionCurves;
  /** Curves under sustained load: concrete with creep φ and shrinkage εcs. */
  readonly longTermCurves: DirectionCurves;
  /** Self-weight, N/mm. */
  readonly selfWeight: number;
  /** Code values of the concrete (ACI Ec, fr / EN Ecm, fctm), creep and shrinkage. */
  readonly codeModulus: number;
  readonly codeTensileStrength: number;
  readonly creepCoefficient: number;
  readonly shrinkageStrain: number;
  readonly warnings: readonly Text[];
  readonly errors: readonly Diagnostic[];
}

export interface SectionAnalysisOptions {
  readonly code: CodeBasis;
  readonly momentDropFraction: number;
  readonly bilinearMethod: BilinearMethod;
  /** Extra parts from a strengthening scheme or an as-found condition. */
  readonly additions?: SectionAdditions;
}

function curvesOf(model: SectionModel, options: MomentCurvatureOptions, warnings: Text[], label: string): DirectionCurves {
  const out: { sagging?: MomentCurvatureResult; hogging?: MomentCurvatureResult } = {};
  for (const dir of ['sagging', 'hogging'] as BendingDirection[]) {
    if (tensionSteel(model, dir).length === 0) continue;
    const curve = momentCurvature(model, dir, options);
    if (curve.status.kind !== 'complete') warnings.push(phrase`${label} ${dir} curve: ${curve.status.message}`);
    out[dir] = curve;
  }
  return out;
}

/**
 * The first stage of a section analysis: the model, its elastic properties and the short-term
 * moment–curvature curves — all a moment–curvature chart shows (with `sectionResult`). Never
 * throws for bad input (errors are returned). `completeSectionAnalysis` adds the rest.
 */
export interface ShortTermSection {
  readonly analysis: SectionAnalysis;
  /** The context the completion needs (null when the model could not be built). */
  readonly stage: { readonly model: SectionModel; readonly mcOptions: MomentCurvatureOptions; readonly crushing: number; readonly warnings: Text[] } | null;
}

export function analyzeSectionShortTerm(definition: SectionDefinition, path: string, materials: MaterialLibrary, options: SectionAnalysisOptions): ShortTermSection {
  const warnings: Text[] = [];
  const empty = (errors: Diagnostic[]): SectionAnalysis => ({
    sectionId: definition.id,
    sectionName: definition.name,
    model: null,
    elastic: null,
    curves: {},
    longTermCurves: {},
    selfWeight: 0,
    codeModulus: 0,
    codeTensileStrength: 0,
    creepCoefficient: 0,
    shrinkageStrain: 0,
    warnings,
    errors,
  });
  let model: SectionModel;
  try {
    const built = buildSectionModel(definition, materials, path, options.additions);
    model = built.model;
    warnings.push(...built.warnings);
  } catch (error) {
    if (error instanceof InputError) {
      // A material that failed to build shows up as an unknown reference: report the real cause.
      const materialProblems = materials.problems.filter((p) => p.severity === 'error');
      return { analysis: empty([...materialProblems, ...error.diagnostics.filter((d) => !(d.code === 'unknown-reference' && materialProblems.length > 0))]), stage: null };
    }
    throw error;
  }
  const spec = materials.concreteSpec(definition.concreteId)!;
  const code = options.code;
  // The code crushing point that code checks read: ACI 318-19 22.2.2.1, EN 1992-1-1 Table 3.1 εcu2 (3.1.7).
  const crushing = code === 'ACI 318-19' ? ACI_CRUSHING_STRAIN : en1992ParabolaUltimateStrain(spec.strength);
  const codeCrushingSource = code === 'ACI 318-19' ? 'ACI 318-19 22.2.2.1' : 'EN 1992-1-1 Table 3.1 εcu2';
  const mcOptions: MomentCurvatureOptions = { codeCrushingStrain: crushing, codeCrushingSource, momentDropFraction: options.momentDropFraction, bilinearMethod: options.bilinearMethod };
  const curves = curvesOf(model, mcOptions, warnings, 'Short-term');
  const density = spec.density ?? 2400;
  return {
    analysis: {
      ...empty([]),
      model,
      elastic: elasticProperties(model),
      curves,
      // ρ (kg/m³) · g (m/s²) · A (mm²) · 1e-9 (m³ per mm²·m → per mm) = N/mm
      selfWeight: density * STANDARD_GRAVITY * model.grossArea * 1e-9,
      warnings: [...warnings],
    },
    stage: { model, mcOptions, crushing, warnings },
  };
}

/** Analyses a section of the project; never throws for bad input (errors are returned). */
export function analyzeSection(definition: SectionDefinition, path: string, materials: MaterialLibrary, options: SectionAnalysisOptions): SectionAnalysis {
  return completeSectionAnalysis(analyzeSectionShortTerm(definition, path, materials, options), definition, materials, options);
}

/**
 * The rest of a section analysis after its short-term stage (the same curves, not computed
 * again): curves under sustained load and the code values of the concrete.
 */
export function completeSectionAnalysis(shortTerm: ShortTermSection, definition: SectionDefinition, materials: MaterialLibrary, options: SectionAnalysisOptions): SectionAnalysis {
  const { stage } = shortTerm;
  if (!stage) return shortTerm.analysis;
  const { model, mcOptions, crushing } = stage;
  const warnings = [...stage.warnings];
  const curves = shortTerm.analysis.curves;
  const spec = materials.concreteSpec(definition.concreteId)!;
  const code = options.code;
  const creep = spec.creepCoefficient ?? 2.0;
  const shrinkage = spec.shrinkageStrain ?? 0.0004;
  const longModel = withMaterials(model, (m) => sustainedConcrete(m, creep, shrinkage));
  const longTermCurves = curvesOf(longModel, { ...mcOptions, codeCrushingStrain: crushing * (1 + creep) + shrinkage }, [], 'Sustained-load');
  // ACI Ec = 4700√f′c and fr = 0.62λ√f′c, or EN Ecm and fctm, unless the spec overrides them.
  const codeValues = resolveConcrete(spec, code);
  return {
    ...shortTerm.analysis,
    curves,
    longTermCurves,
    codeModulus: codeValues.elasticModulus,
    codeTensileStrength: codeValues.codeTensileStrength,
    creepCoefficient: creep,
    shrinkageStrain: shrinkage,
    warnings,
    errors: [],
  };
}

