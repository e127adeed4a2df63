import { diagnostic, InputError, type AllowedRange, type Diagnostic } from '../../diagnostics.ts';
import { phrase, q } from '../../units/phrase.ts';
import { CODE_BASES, CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, TENSION_STIFFENING_ZONES, ULTIMATE_STRAIN_CHOICES, type CodeBasis, type ConcreteCompressionModel, type ConcreteSpec, type ConfinementInput, type UltimateStrainChoice } from '../specs.ts';
import type { CompressionLaw, ConcreteMaterial, TensionLaw, UltimateStrainSource } from '../types.ts';
import { checkField, fieldPath } from '../checks.ts';
import { combineConcrete } from '../concrete/combine.ts';
import { en1992NonlinearCompression } from '../concrete/en1992-nonlinear.ts';
import { en1992ParabolaRectangleCompression } from '../concrete/en1992-parabola-rectangle.ts';
import { hognestadCompression } from '../concrete/hognestad.ts';
import { MANDER_DEFAULT_PEAK_STRAIN, manderConfinedFromHoops, manderUnconfinedCompression } from '../concrete/mander.ts';
import { validateConfinementInput } from '../concrete/mander-confinement.ts';
import { modifiedKentParkCompression } from '../concrete/modified-kent-park.ts';
import { popovicsCompression } from '../concrete/popovics.ts';
import { linearBrittleTension, noTension, tensionStiffening } from '../concrete/tension.ts';
import { thorenfeldtCollinsCompression, thorenfeldtCollinsConstants } from '../concrete/thorenfeldt-collins.ts';
import { en1992PeakStrain } from '../code/en1992.ts';
import { checkIdentity, checkOption, collectLawDiagnostics, pathMapper } from './common.ts';
import { resolveConcrete, type ResolvedConcrete } from './concrete-defaults.ts';
/** Compression models with a confined-core form. */
export const CONFINEMENT_MODELS: readonly ConcreteCompressionModel[] = ['mander', 'modified-kent-park'];

/** Allowed range of the compressive strength of any spec, MPa (as-found strengths included). */
export const CONCRETE_STRENGTH_RANGE = { min: 10, max: 120, quantity: 'concreteStress' } as const;

/** Where the spec and its confinement sit in the project, for diagnostic paths. */
export interface ConcreteBuildOptions {
  /** Path of the spec in the project, for diagnostics. Default `material`. */
  readonly path?: string;
  /** Path of the confinement input, for diagnostics. Default `confinement`. */
  readonly confinementPath?: string;
  /** Where εcu of unconfined concrete comes from when the spec says nothing (the project's setting). */
  readonly ultimateStrain?: UltimateStrainChoice;
}

/** Options of validateConcreteSpec. */
export interface ConcreteValidationOptions extends ConcreteBuildOptions {
  /** Without a code basis only the fields are checked, not the resolved model parameters. */
  readonly code?: CodeBasis;
  readonly confinement?: ConfinementInput;
}

/** Cover (unconfined) law of each model from the resolved numbers. */
function coverCompression(spec: ConcreteSpec, r: ResolvedConcrete): CompressionLaw {
  const fc = r.modelStrength;
  const Ec = r.elasticModulus;
  const crushingStrain = r.ultimateStrain.value;
  switch (spec.compressionModel) {
    case 'hognestad':
      return hognestadCompression({ compressiveStrength: fc, elasticModulus: Ec, peakFactor: spec.peakFactor, crushingStrain });
    case 'modified-kent-park':
      return modifiedKentParkCompression({ compressiveStrength: fc, crushingStrain });
    case 'mander':
      return manderUnconfinedCompression({
        compressiveStrength: fc, elasticModulus: Ec, peakStrain: r.codePeakStrain ?? MANDER_DEFAULT_PEAK_STRAIN,
        spallingStrain: spec.spallingStrain, crushingStrain,
      });
    case 'popovics':
      // Under ACI the strain at peak follows the n/(n − 1) relation of Collins & Mitchell (1991), which
      // keeps n > 1 at every strength; under EN it is εc1 of Table 3.1.
      return popovicsCompression({
        compressiveStrength: fc, elasticModulus: Ec,
        peakStrain: r.codePeakStrain ?? thorenfeldtCollinsConstants(fc, Ec).peakStrain,
        crushingStrain,
      });
    case 'thorenfeldt-collins':
      return thorenfeldtCollinsCompression({ compressiveStrength: fc, elasticModulus: Ec, crushingStrain });
    case 'en1992-nonlinear':
      return en1992NonlinearCompression({ meanStrength: fc, elasticModulus: Ec, peakStrain: en1992PeakStrain(r.strainsFck), crushingStrain });
    case 'en1992-parabola-rectangle':
      return en1992ParabolaRectangleCompression({ strength: spec.meanStrength ?? spec.strength, characteristicStrength: r.strainsFck, crushingStrain });
  }
}

