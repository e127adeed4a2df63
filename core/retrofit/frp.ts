/**
 * Externally bonded FRP for flexure, ACI 440.2R-17:
 *  - design rupture strain εfu = CE·ε*fu (9.4, with CE from Table 9.4);
 *  - debonding strain εfd = 0.41√(f′c/(n·Ef·tf)) ≤ 0.9εfu (Eq. 10.1.1; in.-lb. form 0.083 with psi
 *    and in.) — the limit of the FRP's own strain; when the 0.9εfu cap governs, rupture rather than
 *    debonding ends the curve;
 *  - the substrate strain at installation εbi from the moment present when the FRP is bonded, by a
 *    cracked elastic section analysis εbi = M·(df − kd)/(Icr·Ec) (10.2.3; the form of its design
 *    examples, from memory) — or, optionally, from the section's own moment–curvature curve;
 *  - ψf = 0.85 on the FRP's contribution to the nominal moment (10.2.10): φMn = φ(Mns + ψf·Mnf).
 * The FRP becomes a discrete element of kind 'frp' of the section (core/section/model.ts): linear
 * elastic in tension (core/materials/frp/linear-frp.ts), active only for strain beyond εbi, ending
 * the curve at its limit strain with the cause 'frp-debonding' or 'frp-rupture'.
 *
 * Section numbers and the equation number 10.1.1 are as given in the brief of this feature; the
 * equation text is checked against its in.-lb. form in test/references/retrofit-aci440.test.ts.
 * Units: MPa, mm, N, N·mm; strains dimensionless, compression positive.
 */
import type { FrpMaterial } from '../materials/types.ts';
import { convertUnit } from '../units/convert.ts';
import { bySystem } from '../units/phrase.ts';
import { directionSign, type DiscreteElement, type SectionModel } from '../section/model.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { strainAtDepth } from '../section/state.ts';
import type { FrpDesign } from './types.ts';

/** Additional strength reduction factor on the FRP's flexural contribution, ψf = 0.85. @see ACI 440.2R-17 10.2.10 */
export const FRP_FLEXURE_REDUCTION = 0.85;

/**
 * Debonding strain expression 0.41√(f′c/(n·Ef·tf)) before the cap (SI: MPa, mm), dimensionless.
 * @param fc f′c, MPa (> 0); plies n ≥ 1; Ef MPa (> 0); tf ply thickness, mm (> 0)
 * @see ACI 440.2R-17 Eq. (10.1.1)
 */
export function aciDebondingStrainSI(fc: number, plies: number, ef: number, tf: number): number {
  return 0.41 * Math.sqrt(fc / (plies * ef * tf));
}

/**
 * The same expression in in.-lb. units: 0.083√(f′c/(n·Ef·tf)) with f′c and Ef in psi, tf in inches.
 * @see ACI 440.2R-17 Eq. (10.1.1), in.-lb. form
 */
export function aciDebondingStrainUS(fcPsi: number, plies: number, efPsi: number, tfInches: number): number {
  return 0.083 * Math.sqrt(fcPsi / (plies * efPsi * tfInches));
}

/**
 * The FRP strain limit: min(εfd, 0.9·εfu) with the cause that governs.
 * @returns limit strain (positive magnitude) and 'frp-debonding' when εfd < 0.9εfu, else 'frp-rupture'
 * @see ACI 440.2R-17 Eq. (10.1.1)
 */
export function frpStrainLimit(debondingStrain: number, designRuptureStrain: number): { limit: number; cause: 'frp-debonding' | 'frp-rupture'; cap: number } {
  const cap = 0.9 * designRuptureStrain;
  return debondingStrain < cap ? { limit: debondingStrain, cause: 'frp-debonding', cap } : { limit: cap, cause: 'frp-rupture', cap };
}

/**
 * Design data of an FRP laminate on a concrete of strength f′c: area, εfu, εfd, limit and ψf.
 * @param fc f′c (or fck under EN 1992-1-1, used in its place), MPa
 * @see ACI 440.2R-17 9.4, Eq. (10.1.1), 10.2.10
 */
