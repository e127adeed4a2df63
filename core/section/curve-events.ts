/**
 * The events along a moment–curvature curve as functions of an equilibrium state: each is negative
 * before its event and ≥ 0 at and after it, so the curvature where it happens is a root
 * (core/section/curve-solver.ts locate). Key points (cracking, first yield, the code crushing
 * strain, the nominal point) mark the curve; ultimate events (crushing, an element's limit strain,
 * the moment drop after yield) end it.
 * Units: strain dimensionless (compression positive), moment N·mm.
 */
import type { EquilibriumState } from './equilibrium.ts';
import { directionSign, isSteel, tensionSteel, type BendingDirection, type ConcretePart, type DiscreteElement, type SectionModel } from './model.ts';
import type { UltimateCause } from './results.ts';
import { faces, strainAtDepth } from './state.ts';

export type EventName = 'cracking' | 'firstYield' | 'codeCrushing' | 'nominal' | 'crushing' | 'elementLimit' | 'momentDrop';

export const KEY_EVENTS: readonly EventName[] = ['cracking', 'firstYield', 'codeCrushing', 'nominal'];
export const ULTIMATE_EVENTS: readonly EventName[] = ['crushing', 'elementLimit', 'momentDrop'];

/** Strain limits of the nominal point of Priestley, Calvi & Kowalsky (2007) §4.2 (from memory): εc = 0.004 or εs = 0.015. */
export const NOMINAL_CONCRETE_STRAIN = 0.004;
export const NOMINAL_STEEL_STRAIN = 0.015;

/** What the moment-drop event needs from the march so far. */
export interface DropState {
  /** True once the tension steel has yielded. */
  yielded: boolean;
  /** Largest moment magnitude since first yield, N·mm. */
  dropReference: number;
}

export interface CurveEventOptions {
  /** Extreme-fibre concrete strain of the code key point. */
  readonly codeCrushingStrain: number;
  /** Fraction of the post-yield peak below which the curve ends. */
  readonly dropFraction: number;
}

export interface CurveEvents {
  readonly g: Readonly<Record<EventName, (eq: EquilibriumState) => number>>;
  readonly enabled: Readonly<Record<EventName, boolean>>;
  /** Concrete parts whose crushing ends the curve. */
  readonly governing: readonly ConcretePart[];
  /** Every event function at a state (−1 for events that are switched off). */
  evaluateAll(eq: EquilibriumState): Record<EventName, number>;
  /** The cause of an ultimate event at a state: which material reached its limit. */
  causeOf(name: EventName, eq: EquilibriumState): UltimateCause;
  /**
   * The fibre that decides event `name` at a state near its root, and the strain it has there (a
   * face reaching a strain, the most strained bar reaching yield): the event's state can then be
   * solved with that strain held exactly (CurveSolver.pinEvent). Null for the moment drop and the
   * element limits (solved elsewhere).
   */
  pinOf(name: EventName, eq: EquilibriumState): { readonly depth: number; readonly strain: number } | null;
}

/** The first item of largest score (undefined for none). */
function largest<T>(items: readonly T[], score: (item: T) => number): T | undefined {
  let best: T | undefined;
  let top = -Infinity;
  for (const item of items) {
    const v = score(item);
    if (v > top) {
      top = v;
      best = item;
    }
  }
  return best;
}