/** Where the confined core's ultimate strain comes from (the hoop-fracture expression of its model). */
function coreUltimateSource(spec: ConcreteSpec, law: CompressionLaw): UltimateStrainSource {
  return {
    value: law.crushingStrain,
    basis: 'confinement',
    source: spec.compressionModel === 'mander' ? 'first hoop fracture, Priestley, Seible & Calvi (1996)' : 'first hoop fracture, Scott, Park & Priestley (1982)',
  };
}

/** Confined-core law for the models that have one; undefined for the others. */
function coreCompression(spec: ConcreteSpec, r: ResolvedConcrete, confinement: ConfinementInput): CompressionLaw | undefined {
  if (spec.compressionModel === 'mander') {
    const peakStrain = r.codePeakStrain ?? MANDER_DEFAULT_PEAK_STRAIN;
    return manderConfinedFromHoops({ compressiveStrength: r.modelStrength, elasticModulus: r.elasticModulus, peakStrain }, confinement).law;
  }
  if (spec.compressionModel === 'modified-kent-park') {
    const { coreWidth: bc, coreDepth: dc, hoopDiameter: dh, spacing } = confinement;
    const legArea = (Math.PI * dh * dh) / 4;
    // Hoop volume per spacing (legs running in x are bc long, in y dc long) over the core volume to the
    // outside of the hoops, as Scott et al. (1982) define ρs; h″ is the shorter core side to the outside of the hoops.
    const volumetricRatio = (legArea * (confinement.legsY * bc + confinement.legsX * dc)) / (spacing * (bc + dh) * (dc + dh));
    return modifiedKentParkCompression({
      compressiveStrength: r.modelStrength, volumetricRatio, hoopYieldStress: confinement.hoopYieldStress,
      coreWidth: Math.min(bc, dc) + dh, hoopSpacing: spacing,
    });
  }
  return undefined;
}

function tensionLaw(spec: ConcreteSpec, r: ResolvedConcrete): TensionLaw {
  switch (spec.tensionModel) {
    case 'none':
      return noTension();
    case 'linear-brittle':
      return linearBrittleTension({ tensileStrength: r.tensileStrength, elasticModulus: r.elasticModulus });
    case 'tension-stiffening':
      return tensionStiffening({ tensileStrength: r.tensileStrength, elasticModulus: r.elasticModulus, coefficient: spec.tensionStiffeningCoefficient, zone: spec.tensionStiffeningZone });
  }
}

