/**
 * Equivalent plastic hinge length Lp, mm, from published expressions.
 *
 * Each expression is written for a hinge at a support face (one side of the critical section,
 * shear span z = distance to the point of contraflexure). For a hinge inside the span the
 * plastic zone spreads to both sides; Hingeline then sums the span-dependent part for both
 * sides (z1 + z2), keeps the depth-dependent part once, and drops the strain-penetration term,
 * since no bars are anchored there (common practice, no source).
 */
import { convertUnit } from '../units/convert.ts';
import { bySystem, type Text } from '../units/phrase.ts';
import type { HingeLengthMethod } from './definition.ts';

export interface HingeLengthInput {
  readonly method: HingeLengthMethod;
  /** Effective depth d of the hinge section, mm. */
  readonly effectiveDepth: number;
  /** Shear span(s) z, mm: one value at a support face, two (left and right) inside the span. */
  readonly shearSpans: readonly number[];
  /** Diameter of the main tension bars, mm, and their yield and ultimate stress, MPa. */
  readonly barDiameter: number;
  readonly yieldStress: number;
  readonly ultimateStress: number;
  /** True when the critical section is at a support face where bars anchor (strain penetration). */
  readonly atSupport: boolean;
  /** User value for `method: 'user'`, mm. */
  readonly userLength?: number;
}

export interface HingeLength {
  readonly length: number;
  /**
   * The expression with the numbers substituted, for the report and the app: the published SI form
   * (mm, MPa) in SI, the in.-lb. form (in, ksi) in US customary units.
   */
  readonly formula: Text;
}


/**
 * Priestley, Calvi & Kowalsky (2007), Eq. (4.31) (equation number from memory):
 * Lp = k·Lc + Lsp ≥ 2·Lsp, k = 0.2(fu/fy − 1) ≤ 0.08, Lsp = 0.022·fy·dbl (MPa, mm).
 */
export function priestleyCalviKowalsky2007(z: number, fy: number, fu: number, db: number, withPenetration: boolean): number {
  const k = Math.min(0.2 * (fu / fy - 1), 0.08);
  const lsp = 0.022 * fy * db;
  return withPenetration ? Math.max(k * z + lsp, 2 * lsp) : k * z;
}

/** Paulay & Priestley (1992), Eq. (3.57) (equation number from memory): Lp = 0.08·L + 0.022·db·fy (MPa, mm). */
export function paulayPriestley1992(z: number, fy: number, db: number, withPenetration: boolean): number {
  return 0.08 * z + (withPenetration ? 0.022 * db * fy : 0);
}

/** Mattock (1967), discussion, ASCE J. Struct. Div. 93(ST2) (from memory): Lp = 0.5·d + 0.05·z. */
export function mattock1967(d: number, z: number): number {
  return 0.5 * d + 0.05 * z;
}

/** Corley (1966), ASCE J. Struct. Div. 92(ST5) (from memory): Lp = 0.5·d + 0.2·√d·(z/d), in inches. */
export function corley1966(dMm: number, zMm: number): number {
  const d = dMm / 25.4;
  const z = zMm / 25.4;
  return (0.5 * d + (0.2 * z) / Math.sqrt(d)) * 25.4;
}

/** The numbers of a formula in one system: lengths (from mm) and stresses (from MPa) as printed. */
interface Printer {
  length(mm: number): string;
  stress(mpa: number): string;
  /** Unit of the result. */
  readonly unit: string;
}

const SI: Printer = { length: (mm) => mm.toFixed(0), stress: (mpa) => mpa.toFixed(0), unit: 'mm' };
const US: Printer = { length: (mm) => convertUnit(mm, 'mm', 'in').toFixed(1), stress: (mpa) => convertUnit(mpa, 'MPa', 'ksi').toFixed(1), unit: 'in' };

/**
 * Hinge length for a member hinge, with the substituted formula in both forms. The strain
 * penetration term 0.022·fy·db (MPa, mm) is 0.15·fy·db in ksi and inches (Priestley, Calvi &
 * Kowalsky 2007; Paulay & Priestley 1992 — from memory); the other expressions are dimensionally
 * consistent, so only their numbers change.
 */
export function hingeLength(input: HingeLengthInput): HingeLength {
  const { method, effectiveDepth: d, shearSpans, barDiameter: db, yieldStress: fy, ultimateStress: fu, atSupport } = input;
  const zSum = shearSpans.reduce((s, z) => s + Math.max(z, 0), 0);
  let length: number;
  let formula: (p: Printer) => string;
  const zText = (p: Printer) => shearSpans.map(p.length).join(' + ');
  const zGroup = (p: Printer) => (shearSpans.length > 1 ? `(${zText(p)})` : zText(p));
  const penetration = (p: Printer) => (p === SI ? '0.022' : '0.15');
  switch (method) {
    case 'priestley-2007': {
      const k = Math.min(0.2 * (fu / fy - 1), 0.08);
      length = priestleyCalviKowalsky2007(zSum, fy, fu, db, atSupport);
      const lsp = 0.022 * fy * db;
      formula = (p) => atSupport
        ? `Lp = k·Lc + Lsp ≥ 2Lsp = ${k.toFixed(3)} × ${zText(p)} + ${p.length(lsp)} = ${p.length(length)} ${p.unit} (k = 0.2(fu/fy − 1) ≤ 0.08, Lsp = ${penetration(p)}·fy·db; Priestley, Calvi & Kowalsky 2007)`
        : `Lp = k·(z1 + z2) = ${k.toFixed(3)} × (${zText(p)}) = ${p.length(length)} ${p.unit} (no strain penetration inside the span; Priestley, Calvi & Kowalsky 2007)`;
      break;
    }
    case 'paulay-priestley-1992':
      length = paulayPriestley1992(zSum, fy, db, atSupport);
      formula = (p) => atSupport
        ? `Lp = 0.08·z + ${penetration(p)}·db·fy = 0.08 × ${zText(p)} + ${penetration(p)} × ${p === SI ? db : p.length(db)} × ${p.stress(fy)} = ${p.length(length)} ${p.unit} (Paulay & Priestley 1992)`
        : `Lp = 0.08·(z1 + z2) = 0.08 × (${zText(p)}) = ${p.length(length)} ${p.unit} (Paulay & Priestley 1992, no strain penetration inside the span)`;
      break;
    case 'mattock-1967':
      length = mattock1967(d, zSum);
      formula = (p) => `Lp = 0.5·d + 0.05·z = 0.5 × ${p.length(d)} + 0.05 × ${zGroup(p)} = ${p.length(length)} ${p.unit} (Mattock 1967)`;
      break;
    case 'corley-1966':
      length = corley1966(d, zSum);
      formula = (p) => (p === SI
        ? `Lp = 0.5·d + 0.2·z/√d (inches) = ${p.length(length)} mm with d = ${p.length(d)} mm, z = ${zGroup(p)} mm (Corley 1966)`
        : `Lp = 0.5·d + 0.2·z/√d = 0.5 × ${p.length(d)} + 0.2 × ${zGroup(p)}/√${p.length(d)} = ${p.length(length)} in (Corley 1966)`);
      break;
    case 'user':
      length = input.userLength ?? 0;
      formula = (p) => `Lp = ${p.length(length)} ${p.unit} (value given by the engineer)`;
      break;
  }
  return { length, formula: [bySystem(formula(SI), formula(US))] };
}
