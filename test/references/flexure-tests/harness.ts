/**
 * Validation harness for published laboratory flexure tests of simply supported RC beams
 * (specimens.json beside this file; sources in SOURCES.md).
 *
 * Each accepted specimen is written as a Hingeline project FILE (the public format of
 * docs/project-format.md), read back with `parseProject` (parse → migrate → validate) and analysed
 * with `analyzeProject` (core/analysis.ts). Nothing here reaches into engine internals, so the harness
 * keeps working while the engine is restructured; only the file format and the result shape
 * (MemberResult) are relied upon.
 *
 * Units: the record file states its own units in its field names (kN, mm, MPa); projects are written
 * in Hingeline's internal units (N, mm, MPa); comparison tables use kN, kN·m and mm.
 *
 * Ratios are measured / predicted. Each source's own definitions of yield and ultimate are kept in
 * the record; the program's definitions are its own (first yield of the tension steel; nominal yield
 * deflection by the secant through 75 % of the peak load; ultimate as the end of its load–deflection
 * curve). The comparison therefore mixes definitions exactly as the issue's baseline did; the per-
 * specimen table shows which definition each source used.
 */
import { readFileSync } from 'node:fs';
import { analyzeProject } from '../../../core/analysis.ts';
import { analysisBlockers, parseProject } from '../../../core/project/index.ts';
import type { MemberResult } from '../../../core/assessment/results.ts';
import { say } from '../../../core/units/phrase.ts';

// ---------------------------------------------------------------------------------------------------
// Record shape (see the header block of specimens.json for the field-by-field description)
// ---------------------------------------------------------------------------------------------------

/** Bars of one layer: count and diameter, or the total area when the source gives only that. */
export interface BarGroup {
  readonly count: number | null;
  readonly diameter_mm: number | null;
  readonly area_mm2: number | null;
}

export interface SteelProperties {
  /** Measured yield strength (0.2 % proof where the source says so), MPa. */
  readonly yield_MPa: number;
  /** Measured tensile strength, MPa (null when the source does not give it). */
  readonly ultimate_MPa: number | null;
  readonly elasticModulus_MPa: number | null;
  /** Strain at the onset of strain hardening, dimensionless (null when not given). */
  readonly hardeningStrain: number | null;
  /** Strain at fracture or uniform elongation as the source defines it, dimensionless. */
  readonly ruptureStrain: number | null;
}

export type Loading = 'three-point' | 'four-point';

export interface SpecimenRecord {
  /** `<sourceKey>/<label>`, unique in the file. */
  readonly id: string;
  readonly sourceKey: string;
  /** The beam's mark in the source. */
  readonly label: string;
  /** Tables or figures the values were transcribed from, e.g. "Tables 1 and 3". */
  readonly transcribedFrom: string;
  readonly geometry: {
    readonly width_mm: number;
    readonly height_mm: number;
    /** Depth of the centroid of the tension bars below the top fibre. */
    readonly effectiveDepth_mm: number;
    /** Depth of the centroid of the compression bars below the top fibre (null without top bars). */
    readonly compressionBarDepth_mm: number | null;
    /** Clear span between the support centrelines. */
    readonly span_mm: number;
    readonly loading: Loading;
    /** Distance from each support to the nearest load point (span/2 for three-point loading). */
    readonly shearSpan_mm: number;
  };
  readonly reinforcement: {
    readonly bottom: BarGroup;
    readonly top: BarGroup | null;
    /** Stirrups: bar diameter, spacing along the beam and legs (null when the source gives none). */
    readonly stirrups: { readonly diameter_mm: number; readonly spacing_mm: number; readonly legs: number; readonly yield_MPa: number | null } | null;
    /** Clear cover to the stirrups, mm (null when not given). */
    readonly clearCover_mm: number | null;
  };
  readonly concrete: {
    /** Mean measured cylinder strength at test, MPa (null when the source gives cubes only). */
    readonly cylinderStrength_MPa: number | null;
    /** Mean measured cube strength, MPa (null when not given). */
    readonly cubeStrength_MPa: number | null;
    /** How strength was measured, e.g. "3 cylinders 150 × 300 mm at test age". */
    readonly strengthSpecimens: string;
    readonly elasticModulus_MPa: number | null;
    /** Measured splitting or flexural tensile strength as the source gives it (null when not given). */
    readonly tensileStrength_MPa: number | null;
    readonly tensileTest: string | null;
  };
  readonly tensionSteel: SteelProperties;
  readonly compressionSteel: SteelProperties | null;
  readonly measured: {
    /** Total applied load (sum of the jack loads) at yield, kN, as the source defines yield. */
    readonly yieldLoad_kN: number | null;
    readonly yieldDeflection_mm: number | null;
    /** The source's definition of yield, in a few words. */
    readonly yieldDefinition: string;
    /** Largest total applied load, kN. */
    readonly peakLoad_kN: number;
    readonly peakDeflection_mm: number | null;
    readonly ultimateDeflection_mm: number | null;
    /** The source's definition of ultimate deflection, in a few words. */
    readonly ultimateDefinition: string;
    /** Displacement ductility as the source reports it (null when not reported). */
    readonly displacementDuctility: number | null;
    readonly failureMode: string;
  };
  /** Why any field is null, and anything else a reader must know. */
  readonly notes: readonly string[];
}

