/**
 * Equivalent plastic hinge length Lp, mm, from published expressions.
 *
 * Each expression is written for a hinge at a support face (one side of the critical section,
 * shear span z = distance to the point of contraflexure). For a hinge inside the span the
 * plastic zone spreads to both sides; Hingeline then sums the span-dependent part for both
 * sides (z1 + z2), keeps the depth-dependent part once, and drops the strain-penetration term,
 * since no bars are anchored there (common practice, no source).
 */
import type { HingeLengthMethod } from './definition.ts';
import type { QuantityText } from '../units/text.ts';

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
  /** Formats the result in the project's display units after the formula (which keeps its published mm/MPa form). */
  readonly text?: QuantityText;
}

export interface HingeLength {
  readonly length: number;
  /** The expression with the numbers substituted, for the report. */
  readonly formula: string;
}

const round = (x: number) => x.toFixed(0);

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

/** Hinge length for a member hinge, with the substituted formula. */
export function hingeLength(input: HingeLengthInput): HingeLength {
  const result = hingeLengthSI(input);
  // The expressions are published in mm and MPa; a US project also gets the result in its units.
  if (input.text && input.text.system === 'US') return { ...result, formula: `${result.formula}; Lp = ${input.text.section(result.length)}` };
  return result;
}

function hingeLengthSI(input: HingeLengthInput): HingeLength {
  const { method, effectiveDepth: d, shearSpans, barDiameter: db, yieldStress: fy, ultimateStress: fu, atSupport } = input;
  const zSum = shearSpans.reduce((s, z) => s + Math.max(z, 0), 0);
  const zText = shearSpans.map(round).join(' + ');
  switch (method) {
    case 'priestley-2007': {
      const k = Math.min(0.2 * (fu / fy - 1), 0.08);
      const length = atSupport ? priestleyCalviKowalsky2007(zSum, fy, fu, db, true) : priestleyCalviKowalsky2007(zSum, fy, fu, db, false);
      const lsp = 0.022 * fy * db;
      return {
        length,
        formula: atSupport
          ? `Lp = k·Lc + Lsp ≥ 2Lsp = ${k.toFixed(3)} × ${zText} + ${round(lsp)} = ${round(length)} mm (k = 0.2(fu/fy − 1) ≤ 0.08, Lsp = 0.022·fy·db; Priestley, Calvi & Kowalsky 2007)`
          : `Lp = k·(z1 + z2) = ${k.toFixed(3)} × (${zText}) = ${round(length)} mm (no strain penetration inside the span; Priestley, Calvi & Kowalsky 2007)`,
      };
    }
    case 'paulay-priestley-1992': {
      const length = paulayPriestley1992(zSum, fy, db, atSupport);
      return {
        length,
        formula: atSupport
          ? `Lp = 0.08·z + 0.022·db·fy = 0.08 × ${zText} + 0.022 × ${db} × ${round(fy)} = ${round(length)} mm (Paulay & Priestley 1992)`
          : `Lp = 0.08·(z1 + z2) = 0.08 × (${zText}) = ${round(length)} mm (Paulay & Priestley 1992, no strain penetration inside the span)`,
      };
    }
    case 'mattock-1967': {
      const length = mattock1967(d, zSum);
      return { length, formula: `Lp = 0.5·d + 0.05·z = 0.5 × ${round(d)} + 0.05 × ${shearSpans.length > 1 ? `(${zText})` : zText} = ${round(length)} mm (Mattock 1967)` };
    }
    case 'corley-1966': {
      const length = corley1966(d, zSum);
      return { length, formula: `Lp = 0.5·d + 0.2·z/√d (inches) = ${round(length)} mm with d = ${round(d)} mm, z = ${shearSpans.length > 1 ? `(${zText})` : zText} mm (Corley 1966)` };
    }
    case 'user': {
      const length = input.userLength ?? 0;
      return { length, formula: `Lp = ${round(length)} mm (value given by the engineer)` };
    }
  }
}
