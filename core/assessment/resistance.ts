/**
 * Design flexural resistance of a section in one bending direction, by the code's own assumptions
 * whatever laws the engineer chose for the section's behaviour (core/materials/code/design-laws.ts),
 * solved directly at the ultimate strain state (core/section/ultimate.ts):
 *  - ACI 318-19: φMn with εcu = 0.003 (22.2.2.1), every concrete part's own rectangular block
 *    0.85 f′c over β1·c (22.2.2.4), no concrete tension, steel stress Es·εs ≤ fy (20.2.2.1, no
 *    hardening), φ from the net tensile strain εt of the extreme tension steel (Table 21.2.2,
 *    "other" transverse reinforcement, εty = fy/Es, 21.2.2.1).
 *  - with externally bonded FRP (ACI 440.2R-17 10.2.10): the FRP at its effective strain limit when
 *    it is reached before εcu (concrete then by the parabola of Eqs. 10.2.5), and ψf = 0.85 on the
 *    FRP's part: φ(Mns + ψf·Mnf).
 *  - EN 1992-1-1: M_Rd with every concrete part's own parabola–rectangle at fcd = fck/γc and
 *    crushing at its own εcu2 (3.1.7, Table 3.1), steel at fyd = fyk/γs with no strain limit (3.2.7);
 *    ψf of ACI 440.2R-17 on an FRP's part (EN 1992-1-1 has no rule for bonded FRP).
 * Confinement is ignored (conservative); the strengths are the specified (or in-place) ones.
 * Units: N·mm, MPa.
 */
import { ACI_CRUSHING_STRAIN, ACI_STEEL_MODULUS } from '../materials/code/aci318.ts';
import { aciFrpParabola, aciStressBlock, designSteel, enDesignConcrete, EN1992_STEEL_FACTOR } from '../materials/code/design-laws.ts';
import { en1992ParabolaRectangleConstants } from '../materials/concrete/en1992-parabola-rectangle.ts';
import type { CodeBasis } from '../materials/specs.ts';
import type { ConcreteMaterial } from '../materials/types.ts';
import { FRP_FLEXURE_REDUCTION } from '../retrofit/frp.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import { isSteel, steelYieldStress, tensionSteel, type BendingDirection, type ConcretePart, type SectionModel } from '../section/model.ts';
import { ultimateState, type UltimateState } from '../section/ultimate.ts';
import { phrase, q, type Text } from '../units/phrase.ts';

/** Strength reduction factor φ for flexure, ACI 318-19 Table 21.2.2 (other transverse reinforcement). */
export function aciFlexureReductionFactor(netTensileStrain: number, yieldStrain: number): number {
  if (netTensileStrain >= yieldStrain + 0.003) return 0.9;
  if (netTensileStrain <= yieldStrain) return 0.65;
  return 0.65 + (0.25 * (netTensileStrain - yieldStrain)) / 0.003;
}

/** A design flexural resistance (N·mm) with the nominal moment and the FRP part it was reduced from, and how it was found. */
export interface FlexuralResistance {
  /** Design resistance φMn or M_Rd, N·mm (null without tension reinforcement in the direction). */
  readonly value: number | null;
  /** Moment of the ultimate state (Mn under ACI), and the FRP's part Mnf, N·mm. */
  readonly nominal: number | null;
  readonly frpMoment: number;
  /** ACI φ (null under EN 1992-1-1 or without a resistance). */
  readonly phi: number | null;
  /** Net tensile strain of the extreme tension steel at the ultimate state, and its yield strain (design Es). */
  readonly netTensileStrain: number | null;
  readonly steelYieldStrain: number | null;
  /** Neutral-axis depth c and the effective depth of the extreme tension steel dt, mm. */
  readonly neutralAxisDepth: number | null;
  /** What ends the design state: concrete crushing, or the FRP's limit. */
  readonly limit: 'concrete' | 'frp-rupture' | 'frp-debonding' | null;
  readonly note: Text;
}

/** The part whose concrete an element displaces: the part at its depth (a core or layer before the cover). */
function partAt(model: SectionModel, depth: number): ConcretePart | undefined {
  const inside = model.concreteParts.filter((p) => depth >= p.top && depth <= p.bottom && p.strips.some((s) => depth >= s.top && depth <= s.bottom && s.widthTop + s.widthBottom > 0));
  return inside.find((p) => p.role !== 'cover') ?? inside[0] ?? model.concreteParts[0];
}

/**
 * The section with the code's design laws: each concrete part the law of its own strength, steel
 * elastic–perfectly plastic at fy (ACI) or fyd (EN) with no strain limit, FRP unchanged (its
 * effective strain limit stays the element's limit).
 */
function designModel(model: SectionModel, concreteLaw: (strength: number) => ConcreteMaterial, steelFactor: number): SectionModel {
  const laws = new Map<number, ConcreteMaterial>();
  const lawOf = (strength: number) => {
    let law = laws.get(strength);
    if (!law) laws.set(strength, (law = concreteLaw(strength)));
    return law;
  };
  return {
    ...model,
    concreteParts: model.concreteParts.map((p) => ({ ...p, material: lawOf(p.strength), governsCrushing: true })),
    elements: model.elements.map((e) => {
      const host = e.displacedConcrete ? partAt(model, e.depth) : undefined;
      const displacedConcrete = host ? lawOf(host.strength) : null;
      if (!isSteel(e)) return { ...e, displacedConcrete };
      const { limitStrain: _l, limitCause: _c, ...rest } = e;
      return { ...rest, material: designSteel(steelYieldStress(e)! / steelFactor), displacedConcrete };
    }),
  };
}