export interface SourceRecord {
  readonly key: string;
  readonly citation: string;
  readonly doi: string | null;
  readonly address: string | null;
  readonly licence: string;
}

export interface CandidateRecord {
  readonly sourceKey: string;
  readonly specimens: string;
  readonly status: 'excluded' | 'not-transcribed';
  readonly reason: string;
}

export interface FlexureTestSet {
  readonly format: 'hingeline-flexure-test-set';
  readonly version: 1;
  readonly sources: readonly SourceRecord[];
  readonly specimens: readonly SpecimenRecord[];
  readonly candidates: readonly CandidateRecord[];
}

/** Reads and checks the record file (throws with every problem listed when the shape is wrong). */
export function loadTestSet(path = new URL('./specimens.json', import.meta.url)): FlexureTestSet {
  const raw: unknown = JSON.parse(readFileSync(path, 'utf8'));
  const problems = checkTestSet(raw);
  if (problems.length > 0) throw new Error(`specimens.json:\n  ${problems.join('\n  ')}`);
  return raw as FlexureTestSet;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const positive = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v) && v > 0;
const positiveOrNull = (v: unknown): boolean => v === null || positive(v);
const text = (v: unknown): boolean => typeof v === 'string' && v.trim() !== '';

/**
 * Every problem with the shape of the record file: required fields, positive numbers, nulls
 * explained in the notes, references to sources, geometry that fits (bars inside the section, load
 * points on the span). Returns an empty list when the file is sound.
 */
export function checkTestSet(raw: unknown): string[] {
  const out: string[] = [];
  if (!isObject(raw)) return ['the file must hold one JSON object'];
  if (raw.format !== 'hingeline-flexure-test-set') out.push('format must be "hingeline-flexure-test-set"');
  if (raw.version !== 1) out.push('version must be 1');
  const sources = Array.isArray(raw.sources) ? raw.sources : [];
  if (!Array.isArray(raw.sources)) out.push('sources must be a list');
  const keys = new Set<string>();
  sources.forEach((s: unknown, i) => {
    if (!isObject(s) || !text(s.key) || !text(s.citation) || !text(s.licence)) out.push(`sources[${i}]: key, citation and licence are required`);
    else if (keys.has(s.key as string)) out.push(`sources[${i}]: duplicate key ${String(s.key)}`);
    else keys.add(s.key as string);
  });
  const specimens = Array.isArray(raw.specimens) ? raw.specimens : [];
  if (!Array.isArray(raw.specimens)) out.push('specimens must be a list');
  const ids = new Set<string>();
  specimens.forEach((s: unknown, i) => out.push(...checkSpecimen(s, i, keys, ids)));
  const candidates = Array.isArray(raw.candidates) ? raw.candidates : [];
  if (!Array.isArray(raw.candidates)) out.push('candidates must be a list');
  candidates.forEach((c: unknown, i) => {
    if (!isObject(c) || !text(c.specimens) || !text(c.reason) || (c.status !== 'excluded' && c.status !== 'not-transcribed')) {
      out.push(`candidates[${i}]: specimens, status (excluded | not-transcribed) and reason are required`);
    } else if (!keys.has(c.sourceKey as string)) out.push(`candidates[${i}]: unknown sourceKey ${String(c.sourceKey)}`);
  });
  return out;
}

