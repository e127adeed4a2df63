/**
 * The strain and stress state over the depth of a section at one equilibrium point: what the
 * strain/stress profile plots and the report's "state at first yield / ultimate" tables show.
 */
import type { SectionModel, BendingDirection } from './model.ts';
import type { CurvePoint, SectionState, ElementState, ConcreteProfileSample } from './results.ts';
import { stripWidthAt } from './width-profile.ts';
import { crackedBelow, sectionResultants, stiffeningFactors } from './forces.ts';

/** Faces of the section for a bending direction: depths (mm) of the extreme compression and tension fibres. */
export function faces(model: SectionModel, direction: BendingDirection): { compression: number; tension: number } {
  let top = Infinity;
  let bottom = -Infinity;
  for (const part of model.concreteParts) {
    top = Math.min(top, part.top);
    bottom = Math.max(bottom, part.bottom);
  }
  return direction === 'sagging' ? { compression: top, tension: bottom } : { compression: bottom, tension: top };
}

/** Strain at depth y (mm) for centroid strain ε0 and signed curvature φ (1/mm). */
export function strainAtDepth(model: SectionModel, eps0: number, phi: number, y: number): number {
  return eps0 + phi * (model.centroidDepth - y);
}

/** Builds the curve-point summary for an equilibrium state (signed φ, signed M). */
export function curvePointOf(model: SectionModel, direction: BendingDirection, phi: number, eps0: number, moment: number, residual: number): CurvePoint {
  const s = direction === 'sagging' ? 1 : -1;
  const face = faces(model, direction);
  let maxSteelTensileStrain = 0;
  for (const e of model.elements) {
    if (e.kind === 'frp') continue;
    const own = strainAtDepth(model, eps0, phi, e.depth) - e.initialStrain;
    if (-own > maxSteelTensileStrain) maxSteelTensileStrain = -own;
  }
  const yZero = phi !== 0 ? model.centroidDepth + eps0 / phi : null;
  return {
    curvature: Math.abs(phi),
    moment: s * moment,
    neutralAxisDepth: yZero === null ? null : direction === 'sagging' ? yZero - face.compression : face.compression - yZero,
    compressionFaceStrain: strainAtDepth(model, eps0, phi, face.compression),
    tensionFaceStrain: strainAtDepth(model, eps0, phi, face.tension),
    maxSteelTensileStrain,
    referenceStrain: eps0,
    residual,
  };
}

/** Number of evenly spaced depth samples of the concrete stress profile (plus strip and breakpoint depths). */
const PROFILE_SAMPLES = 48;

/** Full state at (ε0, φ): strains at every depth, stresses per concrete part, element forces, resultants. */
export function sectionState(model: SectionModel, direction: BendingDirection, phi: number, eps0: number, moment: number, residual: number): SectionState {
  const point = curvePointOf(model, direction, phi, eps0, moment, residual);
  const depths = new Set<number>();
  for (let i = 0; i <= PROFILE_SAMPLES; i++) depths.add((model.height * i) / PROFILE_SAMPLES);
  for (const part of model.concreteParts) {
    for (const s of part.strips) {
      depths.add(s.top);
      depths.add(s.bottom);
    }
    if (phi !== 0) {
      for (const b of part.material.breakpoints) {
        const y = model.centroidDepth + (eps0 - b) / phi;
        if (y > 0 && y < model.height) depths.add(y);
      }
    }
  }
  const sorted = [...depths].sort((a, b) => a - b);
  const factors = stiffeningFactors(model, eps0, phi);
  const concrete: ConcreteProfileSample[] = sorted.map((y) => {
    const strain = strainAtDepth(model, eps0, phi, y);
    return {
      depth: y,
      strain,
      stress: model.concreteParts.map((part) => {
        const inside = part.strips.some((s) => y >= s.top && y <= s.bottom && Math.max(stripWidthAt(s, Math.min(Math.max(y, s.top), s.bottom)), 0) > 0);
        if (!inside) return null;
        const stress = part.material.stress(strain);
        return part.stiffeningGroup !== undefined && strain < crackedBelow(part.material) ? factors[part.stiffeningGroup]! * stress : stress;
      }),
    };
  });
  const elements: ElementState[] = model.elements.map((e) => {
    const strain = strainAtDepth(model, eps0, phi, e.depth) - e.initialStrain;
    const stress = e.material.stress(strain);
    const force = stress * e.area;
    return { kind: e.kind, label: e.label, depth: e.depth, area: e.area, strain, stress, force };
  });
  const r = sectionResultants(model, eps0, phi);
  const compression = r.compression;
  const tension = r.tension;
  const leverArm = compression > 0 && tension > 0 ? Math.abs(r.tensionDepth - r.compressionDepth) : null;
  return {
    direction,
    point,
    topStrain: strainAtDepth(model, eps0, phi, 0),
    bottomStrain: strainAtDepth(model, eps0, phi, model.height),
    neutralAxisDepthFromTop: phi !== 0 ? model.centroidDepth + eps0 / phi : null,
    concreteParts: model.concreteParts.map((p) => ({ role: p.role, label: p.label })),
    concrete,
    elements,
    compressionResultant: compression,
    tensionResultant: tension,
    leverArm,
  };
}