export function curveEvents(model: SectionModel, direction: BendingDirection, options: CurveEventOptions, drop: DropState): CurveEvents {
  const sign = directionSign(direction);
  const steelInTension = tensionSteel(model, direction);
  const face = faces(model, direction);
  const tensionPart = model.concreteParts.find((p) => (direction === 'sagging' ? p.bottom === face.tension : p.top === face.tension)) ?? model.concreteParts[0]!;
  const crackingStrain = tensionPart.material.crackingStrain;
  const governing = model.concreteParts.filter((p) => p.governsCrushing);
  const limited = model.elements.filter((e) => e.limitStrain !== undefined && e.limitStrain > 0);

  const own = (e: DiscreteElement, eq: EquilibriumState) => strainAtDepth(model, eq.referenceStrain, eq.curvature, e.depth) - e.initialStrain;
  const compressionFaceStrain = (eq: EquilibriumState) => strainAtDepth(model, eq.referenceStrain, eq.curvature, face.compression);
  const maxSteelTension = (eq: EquilibriumState) => {
    let m = 0;
    for (const e of model.elements) if (isSteel(e)) m = Math.max(m, -own(e, eq));
    return m;
  };
  /** The compression face of a concrete part whose crushing ends the curve. */
  const crushingFace = (p: ConcretePart) => (direction === 'sagging' ? p.top : p.bottom);
  const g: Record<EventName, (eq: EquilibriumState) => number> = {
    cracking: (eq) => -strainAtDepth(model, eq.referenceStrain, eq.curvature, face.tension) / crackingStrain - 1,
    firstYield: (eq) => {
      let r = -Infinity;
      for (const e of steelInTension) r = Math.max(r, -own(e, eq) / e.material.yieldStrain!);
      return r - 1;
    },
    codeCrushing: (eq) => compressionFaceStrain(eq) / options.codeCrushingStrain - 1,
    nominal: (eq) => Math.max(compressionFaceStrain(eq) / NOMINAL_CONCRETE_STRAIN, maxSteelTension(eq) / NOMINAL_STEEL_STRAIN) - 1,
    crushing: (eq) => {
      let r = -Infinity;
      for (const p of governing) r = Math.max(r, strainAtDepth(model, eq.referenceStrain, eq.curvature, crushingFace(p)) / p.material.crushingStrain);
      return r - 1;
    },
    elementLimit: (eq) => {
      let r = -Infinity;
      for (const e of limited) r = Math.max(r, -own(e, eq) / e.limitStrain!);
      return r - 1;
    },
    momentDrop: (eq) => (drop.yielded && drop.dropReference > 0 ? options.dropFraction - (sign * eq.moment) / drop.dropReference : -1),
  };
  const enabled: Record<EventName, boolean> = {
    cracking: crackingStrain > 0,
    firstYield: true,
    codeCrushing: true,
    nominal: true,
    crushing: governing.length > 0,
    elementLimit: limited.length > 0,
    momentDrop: true,
  };
  return {
    g,
    enabled,
    governing,
    evaluateAll(eq) {
      // One object literal of a fixed shape (KEY_EVENTS, then ULTIMATE_EVENTS): this runs at every curve step.
      return {
        cracking: enabled.cracking ? g.cracking(eq) : -1,
        firstYield: enabled.firstYield ? g.firstYield(eq) : -1,
        codeCrushing: enabled.codeCrushing ? g.codeCrushing(eq) : -1,
        nominal: enabled.nominal ? g.nominal(eq) : -1,
        crushing: enabled.crushing ? g.crushing(eq) : -1,
        elementLimit: enabled.elementLimit ? g.elementLimit(eq) : -1,
        momentDrop: enabled.momentDrop ? g.momentDrop(eq) : -1,
      };
    },
    pinOf(name, eq) {
      switch (name) {
        case 'cracking': return { depth: face.tension, strain: -crackingStrain };
        case 'codeCrushing': return { depth: face.compression, strain: options.codeCrushingStrain };
        case 'firstYield': {
          const bar = largest(steelInTension, (e) => -own(e, eq) / e.material.yieldStrain!);
          return bar ? { depth: bar.depth, strain: bar.initialStrain - bar.material.yieldStrain! } : null;
        }
        case 'nominal': {
          if (compressionFaceStrain(eq) / NOMINAL_CONCRETE_STRAIN >= maxSteelTension(eq) / NOMINAL_STEEL_STRAIN) return { depth: face.compression, strain: NOMINAL_CONCRETE_STRAIN };
          const bar = largest(model.elements.filter(isSteel), (e) => -own(e, eq));
          return bar ? { depth: bar.depth, strain: bar.initialStrain - NOMINAL_STEEL_STRAIN } : null;
        }
        case 'crushing': {
          const part = largest(governing, (p) => strainAtDepth(model, eq.referenceStrain, eq.curvature, crushingFace(p)) / p.material.crushingStrain);
          return part ? { depth: crushingFace(part), strain: part.material.crushingStrain } : null;
        }
        default: return null;
      }
    },
    causeOf(name, eq) {
      if (name === 'momentDrop') return 'moment-drop';
      if (name === 'crushing') return governing.some((p) => p.role === 'core') ? 'core-crushing' : 'concrete-crushing';
      let worst: DiscreteElement | undefined;
      let ratio = -Infinity;
      for (const e of limited) {
        const r = -own(e, eq) / e.limitStrain!;
        if (r > ratio) {
          ratio = r;
          worst = e;
        }
      }
      return worst?.limitCause ?? 'steel-rupture';
    },
  };
}
