import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import type { ConfinementInput } from '../specs.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';
import { positivePower } from './power.ts';
import { manderConfinement, type ManderConfinement } from './mander-confinement.ts';

/** Citation for the report's reference list. */
export const MANDER_REFERENCE =
  'Mander, J. B., Priestley, M. J. N. & Park, R. (1988). Theoretical stress–strain model for confined concrete. Journal of Structural Engineering, ASCE 114(8), 1804–1826.';
/** Citation for the ultimate strain of the confined core. */
export const PRIESTLEY_SEIBLE_CALVI_REFERENCE = 'Priestley, M. J. N., Seible, F. & Calvi, G. M. (1996). Seismic Design and Retrofit of Bridges. Wiley, New York.';

/** Strain at peak of unconfined concrete εco used by Mander et al. (1988). */
export const MANDER_DEFAULT_PEAK_STRAIN = 0.002;
/** Spalling strain of unconfined cover εsp used by Mander et al. (1988). */
export const MANDER_DEFAULT_SPALLING_STRAIN = 0.005;

/**
 * Mander's default modulus Ec = 5000 √f′co, MPa.
 * @see Mander, Priestley & Park (1988) — tangent modulus expression (from memory: Eq. 6)
 */
export function manderElasticModulus(fco: number): number {
  return 5000 * Math.sqrt(fco);
}

/** Inputs of manderUnconfinedCompression (MPa, strains dimensionless). */
export interface ManderUnconfinedParameters {
  /** Unconfined strength f′co, MPa, > 0. */
  readonly compressiveStrength: number;
  /** Ec, MPa; default 5000 √f′co. Must exceed the secant modulus f′co/εco. */
  readonly elasticModulus?: number;
  /** εco, default 0.002. */
  readonly peakStrain?: number;
  /**
   * εsp where the linear descent from 2εco reaches zero, default 0.005; must exceed εco. When εsp ≤ 2εco
   * (a large εco, e.g. EN 1992-1-1 εc1 from C50/60 up) the cover spalls before 2εco: the curve is cut at εsp.
   */
  readonly spallingStrain?: number;
  /** Crushing strain for the section's ultimate (e.g. the code's εcu), from εco to εsp. */
  readonly crushingStrain: number;
}

/** Inputs of manderConfinedCompression (MPa, strains dimensionless). */
export interface ManderConfinedParameters {
  readonly compressiveStrength: number;
  readonly elasticModulus?: number;
  readonly peakStrain?: number;
  /** f′cc, MPa, ≥ f′co (from manderConfinement). */
  readonly confinedStrength: number;
  /** Ultimate strain of the core εcu (from manderConfinement), > εcc. */
  readonly crushingStrain: number;
}

/** r = Ec/(Ec − Esec), Esec = f/ε at the peak. */
function manderExponent(elasticModulus: number, peakStress: number, peakStrain: number): number {
  return elasticModulus / (elasticModulus - peakStress / peakStrain);
}

function manderCurve(peakStress: number, peakStrain: number, r: number): (strain: number) => number {
  const scale = (peakStress * r) / peakStrain;
  const shift = r - 1;
  return (strain) => (scale * strain) / (shift + positivePower(strain / peakStrain, r));
}

function checkCommon(out: Diagnostic[], p: { compressiveStrength: number; elasticModulus?: number; peakStrain?: number }, path: string): boolean {
  let ok = checkField(out, fieldPath(path, 'compressiveStrength'), 'Mander: unconfined strength f′co', p.compressiveStrength, { min: 0, exclusiveMin: true, quantity: 'concreteStress' });
  if (p.elasticModulus !== undefined) ok = checkField(out, fieldPath(path, 'elasticModulus'), 'Mander: elastic modulus Ec', p.elasticModulus, { min: 0, exclusiveMin: true, quantity: 'modulus' }) && ok;
  if (p.peakStrain !== undefined) ok = checkField(out, fieldPath(path, 'peakStrain'), 'Mander: strain at peak εco', p.peakStrain, { min: 0.001, max: 0.005 }) && ok;
  if (!ok) return false;
  const Ec = p.elasticModulus ?? manderElasticModulus(p.compressiveStrength);
  const epsCo = p.peakStrain ?? MANDER_DEFAULT_PEAK_STRAIN;
  const secant = p.compressiveStrength / epsCo;
  if (Ec <= secant) {
    reportInconsistent(out, fieldPath(path, 'elasticModulus'),
      `Mander: the elastic modulus Ec = ${show(Ec)} MPa must exceed the secant modulus f′co/εco = ${show(secant)} MPa (r = Ec/(Ec − Esec) would not be positive); enter a larger Ec or a larger strain at peak`);
    return false;
  }
  return true;
}