function checkSpecimen(s: unknown, i: number, keys: ReadonlySet<string>, ids: Set<string>): string[] {
  const at = `specimens[${i}]`;
  if (!isObject(s)) return [`${at}: must be an object`];
  const out: string[] = [];
  if (!text(s.id) || ids.has(s.id as string)) out.push(`${at}: id missing or duplicated`);
  else ids.add(s.id as string);
  if (!keys.has(s.sourceKey as string)) out.push(`${at}: unknown sourceKey ${String(s.sourceKey)}`);
  if (!text(s.label) || !text(s.transcribedFrom)) out.push(`${at}: label and transcribedFrom are required`);
  const g = isObject(s.geometry) ? s.geometry : {};
  for (const f of ['width_mm', 'height_mm', 'effectiveDepth_mm', 'span_mm', 'shearSpan_mm']) if (!positive(g[f])) out.push(`${at}.geometry.${f} must be a positive number`);
  if (g.loading !== 'three-point' && g.loading !== 'four-point') out.push(`${at}.geometry.loading must be three-point or four-point`);
  if (positive(g.effectiveDepth_mm) && positive(g.height_mm) && (g.effectiveDepth_mm as number) >= (g.height_mm as number)) out.push(`${at}: effective depth must be less than the height`);
  if (positive(g.shearSpan_mm) && positive(g.span_mm) && (g.shearSpan_mm as number) > (g.span_mm as number) / 2 + 1e-9) out.push(`${at}: shear span must be at most half the span`);
  if (g.loading === 'three-point' && positive(g.shearSpan_mm) && Math.abs((g.shearSpan_mm as number) - (g.span_mm as number) / 2) > 1e-6) out.push(`${at}: three-point loading needs shearSpan_mm = span_mm / 2`);
  const r = isObject(s.reinforcement) ? s.reinforcement : {};
  if (!barGroupOk(r.bottom)) out.push(`${at}.reinforcement.bottom needs count and diameter_mm, or area_mm2`);
  if (r.top !== null && !barGroupOk(r.top)) out.push(`${at}.reinforcement.top needs count and diameter_mm, or area_mm2 (or null)`);
  const hasTop = r.top !== null && r.top !== undefined;
  if (hasTop !== (g.compressionBarDepth_mm !== null && g.compressionBarDepth_mm !== undefined)) out.push(`${at}: compressionBarDepth_mm must be given exactly when there are top bars`);
  const c = isObject(s.concrete) ? s.concrete : {};
  if (!positiveOrNull(c.cylinderStrength_MPa) || !positiveOrNull(c.cubeStrength_MPa) || ((c.cylinderStrength_MPa ?? null) === null && (c.cubeStrength_MPa ?? null) === null)) out.push(`${at}.concrete: a measured cylinder or cube strength is required`);
  if (!text(c.strengthSpecimens)) out.push(`${at}.concrete.strengthSpecimens must say how strength was measured`);
  if (!steelOk(s.tensionSteel)) out.push(`${at}.tensionSteel: yield_MPa is required, other numbers positive or null`);
  if (hasTop && !steelOk(s.compressionSteel)) out.push(`${at}.compressionSteel is required with top bars`);
  const m = isObject(s.measured) ? s.measured : {};
  if (!positive(m.peakLoad_kN)) out.push(`${at}.measured.peakLoad_kN must be a positive number`);
  for (const f of ['yieldLoad_kN', 'yieldDeflection_mm', 'peakDeflection_mm', 'ultimateDeflection_mm', 'displacementDuctility']) if (!positiveOrNull(m[f])) out.push(`${at}.measured.${f} must be positive or null`);
  for (const f of ['yieldDefinition', 'ultimateDefinition', 'failureMode']) if (!text(m[f])) out.push(`${at}.measured.${f} is required`);
  const notes = Array.isArray(s.notes) ? s.notes : null;
  if (!notes) out.push(`${at}.notes must be a list`);
  const nulls = nullFields(s);
  if (nulls.length > 0 && (!notes || notes.length === 0)) out.push(`${at}: fields ${nulls.join(', ')} are null; say why in notes`);
  return out;
}

function barGroupOk(b: unknown): boolean {
  if (!isObject(b)) return false;
  return positive(b.area_mm2) || (positive(b.count) && Number.isInteger(b.count) && positive(b.diameter_mm));
}

