/**
 * Reinforcing-bar designations as engineers write them on drawings and bar schedules, and the
 * nominal diameters they stand for (mm, the internal unit):
 *
 * - `#8`, `No. 8` — inch-pound bar numbers of ASTM A615/A615M Table 1 (the number is the nominal
 *   diameter in eighths of an inch up to #8; #9 and larger have the diameters of the table);
 * - `20M` — Canadian metric sizes of CSA G30.18 Table 1 (the number is the nominal diameter
 *   rounded to the nearest 5 mm; the actual nominal diameter is in the table);
 * - `Ø20` (also `ø`, `⌀`, `φ`) — a metric bar of 20 mm nominal diameter, the EN 10080 notation;
 *   the letters `T`, `H` and `Y` of UK bar schedules (`T20`, `H20`) mean the same diameter
 *   (common practice, no source). EN 10080 8.1 gives nominal diameters in half millimetres up to
 *   10 mm and in whole millimetres above; its Table 6 lists the preferred sizes.
 *
 * A count may come first, as on drawings: `3 #8`, `3#8`, `4Ø20`, `2T16`, `3-20M`.
 * The nominal area of a bar follows from its nominal diameter (πd²/4); the standards' tables
 * round those areas (ASTM to 0.01 in², CSA to 100 mm²), which is the only difference.
 * Pure, no I/O.
 */

/** ASTM A615/A615M Table 1: bar number → nominal diameter, in. */
export const ASTM_A615_DIAMETERS_IN: Readonly<Record<number, number>> = {
  3: 0.375, 4: 0.5, 5: 0.625, 6: 0.75, 7: 0.875, 8: 1.0, 9: 1.128, 10: 1.27, 11: 1.41, 14: 1.693, 18: 2.257,
};

/** CSA G30.18 Table 1: bar size (the number of `20M`) → nominal diameter, mm. */
export const CSA_G30_18_DIAMETERS_MM: Readonly<Record<number, number>> = {
  10: 11.3, 15: 16.0, 20: 19.5, 25: 25.2, 30: 29.9, 35: 35.7, 45: 43.7, 55: 56.4,
};

/** EN 10080 Table 6: preferred nominal diameters of ribbed bars, mm. */
export const EN_10080_PREFERRED_MM: readonly number[] = [6, 8, 10, 12, 14, 16, 20, 25, 28, 32, 40, 50];

/** Smallest and largest metric nominal diameter accepted after `Ø`, mm (EN 10080 covers 4–50 mm). */
export const METRIC_DIAMETER_RANGE_MM: readonly [number, number] = [4, 50];

const MM_PER_INCH = 25.4;
/** Nine significant figures, as the project file stores lengths (no binary noise). */
const tidy = (x: number): number => Number(x.toPrecision(9));

export type BarSystem = 'astm' | 'csa' | 'metric';

export interface BarDesignation {
  /** Nominal diameter, mm. */
  readonly diameter: number;
  /** Number of bars written in front of the size (`3 #8` → 3), when one was. */
  readonly count?: number;
  /** The designation as Hingeline writes it: `#8`, `20M`, `Ø20`. */
  readonly text: string;
  readonly system: BarSystem;
}

export type ParsedBarDesignation =
  | ({ readonly ok: true } & BarDesignation)
  | { readonly ok: false; readonly message: string };

const ASTM_SIZES = Object.keys(ASTM_A615_DIAMETERS_IN).map(Number);
const CSA_SIZES = Object.keys(CSA_G30_18_DIAMETERS_MM).map(Number);

/** Nominal diameter of ASTM bar `#size`, mm, or null when A615 has no such size. */
export function astmBarDiameter(size: number): number | null {
  const inches = ASTM_A615_DIAMETERS_IN[size];
  return inches === undefined ? null : tidy(inches * MM_PER_INCH);
}

/** Nominal diameter of CSA bar `<size>M`, mm, or null when G30.18 has no such size. */
export function csaBarDiameter(size: number): number | null {
  return CSA_G30_18_DIAMETERS_MM[size] ?? null;
}

const sizeList = (sizes: readonly number[], format: (n: number) => string) => sizes.map(format).join(', ');

