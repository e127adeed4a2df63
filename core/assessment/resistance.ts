/**
 * Design flexural resistance of a section in one bending direction:
 *  - ACI 318-19: φMn, with Mn the moment of the fibre analysis when the extreme concrete fibre
 *    reaches 0.003 (22.2.2.1) and φ from the net tensile strain εt (Table 21.2.2, "other"
 *    transverse reinforcement).
 *  - EN 1992-1-1: M_Rd from a second section analysis with design laws: parabola–rectangle with
 *    fcd = αcc·fck/γc (3.1.7, αcc = 1.0, γc = 1.5; 2.4.2.4) and elastic–plastic steel with
 *    fyd = fyk/γs (γs = 1.15) ending at εud = 0.9·εuk (3.2.7), at εcu2 or εud.
 *  - with externally bonded FRP, ψf = 0.85 on the FRP's contribution (ACI 440.2R-17 10.2.10).
 * Units: N·mm.
 */
import type { CodeBasis } from '../materials/specs.ts';
import { FRP_FLEXURE_REDUCTION } from '../retrofit/frp.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { sectionResultants } from '../section/forces.ts';
import { directionSign, type BendingDirection } from '../section/model.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { phrase, q, type Text } from '../units/phrase.ts';

/** Strength reduction factor φ for flexure, ACI 318-19 Table 21.2.2 (other transverse reinforcement). */
export function aciFlexureReductionFactor(netTensileStrain: number, yieldStrain: number): number {
  if (netTensileStrain >= yieldStrain + 0.003) return 0.9;
  if (netTensileStrain <= yieldStrain) return 0.65;
  return 0.65 + (0.25 * (netTensileStrain - yieldStrain)) / 0.003;
}

/** Design resistance of one direction from its curve (ACI: φMn; EN: curve of design laws → M_Rd). */
export function designResistance(code: CodeBasis, curve: MomentCurvatureResult | undefined, yieldStrain: number): { value: number | null; note: Text } {
  if (!curve || curve.points.length < 2) return { value: null, note: 'no tension reinforcement' };
  const kp = curve.keyPoints;
  const at = kp.codeCrushing && (!kp.ultimate || kp.codeCrushing.curvature <= kp.ultimate.curvature) ? kp.codeCrushing : kp.peak;
  if (!at) return { value: null, note: 'the section curve has no point to take a resistance from' };
  if (code === 'ACI 318-19') {
    const phi = aciFlexureReductionFactor(at.maxSteelTensileStrain, yieldStrain);
    return { value: phi * at.moment, note: phrase`φMn = ${phi.toFixed(3)} × ${q('moment', at.moment)} (εt = ${(at.maxSteelTensileStrain * 1000).toFixed(2)} ‰${at === kp.peak ? ', at the peak: the curve ends before εc = 0.003' : ''})` };
  }
  return { value: at.moment, note: phrase`M_Rd = ${q('moment', at.moment)} from design laws${at === kp.peak ? ' (at the peak: the curve ends before εcu2)' : ''}` };
}

/** A design flexural resistance (N·mm) with the nominal moment and the FRP part it was reduced from, and how it was found. */
export interface FlexuralResistance {
  /** Design resistance, N·mm (null without tension reinforcement in the direction). */
  readonly value: number | null;
  /** Nominal moment Mn of the point used, and the FRP's part Mnf, N·mm. */
  readonly nominal: number | null;
  readonly frpMoment: number;
  readonly note: Text;
}

/**
 * Design flexural resistance of a section in one direction, with ψf on the FRP's contribution:
 *  - ACI 318-19 basis: φ·(Mn − (1 − ψf)·Mnf) = φ(Mns + ψf·Mnf), Mn at εc = 0.003 or where the curve
 *    ends (FRP debonding or rupture) if sooner, φ from εt (ACI 318-19 Table 21.2.2);
 *  - EN 1992-1-1 basis: the same on the curve with design laws (M_Rd).
 * Mnf = Tf·(df − yc), Tf the FRP force and yc the depth of the compression resultant. Without FRP
 * it is exactly the engine's resistance (core/assessment/resistance.ts designResistance).
 * @see ACI 440.2R-17 10.2.10; ACI 318-19 Table 21.2.2
 */
export function flexuralDesignResistance(code: CodeBasis, analysis: SectionAnalysis, direction: BendingDirection): FlexuralResistance {
  const curve = code === 'EN 1992-1-1' && analysis.designCurves ? analysis.designCurves[direction] : analysis.curves[direction];
  const model = analysis.model;
  const hasFrp = model?.elements.some((e) => e.kind === 'frp') ?? false;
  const plain = designResistance(code, curve, analysis.yieldStrain[direction]);
  if (!hasFrp || !curve || !model || plain.value === null) return { value: plain.value, nominal: null, frpMoment: 0, note: plain.note };
  const kp = curve.keyPoints;
  const at = kp.codeCrushing && (!kp.ultimate || kp.codeCrushing.curvature <= kp.ultimate.curvature) ? kp.codeCrushing : kp.peak;
  if (!at) return { value: plain.value, nominal: null, frpMoment: 0, note: plain.note };
  const frp = at.state.elements.filter((e) => e.kind === 'frp' && e.force < 0);
  const tf = -frp.reduce((s, e) => s + e.force, 0);
  const df = tf > 0 ? frp.reduce((s, e) => s - e.force * e.depth, 0) / tf : 0;
  let yc: number;
  if (code === 'ACI 318-19') {
    yc = sectionResultants(model, at.referenceStrain, directionSign(direction) * at.curvature).compressionDepth;
  } else {
    // Design laws carry no concrete tension: the tension resultant is the elements' alone.
    const tension = at.state.elements.filter((e) => e.force < 0);
    const t = -tension.reduce((s, e) => s + e.force, 0);
    const yt = t > 0 ? tension.reduce((s, e) => s - e.force * e.depth, 0) / t : 0;
    const z = at.state.leverArm ?? 0;
    yc = direction === 'sagging' ? yt - z : yt + z;
  }
  const mnf = tf * Math.abs(df - yc);
  const reduced = at.moment - (1 - FRP_FLEXURE_REDUCTION) * mnf;
  const kNm = (x: number) => q('moment', x);
  const where = at === kp.peak ? 'where the curve ends (FRP limit before εc = 0.003)' : 'at εc = 0.003';
  if (code === 'ACI 318-19') {
    const phi = aciFlexureReductionFactor(at.maxSteelTensileStrain, analysis.yieldStrain[direction]);
    return {
      value: phi * reduced,
      nominal: at.moment,
      frpMoment: mnf,
      note: phrase`φ(Mns + ψf·Mnf) = ${phi.toFixed(3)} × (${kNm(at.moment - mnf)} + 0.85 × ${kNm(mnf)}) = ${kNm(phi * reduced)} (${where}, εt = ${(at.maxSteelTensileStrain * 1000).toFixed(2)} ‰; ACI 440.2R-17 10.2.10)`,
    };
  }
  return {
    value: reduced,
    nominal: at.moment,
    frpMoment: mnf,
    note: phrase`M_Rd = Mns + ψf·Mnf = ${kNm(at.moment - mnf)} + 0.85 × ${kNm(mnf)} = ${kNm(reduced)} from design laws (${where}; ψf of ACI 440.2R-17 10.2.10)`,
  };
}
