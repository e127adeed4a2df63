/**
 * One set of names for the moments of a section, the same in the app's tables and charts, the
 * command line and the report, each saying which moment it is:
 *
 * - first yield M′y — the tension steel first reaches fy (a point of the computed curve);
 * - nominal yield My of the idealisation — the yield point of the bilinear idealisation of the
 *   curve (Priestley et al.: the elastic line through first yield extended to the moment at the
 *   limit strains εc = 0.004 or εs = 0.015; or the equal-energy line). It is not first yield and
 *   may lie above or below it;
 * - peak Mmax, and Mu at the ultimate curvature (the end of the curve);
 * - the code resistance φMn (ACI 318-19, Mn at εcu = 0.003 reduced by φ) or M_Rd (EN 1992-1-1,
 *   design laws): what the strength check compares the factored moment with.
 *
 * "Nominal" alone is never used: the code's Mn and the idealisation's My are different numbers.
 */
import type { CodeBasis } from '../materials/specs.ts';
import type { KeyPointName } from '../section/results.ts';

export interface MomentName {
  readonly symbol: string;
  /** A few words for a column heading or a marker. */
  readonly name: string;
  /** What the moment is, for a legend or tooltip. */
  readonly meaning: string;
}

export const MOMENT_NAMES = {
  firstYield: { symbol: 'M′y', name: 'first yield', meaning: 'the tension steel first reaches its yield stress fy' },
  idealisedYield: { symbol: 'My', name: 'nominal yield of the idealisation', meaning: 'yield moment of the bilinear idealisation of the moment–curvature curve (not first yield)' },
  peak: { symbol: 'Mmax', name: 'peak', meaning: 'largest moment of the moment–curvature curve' },
  ultimate: { symbol: 'Mu', name: 'ultimate', meaning: 'moment at the ultimate curvature, where the curve ends' },
} as const satisfies Readonly<Record<string, MomentName>>;

/** The code resistance the strength check uses: φMn (ACI 318-19) or M_Rd (EN 1992-1-1). */
export function codeResistanceName(code: CodeBasis): MomentName {
  return code === 'ACI 318-19'
    ? { symbol: 'φMn', name: 'code resistance', meaning: 'design strength φMn of ACI 318-19 (Mn at the concrete strain 0.003, φ from the net tensile strain)' }
    : { symbol: 'M_Rd', name: 'code resistance', meaning: 'design resistance M_Rd of EN 1992-1-1 (design stress–strain laws, εcu2)' };
}

/** Short label of each key point of a moment–curvature curve (markers, key-point tables). */
export const KEY_POINT_LABELS: Readonly<Record<KeyPointName, string>> = {
  cracking: 'cracking',
  firstYield: `first yield ${MOMENT_NAMES.firstYield.symbol}`,
  codeCrushing: 'code crushing strain',
  nominal: 'limit strain εc 0.004 / εs 0.015',
  peak: `peak ${MOMENT_NAMES.peak.symbol}`,
  ultimate: 'ultimate',
};
