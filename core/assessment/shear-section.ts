/**
 * Shear capacity of one zone's section in one bending direction, by the project's code basis
 * (shear-aci.ts, shear-en.ts): the section's effective depth, web width and tension bars for shear,
 * and the capacities at design and nominal level with the governing expression in words.
 * Units: N, mm, MPa.
 */
import type { CodeBasis, ConcreteSpec } from '../materials/specs.ts';
import type { SectionAnalysis } from '../section/analyze.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { barArea } from '../section/definition.ts';
import type { BendingDirection, SectionModel } from '../section/model.ts';
import { faces } from '../section/state.ts';
import { stripWidthAt } from '../section/width-profile.ts';
import { aciShearStrength, type AciEdition, type StirrupInput } from './shear-aci.ts';
import { enShearStrength } from './shear-en.ts';
import { convertUnit } from '../units/convert.ts';
import { bySystem, type Text } from '../units/phrase.ts';

export interface ShearGeometry {
  /** Depth of the compression face below the top fibre, mm. */
  readonly compressionFace: number;
  /** d: compression face to the centroid of the tension bars, mm. */
  readonly effectiveDepth: number;
  /** bw: the smallest width between the compression face and the tension bars, mm. */
  readonly webWidth: number;
  /** Area of the longitudinal tension bars, mm² (plates and FRP excluded). */
  readonly tensionBarArea: number;
  /** Total concrete area of the model, mm². */
  readonly concreteArea: number;
  /** False when the direction has no tension bars (d falls back to 0.8 of the depth). */
  readonly hasTensionBars: boolean;
}

/** Total concrete width of a model at depth y (sum over parts), mm. */
function widthAt(model: SectionModel, y: number): number {
  let w = 0;
  for (const part of model.concreteParts) for (const s of part.strips) if (y >= s.top && y <= s.bottom) w += Math.max(0, stripWidthAt(s, y));
  return w;
}

/**
 * d, bw, As for shear in a bending direction. Bars only count as tension reinforcement (bonded
 * plates and FRP are outside the concrete); bw is the least width over the depth from the
 * compression face to the tension bars (the web of a flanged section; EN 1992-1-1 6.2.2(1)
 * "smallest width in the tensile area"; ACI 318-19 bw "web width").
 */
export function shearSectionGeometry(model: SectionModel, direction: BendingDirection): ShearGeometry {
  const face = faces(model, direction);
  const bars = model.elements.filter((e) => e.kind === 'bar' && (direction === 'sagging' ? e.depth > model.centroidDepth : e.depth < model.centroidDepth));
  const area = bars.reduce((s, e) => s + e.area, 0);
  const depth = Math.abs(face.tension - face.compression);
  const hasTensionBars = area > 0;
  const centroid = hasTensionBars ? bars.reduce((s, e) => s + e.area * e.depth, 0) / area : face.compression + (direction === 'sagging' ? 0.8 : -0.8) * depth;
  const effectiveDepth = Math.abs(centroid - face.compression);
  const lo = Math.min(face.compression, centroid);
  const hi = Math.max(face.compression, centroid);
  const candidates = new Set<number>([lo, hi]);
  for (const part of model.concreteParts) for (const s of part.strips) for (const y of [s.top, s.bottom]) if (y > lo && y < hi) candidates.add(y);
  const eps = 1e-6 * Math.max(depth, 1);
  let webWidth = Infinity;
  for (const y of candidates) {
    for (const probe of [y - eps, y + eps]) {
      if (probe < lo || probe > hi) continue;
      const w = widthAt(model, probe);
      if (w > 0) webWidth = Math.min(webWidth, w);
    }
  }
  let concreteArea = 0;
  for (const part of model.concreteParts) for (const s of part.strips) concreteArea += 0.5 * (s.widthTop + s.widthBottom) * (s.bottom - s.top);
  return { compressionFace: face.compression, effectiveDepth, webWidth: Number.isFinite(webWidth) ? webWidth : 0, tensionBarArea: area, concreteArea, hasTensionBars };
}

export interface ShearZone {
  readonly from: number;
  readonly to: number;
  readonly definition: SectionDefinition;
  readonly analysis: SectionAnalysis;
  readonly concrete: ConcreteSpec;
  /** Yield stress of the stirrup steel, MPa (undefined without stirrups or when it failed to build). */
  readonly stirrupYield?: number;
}