function checkFields(out: Diagnostic[], spec: ConcreteSpec, path: string): boolean {
  const at = (field: string): string => fieldPath(path, field);
  const before = out.length;
  checkIdentity(out, spec, 'concrete', path);
  checkField(out, at('strength'), 'concrete compressive strength', spec.strength, CONCRETE_STRENGTH_RANGE);
  checkOption(out, at('compressionModel'), 'concrete compression model', spec.compressionModel, CONCRETE_COMPRESSION_MODELS);
  checkOption(out, at('tensionModel'), 'concrete tension model', spec.tensionModel, CONCRETE_TENSION_MODELS);
  if (spec.tensionStiffeningZone !== undefined) checkOption(out, at('tensionStiffeningZone'), 'zone of tension stiffening', spec.tensionStiffeningZone, TENSION_STIFFENING_ZONES);
  if (spec.meanStrength !== undefined && Number.isFinite(spec.strength)) {
    checkField(out, at('meanStrength'), 'measured mean compressive strength', spec.meanStrength, { min: spec.strength, max: CONCRETE_STRENGTH_RANGE.max + 20, quantity: 'concreteStress' });
  }
  if (spec.ultimateStrain !== undefined) checkOption(out, at('ultimateStrain'), 'source of the ultimate strain εcu', spec.ultimateStrain, ULTIMATE_STRAIN_CHOICES);
  const optional: [keyof ConcreteSpec, string, AllowedRange][] = [
    ['elasticModulus', 'concrete elastic modulus Ec', { min: 5_000, max: 70_000, quantity: 'modulus' }],
    ['tensileStrength', 'concrete tensile strength', { min: 0, exclusiveMin: true, max: 15, quantity: 'concreteStress' }],
    ['crushingStrain', 'crushing strain εcu of unconfined concrete', { min: 0.002, max: 0.01 }],
    ['peakFactor', 'Hognestad peak factor k', { min: 0.5, max: 1 }],
    ['spallingStrain', 'spalling strain εsp of the cover', { min: 0.003, max: 0.02 }],
    ['lightweightFactor', 'lightweight-concrete factor λ (ACI 318-19 19.2.4)', { min: 0.75, max: 1 }],
    ['tensionStiffeningCoefficient', 'tension-stiffening coefficient c', { min: 50, max: 1000 }],
    ['density', 'concrete density', { min: 1200, max: 2800, quantity: 'density' }],
    ['creepCoefficient', 'creep coefficient φ', { min: 0, max: 6 }],
    ['shrinkageStrain', 'free shrinkage strain εcs', { min: 0, max: 0.002 }],
  ];
  for (const [field, label, range] of optional) {
    if (spec[field] !== undefined) checkField(out, at(field), label, spec[field], range);
  }
  return out.slice(before).every((d) => d.severity !== 'error');
}

/** A concrete strength in a message (MPa, shown in the display unit of concrete stresses). */
const fc = (mpa: number) => q('concreteStress', mpa, { compact: true });

function checkTableRange(out: Diagnostic[], spec: ConcreteSpec, code: CodeBasis, path: string): boolean {
  const usesTable = code === 'EN 1992-1-1' || spec.compressionModel.startsWith('en1992');
  if (!usesTable) return true;
  const at = fieldPath(path, 'strength');
  if (spec.strength > 90) {
    out.push(diagnostic('out-of-range', at, 'error',
      phrase`concrete strength ${fc(spec.strength)} is above ${fc(90)}, the end of EN 1992-1-1 Table 3.1, from which this model takes its constants; use a strength of at most ${fc(90)} or the ACI 318-19 basis with a non-EN model`));
    return false;
  }
  if (spec.strength < 12) {
    out.push(diagnostic('out-of-range', at, 'warning', phrase`concrete strength ${fc(spec.strength)} is below ${fc(12)}, the start of EN 1992-1-1 Table 3.1; its constants are extrapolated`));
  }
  return true;
}

/**
 * Checks a concrete spec: identity, the strength (10–120 MPa), the model names, every optional override
 * against its range, and, when `options.code` is given, the resolved parameters of the chosen model
 * (e.g. Hognestad's ε0 below εcu, Mander's Ec above f′co/εco, Modified Kent–Park's 145 f′c > 1000,
 * EN 1992-1-1 Table 3.1's range) and the confinement input. Reports every problem, with paths under `path`.
 */
