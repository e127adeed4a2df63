import { throwIfErrors, type Diagnostic } from '../../diagnostics.ts';
import type { CompressionLaw } from '../types.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';
import { compressionLaw } from './compression-law.ts';
import { UNCONFINED_ULTIMATE_STRAIN } from './mander-confinement.ts';

/** Citation for the report's reference list. */
export const SCOTT_PARK_PRIESTLEY_REFERENCE =
  'Scott, B. D., Park, R. & Priestley, M. J. N. (1982). Stress–strain behavior of concrete confined by overlapping hoops at low and high strain rates. ACI Journal 79(1), 13–27.';
/** Citation of the unconfined origin of the model. */
export const KENT_PARK_REFERENCE =
  'Kent, D. C. & Park, R. (1971). Flexural members with confined concrete. Journal of the Structural Division, ASCE 97(ST7), 1969–1990.';

/** Inputs of modifiedKentParkCompression (MPa, mm, strains dimensionless). */
export interface ModifiedKentParkParameters {
  /** Cylinder strength f′c, MPa; must exceed 1000/145 ≈ 6.9 MPa (ε50u). */
  readonly compressiveStrength: number;
  /** Volumetric ratio of hoops to the core measured to the outside of the hoops, ρs ≥ 0 (0: unconfined). */
  readonly volumetricRatio?: number;
  /** Hoop yield stress fyh, MPa (needed when ρs > 0). */
  readonly hoopYieldStress?: number;
  /** Width of the core to the outside of the hoops h″, mm (needed when ρs > 0). */
  readonly coreWidth?: number;
  /** Centre-to-centre hoop spacing sh, mm (needed when ρs > 0). */
  readonly hoopSpacing?: number;
  /** Override of the crushing strain; default εcu = 0.004 + 0.9 ρs (fyh/300). */
  readonly crushingStrain?: number;
}

/** Resolved constants of the curve (strains dimensionless, MPa). */
export interface ModifiedKentParkConstants {
  /** K = 1 + ρs fyh / f′c. */
  readonly K: number;
  /** Strain at peak ε0 = 0.002 K. */
  readonly peakStrain: number;
  /** ε50u = (3 + 0.29 f′c)/(145 f′c − 1000). */
  readonly eps50u: number;
  /** ε50h = 0.75 ρs √(h″/sh). */
  readonly eps50h: number;
  /** Slope of the descending branch Zm = 0.5 / (ε50u + ε50h − 0.002 K). */
  readonly Zm: number;
  /** Strain where the descent reaches the residual 0.2 K f′c: ε0 + 0.8/Zm. */
  readonly residualStrain: number;
  readonly crushingStrain: number;
}

/**
 * ε50u = (3 + 0.29 f′c)/(145 f′c − 1000), f′c in MPa: strain at which unconfined concrete has fallen
 * to half its strength. (The psi form of Kent & Park 1971 is (3 + 0.002 f′c)/(f′c − 1000).)
 * @see Scott, Park & Priestley (1982), Eq. (3) — equation number from memory
 */
export function modifiedKentParkEps50u(fc: number): number {
  return (3 + 0.29 * fc) / (145 * fc - 1000);
}

/**
 * Ultimate (crushing) strain of the confined core εcu = 0.004 + 0.9 ρs (fyh / 300), fyh in MPa.
 * @see Scott, Park & Priestley (1982) — the first hoop fracture criterion
 */
export function modifiedKentParkUltimateStrain(volumetricRatio: number, hoopYieldStress: number): number {
  return UNCONFINED_ULTIMATE_STRAIN + 0.9 * volumetricRatio * (hoopYieldStress / 300);
}

/** K, ε0, ε50u, ε50h, Zm, the start of the residual plateau and εcu for the given inputs. @see Scott, Park & Priestley (1982) */
export function modifiedKentParkConstants(p: ModifiedKentParkParameters): ModifiedKentParkConstants {
  const rho = p.volumetricRatio ?? 0;
  const fyh = rho > 0 ? (p.hoopYieldStress ?? 0) : 0;
  const K = 1 + (rho * fyh) / p.compressiveStrength;
  const eps50u = modifiedKentParkEps50u(p.compressiveStrength);
  const eps50h = rho > 0 ? 0.75 * rho * Math.sqrt((p.coreWidth ?? 0) / (p.hoopSpacing ?? 1)) : 0;
  const Zm = 0.5 / (eps50u + eps50h - 0.002 * K);
  const peakStrain = 0.002 * K;
  return {
    K,
    peakStrain,
    eps50u,
    eps50h,
    Zm,
    residualStrain: peakStrain + 0.8 / Zm,
    crushingStrain: p.crushingStrain ?? modifiedKentParkUltimateStrain(rho, fyh),
  };
}