function steelOk(v: unknown): boolean {
  if (!isObject(v) || !positive(v.yield_MPa)) return false;
  return ['ultimate_MPa', 'elasticModulus_MPa', 'hardeningStrain', 'ruptureStrain'].every((f) => positiveOrNull(v[f]));
}

/** Dotted paths of the null numeric fields of a record (structural nulls such as `top` excepted). */
function nullFields(v: unknown, prefix = ''): string[] {
  if (!isObject(v)) return [];
  return Object.entries(v).flatMap(([k, x]) => {
    const path = prefix ? `${prefix}.${k}` : k;
    if (x === null) return ['top', 'compressionSteel', 'compressionBarDepth_mm', 'stirrups'].includes(k) ? [] : [path];
    return isObject(x) ? nullFields(x, path) : [];
  });
}

// ---------------------------------------------------------------------------------------------------
// Modelling choices (stated in docs/validation.md)
// ---------------------------------------------------------------------------------------------------

/**
 * The best-estimate inputs a careful engineer would give for an analysis of a laboratory test:
 *  - code basis ACI 318-19, so that the concrete law peaks at the measured cylinder strength itself
 *    (under EN 1992-1-1 the laws peak at fck + 8 MPa);
 *  - concrete in compression: Thorenfeldt–Collins (mean stress–strain law for normal- and high-strength
 *    concrete; Collins & Mitchell 1991), with the measured modulus when the source gives it;
 *  - concrete in tension: tension stiffening, ft = fcr / (1 + √(200 εt)) in the effective tension area
 *    (Collins & Mitchell 1991; see DEVELOPERS.md), with fcr the measured tensile strength when given,
 *    else the ACI 318-19 modulus of rupture 0.62 √f′c;
 *  - steel: Park & Paulay elastic–plastic–hardening law with the measured fy, fu, Es, εsh, εsu; where a
 *    source gives no fu the bars are taken as elastic–plastic (fu = fy) and this is noted;
 *  - cube strength only: f′c = 0.8 fcu (common practice, no source) — flagged on the specimen;
 *  - loads: the test's point loads as live load, no self-weight (test loads and deflections are
 *    reported from the start of loading), load pattern proportional;
 *  - hinge length: Priestley et al. (2007) as the program's default; the script also runs Mattock (1967);
 *  - 60 integration segments (the program's default).
 */
export const MODELLING = {
  codeBasis: 'ACI 318-19',
  compressionModel: 'thorenfeldt-collins',
  tensionModel: 'tension-stiffening',
  steelModel: 'park-paulay',
  cubeToCylinder: 0.8,
  hingeLengthMethods: ['priestley-2007', 'mattock-1967'],
  stations: 60,
} as const;

export type HingeMethod = (typeof MODELLING.hingeLengthMethods)[number];

/** Load per point load in the project file, N (the analysis scales it; the value only sets the service checks). */
const UNIT_POINT_LOAD = 10_000;

function barLayer(group: BarGroup, steelId: string, depth: number, label: string): Record<string, unknown> {
  return group.area_mm2 !== null && (group.count === null || group.diameter_mm === null)
    ? { steelId, depth, area: group.area_mm2, label }
    : { steelId, depth, count: group.count, diameter: group.diameter_mm, label };
}

function steelSpec(id: string, name: string, s: SteelProperties): Record<string, unknown> {
  const fu = s.ultimate_MPa ?? s.yield_MPa;
  return {
    kind: 'steel', id, name,
    model: fu > s.yield_MPa ? MODELLING.steelModel : 'elastic-plastic',
    yieldStress: s.yield_MPa,
    ultimateStress: fu,
    ...(s.elasticModulus_MPa !== null ? { elasticModulus: s.elasticModulus_MPa } : {}),
    ...(s.hardeningStrain !== null && fu > s.yield_MPa ? { hardeningStrain: s.hardeningStrain } : {}),
    ...(s.ruptureStrain !== null ? { ruptureStrain: s.ruptureStrain } : {}),
  };
}

/** The concrete strength the analysis uses (MPa) and whether it was converted from cubes. */
export function cylinderStrength(s: SpecimenRecord): { value: number; fromCubes: boolean } {
  if (s.concrete.cylinderStrength_MPa !== null) return { value: s.concrete.cylinderStrength_MPa, fromCubes: false };
  return { value: MODELLING.cubeToCylinder * s.concrete.cubeStrength_MPa!, fromCubes: true };
}