/** Shear capacity of a zone section in one bending direction, design and nominal (N, mm, MPa). */
export interface ShearCapacity {
  readonly sectionId: string;
  readonly sectionName: string;
  readonly direction: BendingDirection;
  readonly code: CodeBasis;
  readonly effectiveDepth: number;
  readonly webWidth: number;
  /** False when the direction has no tension bars (d falls back to 0.8 of the depth, ρ = 0). */
  readonly hasTensionBars: boolean;
  /** f′c or fck used, MPa. */
  readonly concreteStrength: number;
  readonly stirrups: { readonly legs: number; readonly diameter: number; readonly spacing: number; readonly area: number; readonly yieldStress: number; readonly meetsMinimum: boolean } | null;
  /** Concrete and stirrup contributions and the upper limit (ACI: Vc, Vs, Vc + 0.66√f′c·bw·d; EN: VRd,c, VRd,s, VRd,max), design level, N. */
  readonly concreteContribution: number;
  readonly stirrupContribution: number;
  readonly upperLimit: number;
  /** Nominal (ACI Vn; EN with γc = γs = 1) and design (φVn; VRd) strengths, N. */
  readonly nominal: number;
  readonly design: number;
  /** EN only: design and nominal limits at the support face (Eq. 6.5), N. */
  readonly supportLimit: { readonly design: number; readonly nominal: number } | null;
  /** The governing expression with the numbers, for the report. */
  readonly formula: Text;
  readonly notes: readonly Text[];
}

const kN = (n: number) => `${(n / 1000).toFixed(1)} kN`;
const kip = (n: number) => `${convertUnit(n, 'N', 'kip').toFixed(1)} kip`;
const inch = (mm: number) => convertUnit(mm, 'mm', 'in').toFixed(1);
/** √ of a stress in MPa, as √psi. */
const sqrtPsi = (sqrtMpa: number) => Math.sqrt(convertUnit(sqrtMpa * sqrtMpa, 'MPa', 'psi'));

/**
 * Shear capacity of a zone's section in one bending direction (the side in tension sets d and ρ).
 * @see ACI 318-19 22.5; EN 1992-1-1 6.2 (via aciShearStrength / enShearStrength)
 */