const withFrp = (model: SectionModel) => model.elements.some((e) => e.kind === 'frp');

/** The code's ultimate state of a section in one direction (ACI: block, or the 440.2R parabola when the FRP governs). */
function codeState(code: CodeBasis, model: SectionModel, direction: BendingDirection): UltimateState | null {
  if (code === 'ACI 318-19') {
    const block = ultimateState(designModel(model, aciStressBlock, 1), direction, () => ACI_CRUSHING_STRAIN);
    if (!block || block.limit.kind === 'concrete' || !withFrp(model)) return block;
    // The FRP limit comes before εcu: the block does not apply (ACI 440.2R-17 10.2.10).
    return ultimateState(designModel(model, aciFrpParabola, 1), direction, () => ACI_CRUSHING_STRAIN);
  }
  return ultimateState(designModel(model, enDesignConcrete, EN1992_STEEL_FACTOR), direction, (p) => en1992ParabolaRectangleConstants({ strength: p.strength, characteristicStrength: Math.min(p.strength, 90) }).epsCu2);
}

const cache = new WeakMap<SectionModel, Map<string, FlexuralResistance>>();

/** Design flexural resistance of a section in one direction (see the module comment). Cached per model. */
export function flexuralDesignResistance(code: CodeBasis, analysis: SectionAnalysis, direction: BendingDirection): FlexuralResistance {
  const model = analysis.model;
  const none = (note: Text): FlexuralResistance => ({ value: null, nominal: null, frpMoment: 0, phi: null, netTensileStrain: null, steelYieldStrain: null, neutralAxisDepth: null, limit: null, note });
  if (!model) return none('no section model');
  let byKey = cache.get(model);
  if (!byKey) cache.set(model, (byKey = new Map()));
  const key = `${code}|${direction}`;
  const known = byKey.get(key);
  if (known) return known;
  const result = solve(code, model, direction, none);
  byKey.set(key, result);
  return result;
}

function solve(code: CodeBasis, model: SectionModel, direction: BendingDirection, none: (note: Text) => FlexuralResistance): FlexuralResistance {
  if (tensionSteel(model, direction).length === 0) return none('no tension reinforcement');
  const state = codeState(code, model, direction);
  if (!state || !(state.moment > 0)) return none('no equilibrium at the code ultimate strain: the tension reinforcement cannot balance the compression');
  // FRP's part of the moment: each FRP force about the compression resultant.
  let frpForce = 0;
  let frpMoment = 0;
  for (const e of model.elements) {
    if (e.kind !== 'frp') continue;
    const strain = state.referenceStrain + state.curvature * (model.centroidDepth - e.depth) - e.initialStrain;
    const force = e.material.stress(strain) * e.area;
    if (force < 0) {
      frpForce -= force;
      frpMoment += -force * Math.abs(e.depth - state.compressionDepth);
    }
  }
  const reduced = state.moment - (1 - FRP_FLEXURE_REDUCTION) * frpMoment;
  const limit: FlexuralResistance['limit'] = state.limit.kind === 'concrete' ? 'concrete' : state.limit.cause === 'frp-debonding' ? 'frp-debonding' : state.limit.cause === 'frp-rupture' ? 'frp-rupture' : 'concrete';
  const steel = state.extremeSteel;
  const steelYield = steel ? (steelYieldStress(steel.element)! / (code === 'ACI 318-19' ? 1 : EN1992_STEEL_FACTOR)) / ACI_STEEL_MODULUS : null;
  const m = (x: number) => q('moment', x);
  const where = limit === 'concrete'
    ? code === 'ACI 318-19' ? 'εc = 0.003, rectangular block' : 'εcu2 at the compression face, parabola–rectangle at fcd'
    : `FRP at its ${limit === 'frp-debonding' ? 'debonding' : 'rupture'} strain before ${code === 'ACI 318-19' ? 'εc = 0.003 (ACI 440.2R-17 Eqs. 10.2.5)' : 'εcu2'}`;
  const base = { nominal: state.moment, frpMoment, netTensileStrain: steel?.strain ?? null, steelYieldStrain: steelYield, neutralAxisDepth: state.neutralAxisDepth, limit };
  if (code === 'ACI 318-19') {
    const phi = steel && steelYield !== null ? aciFlexureReductionFactor(steel.strain, steelYield) : 0.65;
    const epsT = steel ? phrase`, εt = ${(steel.strain * 1000).toFixed(2)} ‰` : '';
    const note = frpForce > 0
      ? phrase`φ(Mns + ψf·Mnf) = ${phi.toFixed(3)} × (${m(state.moment - frpMoment)} + 0.85 × ${m(frpMoment)}) = ${m(phi * reduced)} (${where}${epsT}; ACI 318-19 22.2, ACI 440.2R-17 10.2.10)`
      : phrase`φMn = ${phi.toFixed(3)} × ${m(state.moment)} (${where}, fs ≤ fy, no concrete tension${epsT}; ACI 318-19 22.2, 21.2.2)`;
    return { value: phi * reduced, phi, note, ...base };
  }
  const note = frpForce > 0
    ? phrase`M_Rd = Mns + ψf·Mnf = ${m(state.moment - frpMoment)} + 0.85 × ${m(frpMoment)} = ${m(reduced)} (${where}, fyd = fyk/1.15; ψf of ACI 440.2R-17 10.2.10)`
    : phrase`M_Rd = ${m(state.moment)} (${where}, fcd = fck/1.5, fyd = fyk/1.15, no concrete tension; EN 1992-1-1 3.1.7, 3.2.7, 6.1)`;
  return { value: reduced, phi: null, note, ...base };
}