/** Point-load positions along the span, mm from the left support. */
export function loadPositions(s: SpecimenRecord): number[] {
  const { span_mm: L, shearSpan_mm: a, loading } = s.geometry;
  return loading === 'three-point' ? [L / 2] : [a, L - a];
}

/**
 * Moment at the critical section per unit of TOTAL applied load, mm: L/4 for one central load,
 * a/2 for two equal loads at a from the supports. Moment (N·mm) = total load (N) × this lever.
 */
export function momentLever(s: SpecimenRecord): number {
  return s.geometry.loading === 'three-point' ? s.geometry.span_mm / 4 : s.geometry.shearSpan_mm / 2;
}

/** The project file (text, format version 2) that describes one specimen. */
export function specimenProjectText(s: SpecimenRecord, hinge: HingeMethod = 'priestley-2007'): string {
  const fc = cylinderStrength(s);
  const bars = [barLayer(s.reinforcement.bottom, 'tension-bars', s.geometry.effectiveDepth_mm, 'tension bars')];
  if (s.reinforcement.top && s.compressionSteel && s.geometry.compressionBarDepth_mm !== null) {
    bars.push(barLayer(s.reinforcement.top, 'compression-bars', s.geometry.compressionBarDepth_mm, 'compression bars'));
  }
  const stirrups = s.reinforcement.stirrups;
  const hoops = stirrups && s.reinforcement.clearCover_mm !== null
    ? { hoops: { steelId: stirrups.yield_MPa !== null ? 'stirrup-bars' : 'tension-bars', diameter: stirrups.diameter_mm, spacing: stirrups.spacing_mm, verticalLegs: stirrups.legs, horizontalLegs: 2, clearCover: s.reinforcement.clearCover_mm, confineCore: false } }
    : {};
  const materials: Record<string, unknown>[] = [
    {
      kind: 'concrete', id: 'concrete', name: `measured f′c ${fc.value.toFixed(1)} MPa${fc.fromCubes ? ' (0.8 × cube)' : ''}`,
      strength: fc.value, compressionModel: MODELLING.compressionModel, tensionModel: MODELLING.tensionModel,
      ...(s.concrete.elasticModulus_MPa !== null ? { elasticModulus: s.concrete.elasticModulus_MPa } : {}),
      ...(s.concrete.tensileStrength_MPa !== null ? { tensileStrength: s.concrete.tensileStrength_MPa } : {}),
    },
    steelSpec('tension-bars', 'tension bars (measured)', s.tensionSteel),
  ];
  if (s.compressionSteel) materials.push(steelSpec('compression-bars', 'compression bars (measured)', s.compressionSteel));
  if (stirrups && stirrups.yield_MPa !== null) materials.push({ kind: 'steel', id: 'stirrup-bars', name: 'stirrups', model: 'elastic-plastic', yieldStress: stirrups.yield_MPa, ultimateStress: stirrups.yield_MPa });
  const project = {
    format: 'hingeline-project',
    version: 3,
    info: {
      name: `Flexure test ${s.id}`, number: '', description: `Laboratory test ${s.label} (${s.sourceKey}); see test/references/flexure-tests/SOURCES.md`,
      engineer: '', checker: '', revision: '', date: '', codeBasis: MODELLING.codeBasis, unitSystem: 'si',
    },
    materials,
    sections: [{
      id: 'section', name: `${s.geometry.width_mm} × ${s.geometry.height_mm} mm`, concreteId: 'concrete',
      shape: { kind: 'rectangle', width: s.geometry.width_mm, height: s.geometry.height_mm },
      bars,
      ...hoops,
    }],
    members: [{
      id: 'beam', name: s.label, supports: 'simply-supported', span: s.geometry.span_mm,
      zones: [{ from: 0, to: s.geometry.span_mm, sectionId: 'section' }],
      loads: loadPositions(s).map((x, k) => ({ kind: 'point', loadCase: 'live', magnitude: UNIT_POINT_LOAD, position: x, label: `jack ${k + 1}` })),
      includeSelfWeight: false,
      service: { sustainedLiveFraction: 0, durationMonths: 0, limitCases: ['aci-floor-immediate'] },
      capacity: { pattern: 'proportional', hingeLengthMethod: hinge },
    }],
    settings: { momentDropFraction: 0.8, bilinearMethod: 'priestley-2007', stations: MODELLING.stations },
  };
  return `${JSON.stringify(project, null, 2)}\n`;
}