export function frpDesign(p: { plyThickness: number; plies: number; width: number; tensileModulus: number; ruptureStrain: number; environmentalFactor: number }, fc: number): FrpDesign {
  const designRuptureStrain = p.environmentalFactor * p.ruptureStrain;
  const debondingStrain = aciDebondingStrainSI(fc, p.plies, p.tensileModulus, p.plyThickness);
  const { limit, cause, cap } = frpStrainLimit(debondingStrain, designRuptureStrain);
  // The debonding expression in its SI (MPa, mm) or in.-lb. (psi, in) form; the strains are the same.
  const formula = (debonding: string) => `εfu = CE·ε*fu = ${p.environmentalFactor} × ${p.ruptureStrain} = ${designRuptureStrain.toFixed(5)}; εfd = ${debonding} = ${debondingStrain.toFixed(5)} ${cause === 'frp-debonding' ? '<' : '≥'} 0.9εfu = ${cap.toFixed(5)} → limit ${limit.toFixed(5)} (${cause === 'frp-debonding' ? 'debonding' : 'rupture'} governs; ACI 440.2R-17 Eq. 10.1.1)`;
  return {
    plyThickness: p.plyThickness,
    plies: p.plies,
    width: p.width,
    area: p.plies * p.plyThickness * p.width,
    tensileModulus: p.tensileModulus,
    manufacturerRuptureStrain: p.ruptureStrain,
    environmentalFactor: p.environmentalFactor,
    designRuptureStrain,
    concreteStrength: fc,
    debondingStrain,
    ruptureCap: cap,
    limitStrain: limit,
    limitCause: cause,
    reductionFactor: FRP_FLEXURE_REDUCTION,
    formula: [bySystem(
      formula(`0.41√(f′c/(n·Ef·tf)) = 0.41√(${fc.toFixed(1)}/(${p.plies} × ${p.tensileModulus} × ${p.plyThickness}))`),
      formula(`0.083√(f′c/(n·Ef·tf)) = 0.083√(${convertUnit(fc, 'MPa', 'psi').toFixed(0)}/(${p.plies} × ${convertUnit(p.tensileModulus, 'MPa', 'psi').toPrecision(4)} × ${convertUnit(p.plyThickness, 'mm', 'in').toFixed(4)}))`),
    )],
  };
}

/**
 * Substrate strain at the FRP by cracked elastic analysis, εbi = M·(df − kd)/(Icr·Ec) (tension,
 * returned as a positive magnitude).
 * @param moment installation moment magnitude, N·mm; df depth of the FRP from the compression face, mm;
 *               kd cracked neutral-axis depth from the compression face, mm; Icr mm⁴ (concrete units); Ec MPa
 * @see ACI 440.2R-17 10.2.3 (from memory)
 */
export function crackedSubstrateStrain(moment: number, df: number, kd: number, icr: number, ec: number): number {
  return (moment * (df - kd)) / (icr * ec);
}

/**
 * Substrate strain at depth y (mm below the top fibre) when the section carries `moment` (N·mm,
 * magnitude in the curve's direction), read on the ascending branch of its moment–curvature curve
 * (linear between computed points); compression positive. Null when the moment exceeds the curve.
 */
export function substrateStrainFromCurve(model: SectionModel, curve: MomentCurvatureResult, moment: number, depth: number): number | null {
  const sign = directionSign(curve.direction);
  const pts = curve.points;
  if (pts.length === 0) return null;
  if (moment <= 0) return strainAtDepth(model, pts[0]!.referenceStrain, sign * pts[0]!.curvature, depth);
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1]!;
    const b = pts[i]!;
    if (b.moment >= moment) {
      const t = b.moment > a.moment ? (moment - a.moment) / (b.moment - a.moment) : 1;
      const eps0 = a.referenceStrain + t * (b.referenceStrain - a.referenceStrain);
      const phi = a.curvature + t * (b.curvature - a.curvature);
      return strainAtDepth(model, eps0, sign * phi, depth);
    }
  }
  return null;
}

/** The FRP laminate as a discrete section element (initial strain compression positive, so tension is negative). */
export function frpElement(label: string, material: FrpMaterial, design: FrpDesign, depth: number, initialStrain: number): DiscreteElement {
  return {
    kind: 'frp',
    label,
    sourceIndex: 0,
    area: design.area,
    depth,
    material,
    initialStrain,
    limitStrain: design.limitStrain,
    limitCause: design.limitCause,
    displacedConcrete: null,
  };
}