export function validateConcreteSpec(spec: ConcreteSpec, path = 'material', options: ConcreteValidationOptions = {}): Diagnostic[] {
  const out: Diagnostic[] = [];
  const fieldsOk = checkFields(out, spec, path);
  const { code, confinement } = options;
  const confinementPath = options.confinementPath ?? 'confinement';
  if (code === undefined) return out;
  if (!checkOption(out, 'codeBasis', 'code basis', code, CODE_BASES) || !fieldsOk) return out;
  if (code === 'EN 1992-1-1' && spec.lightweightFactor !== undefined && spec.lightweightFactor !== 1) {
    out.push({ code: 'inconsistent', path: fieldPath(path, 'lightweightFactor'), severity: 'warning', message: 'the lightweight factor λ belongs to ACI 318-19 and is ignored under EN 1992-1-1' });
  }
  if (!checkTableRange(out, spec, code, path)) return out;
  const r = resolveConcrete(spec, code, options.ultimateStrain);
  const at = (field: string): string => fieldPath(path, field);
  if (r.lawHasNoUltimateStrain) {
    out.push({ code: 'inconsistent', path: at('ultimateStrain'), severity: 'warning',
      message: `the ${spec.compressionModel} law publishes no ultimate strain of its own: εcu = ${r.ultimateStrain.value} of the code basis (${r.ultimateStrain.source}) is used; enter a value to use another` });
  }
  const coverTable = {
    compressiveStrength: at('strength'), meanStrength: at('strength'), strength: at('strength'), characteristicStrength: at('strength'),
    elasticModulus: at('elasticModulus'), crushingStrain: at('crushingStrain'), peakFactor: at('peakFactor'), spallingStrain: at('spallingStrain'),
    tensileStrength: at('tensileStrength'), coefficient: at('tensionStiffeningCoefficient'), endStrain: at('tensionModel'),
  };
  out.push(...collectLawDiagnostics(() => coverCompression(spec, r), pathMapper(coverTable, at('compressionModel'))));
  out.push(...collectLawDiagnostics(() => tensionLaw(spec, r), pathMapper(coverTable, at('tensionModel'))));
  if (confinement !== undefined) {
    if (!CONFINEMENT_MODELS.includes(spec.compressionModel)) {
      out.push({ code: 'inconsistent', path: at('compressionModel'), severity: 'warning',
        message: `the ${spec.compressionModel} model has no confinement term: the core uses the unconfined law; choose mander or modified-kent-park to account for the hoops` });
    } else {
      const confinementDiagnostics = validateConfinementInput(confinement, confinementPath, spec.compressionModel === 'mander');
      out.push(...confinementDiagnostics);
      if (confinementDiagnostics.every((d) => d.severity !== 'error')) {
        const coreTable = { compressiveStrength: at('strength'), elasticModulus: at('elasticModulus'), peakStrain: at('compressionModel') };
        out.push(...collectLawDiagnostics(() => coreCompression(spec, r, confinement), pathMapper(coreTable, confinementPath)));
      }
    }
  }
  return out;
}

/** Cover and (when confinement is given) core laws, plus the warnings found on the way. */
export interface ConcreteBuild {
  /** Unconfined concrete (the whole section when there is no confinement). */
  readonly cover: ConcreteMaterial;
  /**
   * Confined core: the confined law for mander / modified-kent-park with confinement; the cover law
   * itself (with a warning) for other models with confinement; undefined without confinement.
   */
  readonly core?: ConcreteMaterial;
  /** Warnings (never errors: errors throw). */
  readonly diagnostics: readonly Diagnostic[];
}

/**
 * Builds the concrete laws of a spec under a code basis (compression positive, MPa). Defaults come from
 * the code basis when the spec leaves a value undefined (build/concrete-defaults.ts). Throws InputError
 * carrying every diagnostic (errors and warnings) when the spec is invalid.
 */
export function buildConcrete(spec: ConcreteSpec, code: CodeBasis, confinement?: ConfinementInput, options: ConcreteBuildOptions = {}): ConcreteBuild {
  const diagnostics = validateConcreteSpec(spec, options.path ?? 'material', { ...options, code, confinement });
  if (diagnostics.some((d) => d.severity === 'error')) throw new InputError(diagnostics);
  const r = resolveConcrete(spec, code, options.ultimateStrain);
  const tension = tensionLaw(spec, r);
  const cover: ConcreteMaterial = { ...combineConcrete(coverCompression(spec, r), tension), ultimateStrain: r.ultimateStrain };
  if (confinement === undefined) return { cover, diagnostics };
  const coreLaw = coreCompression(spec, r, confinement);
  return { cover, core: coreLaw ? { ...combineConcrete(coreLaw, tension), ultimateStrain: coreUltimateSource(spec, coreLaw) } : cover, diagnostics };
}