// ---------------------------------------------------------------------------------------------------
// Running and comparing
// ---------------------------------------------------------------------------------------------------

/** What the program predicts for one specimen (kN, kN·m, mm; null where it has no value). */
export interface Prediction {
  readonly peakLoad: number | null;
  readonly peakMoment: number | null;
  readonly firstYieldLoad: number | null;
  readonly yieldDeflection: number | null;
  readonly ultimateDeflection: number | null;
  readonly displacementDuctility: number | null;
  readonly failureCause: string;
}

export interface SpecimenOutcome {
  readonly specimen: SpecimenRecord;
  /** Why the program gave no prediction (input errors, a failed analysis), or null. */
  readonly failure: string | null;
  readonly prediction: Prediction | null;
}

const finite = (v: number | null | undefined): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Analyses one specimen through the project file. Never throws for a bad specimen: says why instead. */
export function runSpecimen(s: SpecimenRecord, hinge: HingeMethod = 'priestley-2007'): SpecimenOutcome {
  const parsed = parseProject(specimenProjectText(s, hinge));
  const errors = parsed.diagnostics.filter((d) => d.severity === 'error');
  if (!parsed.project || analysisBlockers(parsed.diagnostics).length > 0 || errors.length > 0) {
    return { specimen: s, failure: `project file rejected: ${errors.map((d) => `${d.path}: ${d.message}`).join('; ')}`, prediction: null };
  }
  const member: MemberResult | undefined = analyzeProject(parsed.project).members[0];
  if (!member) return { specimen: s, failure: 'the analysis returned no member', prediction: null };
  if (member.status === 'input-error') return { specimen: s, failure: `input error: ${member.errors.map((e) => say(e.message, 'si')).join('; ')}`, prediction: null };
  return { specimen: s, failure: member.status === 'not-converged' ? say(member.governingMode, 'si') : null, prediction: predictionOf(member, s) };
}

/** Picks the compared quantities out of a member result (kN, kN·m, mm). */
export function predictionOf(member: MemberResult, s: SpecimenRecord): Prediction {
  const points = member.loadDeflection.points;
  const peakN = points.length > 0 ? Math.max(...points.map((p) => p.totalLoad)) : null;
  const totalPerLoadFactor = loadPositions(s).length * UNIT_POINT_LOAD;
  const firstYield = member.loadDeflection.events.find((e) => e.kind === 'first-yield');
  return {
    peakLoad: finite(peakN !== null ? peakN / 1000 : null),
    peakMoment: finite(peakN !== null ? (peakN * momentLever(s)) / 1e6 : null),
    firstYieldLoad: finite(firstYield ? (firstYield.loadFactor * totalPerLoadFactor) / 1000 : null),
    yieldDeflection: finite(member.ductility.yieldDeflection),
    ultimateDeflection: finite(member.ductility.ultimateDeflection),
    displacementDuctility: finite(member.ductility.displacementDuctility),
    failureCause: member.ductility.failureCause,
  };
}

export const QUANTITIES = ['peakMoment', 'firstYieldLoad', 'yieldDeflection', 'ultimateDeflection', 'displacementDuctility'] as const;
export type Quantity = (typeof QUANTITIES)[number];

export const QUANTITY_LABEL: Readonly<Record<Quantity, string>> = {
  peakMoment: 'peak moment',
  firstYieldLoad: 'load at yield (program: first yield)',
  yieldDeflection: 'yield deflection (program: nominal, 75 % secant)',
  ultimateDeflection: 'deflection at ultimate',
  displacementDuctility: 'displacement ductility μΔ',
};

/** Measured value of a quantity (kN, kN·m, mm, –) or null. μΔ falls back to Δu/Δy of the source. */
export function measuredValue(s: SpecimenRecord, q: Quantity): number | null {
  const m = s.measured;
  switch (q) {
    case 'peakMoment': return (m.peakLoad_kN * 1000 * momentLever(s)) / 1e6;
    case 'firstYieldLoad': return m.yieldLoad_kN;
    case 'yieldDeflection': return m.yieldDeflection_mm;
    case 'ultimateDeflection': return m.ultimateDeflection_mm;
    case 'displacementDuctility':
      return m.displacementDuctility ?? (m.ultimateDeflection_mm !== null && m.yieldDeflection_mm !== null ? m.ultimateDeflection_mm / m.yieldDeflection_mm : null);
  }
}