export function sectionShearCapacity(code: CodeBasis, zone: ShearZone, direction: BendingDirection, edition: AciEdition = 'us'): ShearCapacity | null {
  const model = zone.analysis.model;
  if (!model) return null;
  const geometry = shearSectionGeometry(model, direction);
  const { effectiveDepth: d, webWidth: bw } = geometry;
  if (!(d > 0 && bw > 0)) return null;
  const hoops = zone.definition.hoops;
  const stirrups: StirrupInput | null = hoops && zone.stirrupYield !== undefined && zone.stirrupYield > 0
    ? { area: hoops.verticalLegs * barArea(hoops.diameter), spacing: hoops.spacing, yieldStress: zone.stirrupYield }
    : null;
  const fc = zone.concrete.strength;
  const rho = geometry.tensionBarArea / (bw * d);
  const notes: Text[] = [];
  if (!geometry.hasTensionBars) notes.push(`No ${direction === 'sagging' ? 'bottom' : 'top'} tension bars: d taken as 0.8 of the depth and ρ = 0.`);
  if (hoops && !stirrups) notes.push('The stirrup steel could not be resolved: stirrups ignored.');
  const common = { bw, d, axialForce: model.axialForce };
  const identity = { sectionId: zone.definition.id, sectionName: zone.definition.name, direction, code, effectiveDepth: d, webWidth: bw, hasTensionBars: geometry.hasTensionBars, concreteStrength: fc };
  if (code === 'ACI 318-19') {
    const lambda = zone.concrete.lightweightFactor ?? 1;
    const r = aciShearStrength({ ...common, fc, lambda, rhoW: rho, grossArea: geometry.concreteArea, stirrups, edition });
    const c = r.concrete;
    const vcText = c.expression === '(a)'
      ? `Vc = (0.17λ√f′c + Nu/6Ag)·bw·d = (0.17 × ${lambda} × ${c.sqrtFc.toFixed(2)} + ${c.axialStress.toFixed(2)}) × ${bw.toFixed(0)} × ${d.toFixed(0)} = ${kN(c.value)}`
      : `Vc = (0.66${c.expression === '(c)' ? `·λs` : ''}·λ·ρw^(1/3)·√f′c + Nu/6Ag)·bw·d${c.expression === '(c)' ? ` with λs = ${c.lambdaS.toFixed(3)}` : ''}, ρw = ${rho.toFixed(4)}: ${kN(c.value)}`;
    // The in.-lb. form of the same expressions: 2λ√f′c and 8λ·ρw^(1/3)·√f′c with f′c in psi (ACI 318-19 Table 22.5.5.1, from memory).
    const vcTextUS = c.expression === '(a)'
      ? `Vc = (2λ√f′c + Nu/6Ag)·bw·d = (2 × ${lambda} × ${sqrtPsi(c.sqrtFc).toFixed(1)} + ${convertUnit(c.axialStress, 'MPa', 'psi').toFixed(0)}) × ${inch(bw)} × ${inch(d)} = ${kip(c.value)}`
      : `Vc = (8${c.expression === '(c)' ? `·λs` : ''}·λ·ρw^(1/3)·√f′c + Nu/6Ag)·bw·d${c.expression === '(c)' ? ` with λs = ${c.lambdaS.toFixed(3)}` : ''}, ρw = ${rho.toFixed(4)}: ${kip(c.value)}`;
    return {
      ...identity,
      stirrups: hoops && stirrups ? { legs: hoops.verticalLegs, diameter: hoops.diameter, spacing: hoops.spacing, area: stirrups.area, yieldStress: r.stirrupYield, meetsMinimum: r.meetsMinimum } : null,
      concreteContribution: c.value,
      stirrupContribution: r.steel,
      upperLimit: c.value + r.steelLimit,
      nominal: r.nominal,
      design: r.design,
      supportLimit: null,
      formula: [bySystem(
        `(SI form of the code equations: mm, MPa, kN) ${vcText} (ACI 318-19 Table 22.5.5.1${c.expression}); Vs = Av·fyt·d/s = ${kN(r.steel)} (Eq. 22.5.8.5.3); φVn = 0.75 × ${kN(r.nominal)} = ${kN(r.design)}`,
        `(in.-lb. form of the code equations: in, psi, kip) ${vcTextUS} (ACI 318-19 Table 22.5.5.1${c.expression}); Vs = Av·fyt·d/s = ${kip(r.steel)} (Eq. 22.5.8.5.3); φVn = 0.75 × ${kip(r.nominal)} = ${kip(r.design)}`,
      )],
      notes: [...notes, ...r.notes],
    };
  }
  const enInput = { ...common, fck: fc, rhoL: rho, area: geometry.concreteArea, stirrups };
  const design = enShearStrength(enInput, { gammaC: 1.5, gammaS: 1.15 });
  const nominal = enShearStrength(enInput, { gammaC: 1, gammaS: 1 });
  const c = design.concrete;
  return {
    ...identity,
    stirrups: hoops && stirrups ? { legs: hoops.verticalLegs, diameter: hoops.diameter, spacing: hoops.spacing, area: stirrups.area, yieldStress: stirrups.yieldStress, meetsMinimum: design.meetsMinimum } : null,
    concreteContribution: c.value,
    stirrupContribution: design.steel,
    upperLimit: design.maximum,
    nominal: nominal.value,
    design: design.value,
    supportLimit: { design: design.supportLimit, nominal: nominal.supportLimit },
    // EN 1992-1-1 has SI equations only: shown in that form in either unit system.
    formula: `(SI form of the code equations: mm, MPa, kN) VRd,c = [${c.cRdc.toFixed(3)} × ${c.k.toFixed(3)} × (100 × ${c.rhoL.toFixed(4)} × ${fc})^(1/3) + 0.15 × ${c.sigmaCp.toFixed(2)}]·bw·d ≥ (vmin + 0.15σcp)·bw·d = ${kN(c.value)} (Eq. ${c.governedBy}); VRd,s = (Asw/s)·z·fywd·cot θ = ${kN(design.steel)} (Eq. 6.8), VRd,max = ${kN(design.maximum)} (Eq. 6.9) at cot θ = ${design.cotTheta.toFixed(2)}; VRd = ${kN(design.value)}`,
    notes: [...notes, ...design.notes],
  };
}

/**
 * Distance from a support within which sections take the shear at that distance (ACI 318-19
 * 9.4.3.2; EN 1992-1-1 6.2.1(8)): d, the smaller of the directions with tension bars — the check
 * starts no further from the support than either allows — or the larger d when neither has bars, mm.
 */
export function criticalSectionDepth(caps: { readonly sagging: ShearCapacity | null; readonly hogging: ShearCapacity | null }): number {
  const depths = [caps.sagging, caps.hogging].filter((k): k is ShearCapacity => k !== null && k.hasTensionBars).map((k) => k.effectiveDepth);
  return depths.length > 0 ? Math.min(...depths) : Math.max(caps.sagging?.effectiveDepth ?? 0, caps.hogging?.effectiveDepth ?? 0);
}

/** Shear capacities of every zone in both directions, and the distinct ones (one per section and direction) for the report. */
export function zoneShearCapacities(code: CodeBasis, zones: readonly ShearZone[], edition?: AciEdition): { caps: { sagging: ShearCapacity | null; hogging: ShearCapacity | null }[]; capacities: ShearCapacity[] } {
  const caps = zones.map((z) => ({ sagging: sectionShearCapacity(code, z, 'sagging', edition), hogging: sectionShearCapacity(code, z, 'hogging', edition) }));
  const capacities: ShearCapacity[] = [];
  const seen = new Set<string>();
  for (const c of caps) {
    for (const cap of [c.sagging, c.hogging]) {
      if (!cap) continue;
      const key = `${cap.sectionId}|${cap.direction}`;
      if (!seen.has(key)) {
        seen.add(key);
        capacities.push(cap);
      }
    }
  }
  return { caps, capacities };
}