/** Checks the parameters (145 f′c > 1000, hoop data when ρs > 0, Zm > 0, εcu > ε0); paths are `path.<parameter name>`. */
export function validateModifiedKentParkParameters(p: ModifiedKentParkParameters, path = ''): Diagnostic[] {
  const out: Diagnostic[] = [];
  const label = 'Modified Kent–Park:';
  let ok = checkField(out, fieldPath(path, 'compressiveStrength'), `${label} compressive strength (ε50u = (3 + 0.29 f′c)/(145 f′c − 1000) needs 145 f′c > 1000)`,
    p.compressiveStrength, { min: 1000 / 145, exclusiveMin: true, quantity: 'concreteStress' });
  const rho = p.volumetricRatio ?? 0;
  ok = checkField(out, fieldPath(path, 'volumetricRatio'), `${label} volumetric hoop ratio ρs`, rho, { min: 0, max: 0.1 }) && ok;
  if (rho > 0) {
    ok = checkField(out, fieldPath(path, 'hoopYieldStress'), `${label} hoop yield stress fyh`, p.hoopYieldStress, { min: 0, exclusiveMin: true, quantity: 'stress' }) && ok;
    ok = checkField(out, fieldPath(path, 'coreWidth'), `${label} core width to the outside of the hoops h″`, p.coreWidth, { min: 0, exclusiveMin: true, quantity: 'sectionLength' }) && ok;
    ok = checkField(out, fieldPath(path, 'hoopSpacing'), `${label} hoop spacing sh`, p.hoopSpacing, { min: 0, exclusiveMin: true, quantity: 'sectionLength' }) && ok;
  }
  if (p.crushingStrain !== undefined) {
    ok = checkField(out, fieldPath(path, 'crushingStrain'), `${label} crushing strain εcu`, p.crushingStrain, { min: 0, max: 0.1, exclusiveMin: true }) && ok;
  }
  if (!ok) return out;
  const c = modifiedKentParkConstants(p);
  if (!(c.Zm > 0)) {
    reportInconsistent(out, fieldPath(path, 'volumetricRatio'),
      `${label} the descending slope Zm = 0.5/(ε50u + ε50h − 0.002K) is not positive (ε50u + ε50h = ${show(c.eps50u + c.eps50h)}, 0.002K = ${show(c.peakStrain)})`);
  } else if (c.crushingStrain <= c.peakStrain) {
    reportInconsistent(out, fieldPath(path, 'crushingStrain'),
      `${label} the crushing strain εcu = ${show(c.crushingStrain)} must exceed the strain at peak ε0 = 0.002K = ${show(c.peakStrain)}`);
  }
  return out;
}

/**
 * Modified Kent–Park curve (Scott, Park & Priestley 1982), compressive magnitudes (strain ≥ 0, MPa):
 *   ε ≤ ε0 = 0.002K:  σ = K f′c [2ε/ε0 − (ε/ε0)²]
 *   ε > ε0:           σ = K f′c [1 − Zm (ε − ε0)] ≥ 0.2 K f′c (the residual plateau)
 *   ε > εcu:          σ = 0 (end of the curve: hoop fracture for the core, spalling for unconfined cover)
 * with K = 1 + ρs fyh/f′c, Zm = 0.5/(ε50u + ε50h − 0.002K), ε50u = (3 + 0.29f′c)/(145f′c − 1000),
 * ε50h = 0.75 ρs √(h″/sh), εcu = 0.004 + 0.9 ρs fyh/300 (MPa). ρs = 0 gives the unconfined curve
 * (K = 1, εcu = 0.004). The static (low strain rate) form; the initial tangent is 1000 f′c.
 * @see Scott, Park & Priestley (1982), ACI Journal 79(1); Kent & Park (1971) for the unconfined origin
 */
export function modifiedKentParkCompression(parameters: ModifiedKentParkParameters): CompressionLaw {
  throwIfErrors(validateModifiedKentParkParameters(parameters));
  const c = modifiedKentParkConstants(parameters);
  const peakStress = c.K * parameters.compressiveStrength;
  const confined = (parameters.volumetricRatio ?? 0) > 0;
  return compressionLaw({
    model: confined ? 'modified-kent-park-confined' : 'modified-kent-park',
    label: `Modified Kent–Park (Scott, Park & Priestley 1982), ${confined ? 'confined core' : 'unconfined'}`,
    references: [SCOTT_PARK_PRIESTLEY_REFERENCE, KENT_PARK_REFERENCE],
    curve: (strain) => {
      if (strain <= c.peakStrain) {
        const x = strain / c.peakStrain;
        return peakStress * (2 * x - x * x);
      }
      return peakStress * Math.max(0.2, 1 - c.Zm * (strain - c.peakStrain));
    },
    endStrain: c.crushingStrain,
    breakpoints: [c.peakStrain, c.residualStrain, c.crushingStrain],
    initialModulus: (2 * peakStress) / c.peakStrain,
    peakStress,
    peakStrain: c.peakStrain,
    crushingStrain: c.crushingStrain,
    confined,
  });
}