/** measured / predicted, or null when either is missing or the prediction is not positive. */
export function ratio(o: SpecimenOutcome, q: Quantity): number | null {
  const measured = measuredValue(o.specimen, q);
  const predicted = o.prediction?.[q] ?? null;
  if (measured === null || predicted === null || !(predicted > 0)) return null;
  return finite(measured / predicted);
}

export interface Statistics {
  readonly count: number;
  readonly median: number | null;
  readonly mean: number | null;
  /** Sample standard deviation / mean (n − 1 in the denominator); null below two values. */
  readonly coefficientOfVariation: number | null;
  readonly min: number | null;
  readonly max: number | null;
}

/** Count, median, mean, coefficient of variation (sample), min and max of a list of ratios. */
export function statistics(values: readonly number[]): Statistics {
  const n = values.length;
  if (n === 0) return { count: 0, median: null, mean: null, coefficientOfVariation: null, min: null, max: null };
  const sorted = [...values].sort((a, b) => a - b);
  const median = n % 2 === 1 ? sorted[(n - 1) / 2]! : (sorted[n / 2 - 1]! + sorted[n / 2]!) / 2;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const variance = n > 1 ? values.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1) : null;
  return {
    count: n, median, mean,
    coefficientOfVariation: variance !== null && mean !== 0 ? Math.sqrt(variance) / Math.abs(mean) : null,
    min: sorted[0]!, max: sorted[n - 1]!,
  };
}

/** Statistics of measured/predicted of every quantity over the outcomes given. */
export function summarise(outcomes: readonly SpecimenOutcome[]): Record<Quantity, Statistics> {
  return Object.fromEntries(QUANTITIES.map((q) => [q, statistics(outcomes.map((o) => ratio(o, q)).filter((r): r is number => r !== null))])) as Record<Quantity, Statistics>;
}

/** Tension reinforcement ratio As/(b d). */
export function tensionRatio(s: SpecimenRecord): number {
  const b = s.reinforcement.bottom;
  const area = b.area_mm2 ?? (b.count! * Math.PI * b.diameter_mm! ** 2) / 4;
  return area / (s.geometry.width_mm * s.geometry.effectiveDepth_mm);
}

/** Groups the breakdown uses: loading, reinforcement ratio band, compression steel, fu/fy. */
export function groupsOf(s: SpecimenRecord): Record<string, string> {
  const rho = tensionRatio(s) * 100;
  const fuFy = s.tensionSteel.ultimate_MPa !== null ? s.tensionSteel.ultimate_MPa / s.tensionSteel.yield_MPa : null;
  return {
    loading: s.geometry.loading,
    'ρ band': rho < 0.5 ? 'ρ < 0.5 %' : rho < 1 ? '0.5 ≤ ρ < 1 %' : rho < 2 ? '1 ≤ ρ < 2 %' : 'ρ ≥ 2 %',
    'compression steel': s.reinforcement.top ? 'with top bars' : 'without top bars',
    'fu/fy': fuFy === null ? 'fu not given' : fuFy < 1.15 ? 'fu/fy < 1.15' : fuFy < 1.3 ? '1.15 ≤ fu/fy < 1.3' : 'fu/fy ≥ 1.3',
  };
}

/** Statistics per group value, for each grouping of `groupsOf`. */
export function breakdown(outcomes: readonly SpecimenOutcome[]): { grouping: string; group: string; stats: Record<Quantity, Statistics> }[] {
  const rows: { grouping: string; group: string; stats: Record<Quantity, Statistics> }[] = [];
  const groupings = outcomes.length > 0 ? Object.keys(groupsOf(outcomes[0]!.specimen)) : [];
  for (const grouping of groupings) {
    const values = [...new Set(outcomes.map((o) => groupsOf(o.specimen)[grouping]!))].sort();
    for (const group of values) rows.push({ grouping, group, stats: summarise(outcomes.filter((o) => groupsOf(o.specimen)[grouping] === group)) });
  }
  return rows;
}