/** Checks the parameters (Ec above f′co/εco, εco < εsp, εco ≤ εcu ≤ εsp); paths are `path.<parameter name>`. */
export function validateManderUnconfinedParameters(p: ManderUnconfinedParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkCommon(out, p, path);
  const epsCo = p.peakStrain ?? MANDER_DEFAULT_PEAK_STRAIN;
  const epsSp = p.spallingStrain ?? MANDER_DEFAULT_SPALLING_STRAIN;
  ok = checkField(out, fieldPath(path, 'spallingStrain'), 'Mander: spalling strain εsp', epsSp, { min: 0.003, max: 0.02 }) && ok;
  ok = checkField(out, fieldPath(path, 'crushingStrain'), 'Mander: crushing strain εcu', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.02 }) && ok;
  if (!ok) return out;
  if (epsSp <= epsCo) {
    reportInconsistent(out, fieldPath(path, 'spallingStrain'), `Mander: the spalling strain εsp = ${show(epsSp)} must exceed the strain at peak εco = ${show(epsCo)}`);
  }
  if (p.crushingStrain < epsCo || p.crushingStrain > epsSp) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'),
      `Mander: the crushing strain εcu = ${show(p.crushingStrain)} must lie between the strain at peak εco = ${show(epsCo)} and the spalling strain εsp = ${show(epsSp)}`);
  }
  return out;
}

/** Checks the parameters (Ec above the secant, f′cc ≥ f′co, εcu > εcc); paths are `path.<parameter name>`. */
export function validateManderConfinedParameters(p: ManderConfinedParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkCommon(out, p, path);
  ok = checkField(out, fieldPath(path, 'confinedStrength'), 'Mander: confined strength f′cc', p.confinedStrength, { min: p.compressiveStrength, quantity: 'concreteStress' }) && ok;
  ok = checkField(out, fieldPath(path, 'crushingStrain'), 'Mander: ultimate strain of the core εcu', p.crushingStrain, { min: 0, exclusiveMin: true, max: 0.1 }) && ok;
  if (!ok) return out;
  const epsCc = manderConfinedPeakStrain(p);
  if (p.crushingStrain <= epsCc) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'),
      `Mander: the ultimate strain of the core εcu = ${show(p.crushingStrain)} does not exceed the strain at peak εcc = ${show(epsCc)}; the confinement is too light for a confined-core law`, 'error');
  }
  return out;
}

/** εcc = εco [1 + 5 (f′cc/f′co − 1)]. @see Mander, Priestley & Park (1988) (from memory: Eq. 5) */
export function manderConfinedPeakStrain(p: ManderConfinedParameters): number {
  const epsCo = p.peakStrain ?? MANDER_DEFAULT_PEAK_STRAIN;
  return epsCo * (1 + 5 * (p.confinedStrength / p.compressiveStrength - 1));
}

/**
 * Mander et al. (1988) UNCONFINED concrete (cover), compressive magnitudes (strain ≥ 0, MPa):
 *   ε ≤ 2εco:        σ = f′co x r / (r − 1 + x^r),  x = ε/εco, r = Ec/(Ec − f′co/εco)
 *   2εco < ε ≤ εsp:  straight line from σ(2εco) to 0 at the spalling strain εsp
 *   ε > εsp:         σ = 0 (spalled; when εsp ≤ 2εco the curve is cut at εsp with a drop to 0).
 * The initial tangent is Ec; `crushingStrain` (the section's limit, e.g. the code's εcu) may be below εsp.
 * @see Mander, Priestley & Park (1988), Fig. 1 and Eqs. (1)–(6) — equation numbers from memory
 */