// A count, then an optional separator (spaces, `-`, `×`, `x`), then the size; before a size
// written with digits only (`20M`) the separator is required, so that `20M` is not 2 × `0M`.
const COUNT = String.raw`(?:(\d+)\s*(?:[-×x*]\s*)?)?`;
const COUNT_SEPARATED = String.raw`(?:(\d+)(?:\s*[-×x*]\s*|\s+))?`;
const ASTM = new RegExp(String.raw`^${COUNT}(?:#|[Nn][Oo]\.?\s*)\s*(\d+)$`);
const CSA = new RegExp(String.raw`^${COUNT_SEPARATED}(\d+)\s?M$`);
const METRIC = new RegExp(String.raw`^${COUNT}(?:[Øø⌀φΦ]|[THY](?=\s*\d))\s*(\d+(?:[.,]\d+)?)$`);

/**
 * Reads a bar designation (optionally with a count in front). Returns null when the text is not
 * written as a designation at all (a plain number such as `25` or `25 mm` is a diameter for the
 * ordinary number field), and `{ ok: false }` with a sentence naming the sizes that exist when it
 * is a designation of a size the standard does not have.
 */
export function parseBarDesignation(input: string): ParsedBarDesignation | null {
  const text = input.trim().replace(/\s+/g, ' ');
  let match = ASTM.exec(text);
  if (match) {
    const size = Number(match[2]);
    const diameter = astmBarDiameter(size);
    if (diameter === null) return { ok: false, message: `#${size} is not an ASTM A615 bar size; the sizes are ${sizeList(ASTM_SIZES, (n) => `#${n}`)}` };
    return withCount({ diameter, text: `#${size}`, system: 'astm' }, match[1]);
  }
  match = CSA.exec(text);
  if (match) {
    const size = Number(match[2]);
    const diameter = csaBarDiameter(size);
    if (diameter === null) return { ok: false, message: `${size}M is not a CSA G30.18 bar size; the sizes are ${sizeList(CSA_SIZES, (n) => `${n}M`)}` };
    return withCount({ diameter, text: `${size}M`, system: 'csa' }, match[1]);
  }
  match = METRIC.exec(text);
  if (match) {
    const diameter = Number(match[2]!.replace(',', '.'));
    const [low, high] = METRIC_DIAMETER_RANGE_MM;
    const step = diameter <= 10 ? 0.5 : 1;
    if (!(diameter >= low && diameter <= high) || Math.abs(diameter / step - Math.round(diameter / step)) > 1e-9) {
      return { ok: false, message: `Ø${match[2]} is not a nominal bar diameter: EN 10080 gives ${low}–${high} mm, in half millimetres up to 10 mm and whole millimetres above` };
    }
    return withCount({ diameter, text: `Ø${formatMetric(diameter)}`, system: 'metric' }, match[1]);
  }
  return null;
}

function withCount(designation: BarDesignation, countText: string | undefined): ParsedBarDesignation {
  if (countText === undefined) return { ok: true, ...designation };
  const count = Number(countText);
  if (!Number.isInteger(count) || count < 1) return { ok: false, message: `the number of bars in front of ${designation.text} must be a whole number of at least 1` };
  return { ok: true, ...designation, count };
}

const formatMetric = (mm: number) => (Number.isInteger(mm) ? String(mm) : mm.toFixed(1));

const same = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));

/**
 * The designation of a nominal diameter (mm) as an engineer of `system` writes it, or null when
 * the diameter is none of the tabulated sizes. US projects: ASTM bar numbers, then CSA sizes, then
 * metric diameters; SI projects:
 * `Ø` for a metric diameter (whole millimetres, or half millimetres up to 10 mm), then CSA sizes,
 * then ASTM numbers (existing imperial bars in an SI project). 16 mm reads `Ø16` (CSA 15M has the
 * same nominal diameter).
 */
export function barDesignation(diameter: number | undefined, system: 'SI' | 'US' | 'si' | 'us'): string | null {
  if (diameter === undefined || !Number.isFinite(diameter) || diameter <= 0) return null;
  const astm = ASTM_SIZES.find((n) => same(astmBarDiameter(n)!, diameter));
  const csa = CSA_SIZES.find((n) => same(CSA_G30_18_DIAMETERS_MM[n]!, diameter));
  const [low, high] = METRIC_DIAMETER_RANGE_MM;
  const step = diameter <= 10 ? 0.5 : 1;
  const metric = diameter >= low && diameter <= high && same(Math.round(diameter / step) * step, diameter);
  if (system === 'US' || system === 'us') {
    if (astm !== undefined) return `#${astm}`;
    if (csa !== undefined) return `${csa}M`;
    return metric ? `Ø${formatMetric(Math.round(diameter / step) * step)}` : null;
  }
  if (metric) return `Ø${formatMetric(Math.round(diameter / step) * step)}`;
  if (csa !== undefined) return `${csa}M`;
  if (astm !== undefined) return `#${astm}`;
  return null;
}