export function manderUnconfinedCompression(p: ManderUnconfinedParameters): CompressionLaw {
  throwIfErrors(validateManderUnconfinedParameters(p));
  const fco = p.compressiveStrength;
  const Ec = p.elasticModulus ?? manderElasticModulus(fco);
  const epsCo = p.peakStrain ?? MANDER_DEFAULT_PEAK_STRAIN;
  const epsSp = p.spallingStrain ?? MANDER_DEFAULT_SPALLING_STRAIN;
  const curve = manderCurve(fco, epsCo, manderExponent(Ec, fco, epsCo));
  const stressAtTwiceEpsCo = curve(2 * epsCo);
  const linearTail = epsSp > 2 * epsCo;
  return compressionLaw({
    model: 'mander-unconfined',
    label: 'Mander, Priestley & Park (1988), unconfined cover with spalling',
    references: [MANDER_REFERENCE],
    curve: (strain) => (strain <= 2 * epsCo ? curve(strain) : (stressAtTwiceEpsCo * (epsSp - strain)) / (epsSp - 2 * epsCo)),
    endStrain: epsSp,
    breakpoints: linearTail ? [epsCo, 2 * epsCo, epsSp] : [epsCo, epsSp],
    initialModulus: Ec,
    peakStress: fco,
    peakStrain: epsCo,
    crushingStrain: p.crushingStrain,
    confined: false,
  });
}

/**
 * Mander et al. (1988) CONFINED core, compressive magnitudes (strain ≥ 0, MPa):
 *   ε ≤ εcu: σ = f′cc x r / (r − 1 + x^r), x = ε/εcc, r = Ec/(Ec − f′cc/εcc), εcc = εco [1 + 5 (f′cc/f′co − 1)]
 *   ε > εcu: σ = 0 (first hoop fracture ends the curve).
 * f′cc and εcu come from manderConfinement (ke, f′l, Priestley et al. 1996 εcu). Initial tangent Ec.
 * @see Mander, Priestley & Park (1988), Eqs. (1)–(6) — equation numbers from memory
 */
export function manderConfinedCompression(p: ManderConfinedParameters): CompressionLaw {
  throwIfErrors(validateManderConfinedParameters(p));
  const Ec = p.elasticModulus ?? manderElasticModulus(p.compressiveStrength);
  const epsCc = manderConfinedPeakStrain(p);
  return compressionLaw({
    model: 'mander-confined',
    label: 'Mander, Priestley & Park (1988), confined core',
    references: [MANDER_REFERENCE, PRIESTLEY_SEIBLE_CALVI_REFERENCE],
    curve: manderCurve(p.confinedStrength, epsCc, manderExponent(Ec, p.confinedStrength, epsCc)),
    endStrain: p.crushingStrain,
    breakpoints: [epsCc, p.crushingStrain],
    initialModulus: Ec,
    peakStress: p.confinedStrength,
    peakStrain: epsCc,
    crushingStrain: p.crushingStrain,
    confined: true,
  });
}

/**
 * Confined-core law straight from a hoop layout: manderConfinement + manderConfinedCompression.
 * Returns the law and the confinement numbers (ke, ρx, ρy, f′l, f′cc, εcc, εcu) for the report.
 */
export function manderConfinedFromHoops(
  unconfined: { compressiveStrength: number; elasticModulus?: number; peakStrain?: number },
  confinement: ConfinementInput,
): { law: CompressionLaw; confinement: ManderConfinement } {
  const numbers = manderConfinement(confinement, unconfined.compressiveStrength, unconfined.peakStrain ?? MANDER_DEFAULT_PEAK_STRAIN);
  const law = manderConfinedCompression({ ...unconfined, confinedStrength: numbers.confinedStrength, crushingStrain: numbers.crushingStrain });
  return { law, confinement: numbers };
}
