/**
 * The comparison table of an existing beam: one column per variant (the design beam for
 * reference, the beam as found or as designed, each strengthening scheme) and one row per result
 * an engineer weighs — status, strength utilisation, design resistance of the critical section,
 * peak load, the worst service deflection against its limit, μΔ, θp of the critical hinge, shear
 * (factored, and at the flexural mechanism) — then the strengthening method's code checks
 * (core/assessment/strengthening-checks.ts), each pass or fail. The app's comparison tab and the
 * report print the same rows. Everything is read from RetrofitResult; nothing is recomputed.
 *
 * Units: values internal (N, N·mm, mm, rad, MPa) → text in the display units of `unitsInput`.
 */
import { criticalHinge } from '../assessment/compact.ts';
import type { MemberStatus, RetrofitResult, StrengtheningCheck, VariantResult } from '../assessment/results.ts';
import type { BendingDirection } from '../section/model.ts';
import { formatNumber, formatQuantity, NOT_A_VALUE } from '../units/format.ts';
import type { Quantity } from '../units/quantities.ts';
import type { UnitId } from '../units/units.ts';
import { say } from '../units/phrase.ts';
import { shownVariants, type ShownVariant } from './retrofit.ts';
import type { UnitsInput } from './types.ts';
import { resolveUnits, unitFor } from './units.ts';

export interface ComparisonCell {
  /** The value as printed (`0.82`, `199.8 kip·ft`, `passes`); an em dash when the variant has none. */
  readonly text: string;
  /** A second line: the gain, the utilisation, the numbers of a check. */
  readonly detail?: string;
  /** Pass or fail, where the row is a check. */
  readonly verdict?: 'pass' | 'fail';
  /** The variant's status (status row only). */
  readonly status?: MemberStatus;
  /** Longer words behind the value (a tooltip in the app). */
  readonly note?: string;
}

export interface ComparisonRow {
  readonly id: string;
  readonly label: string;
  /** What the row compares, in a few more words, or the clause of a check. */
  readonly hint: string;
  /** `results` of each variant, or the strengthening method's code `checks` (schemes only). */
  readonly group: 'results' | 'checks';
  readonly cells: readonly ComparisonCell[];
}

export interface ComparisonTable {
  readonly variants: readonly ShownVariant[];
  /** The section (library id) and direction of the resistance row: the critical one unless chosen. */
  readonly baseSectionId: string;
  readonly direction: BendingDirection;
  readonly rows: readonly ComparisonRow[];
}

export const STATUS_TEXT: Readonly<Record<MemberStatus, string>> = {
  ok: 'OK',
  'check-fails': 'check fails',
  brittle: 'brittle',
  'not-converged': 'not converged',
  'input-error': 'input error',
};

/**
 * The section and direction that govern the compared beam's strength check (where the schemes are
 * compared), or the first section in sagging when there is no such check.
 */
export function criticalOf(retrofit: RetrofitResult): { baseSectionId: string; direction: BendingDirection } {
  const fromScheme = retrofit.schemes.find((s) => s.comparison)?.comparison?.critical;
  if (fromScheme) return fromScheme;
  const reference = shownVariants(retrofit).find((v) => v.role === 'reference')?.variant;
  const strength = reference?.strength;
  const base = reference?.sections.find((s) => s.sectionId === strength?.sectionId)?.baseSectionId ?? reference?.sections[0]?.baseSectionId ?? '';
  return { baseSectionId: base, direction: strength?.direction ?? 'sagging' };
}

/**
 * Builds the table. `choice` picks the section and direction of the resistance row (default: the
 * critical ones). `codeBasis` names the resistance (φMn / M_Rd) and shear strengths.
 * Degenerate cases: a value a variant lacks prints `—`; a check a scheme does not have prints `—`.
 */
export function variantComparisonTable(
  retrofit: RetrofitResult,
  unitsInput: UnitsInput,
  codeBasis: 'ACI 318-19' | 'EN 1992-1-1',
  choice: { baseSectionId?: string; direction?: BendingDirection } = {},
): ComparisonTable {
  const units = resolveUnits(unitsInput);
  const q = (quantity: Quantity, value: number | null | undefined, options: { unit?: UnitId; withUnit?: boolean } = {}) =>
    (value === null || value === undefined || !Number.isFinite(value) ? NOT_A_VALUE : formatQuantity(quantity, value, units.system, { unit: unitFor(quantity, units), ...options }));
  const ratio = (value: number | null | undefined) => (value === null || value === undefined || !Number.isFinite(value) ? NOT_A_VALUE : value.toFixed(2));
  const aci = codeBasis === 'ACI 318-19';
  const variants = shownVariants(retrofit);
  const critical = criticalOf(retrofit);
  const baseSectionId = choice.baseSectionId ?? critical.baseSectionId;
  const direction = choice.direction ?? critical.direction;
  const reference = variants.find((v) => v.role === 'reference')?.variant ?? null;
  const schemeOf = (v: ShownVariant) => retrofit.schemes.find((s) => s.schemeId === v.key) ?? null;
  const curveOf = (v: VariantResult) => v.sections.find((s) => s.baseSectionId === baseSectionId)?.curves.find((c) => c.direction === direction) ?? null;
  const worstDeflection = (v: VariantResult) => v.deflectionChecks.reduce<VariantResult['deflectionChecks'][number] | null>((w, c) => (!w || c.utilisation > w.utilisation ? c : w), null);
  const signed = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(0)} %`;
  // The critical hinge: nearest the point where the compared beam's strength check governs, in its direction.
  const hingeDirection = reference?.strength?.direction ?? 'sagging';
  const hingePosition = reference?.strength?.position ?? 0;
  const resistance = aci ? 'φMn' : 'M_Rd';
  const sectionName = variants.flatMap((v) => v.variant.sections).find((s) => s.baseSectionId === baseSectionId)?.sectionName ?? baseSectionId;
  const cells = (cell: (v: ShownVariant) => ComparisonCell) => variants.map(cell);

  const rows: ComparisonRow[] = [
    { id: 'status', label: 'Status', hint: 'every check of the variant', group: 'results', cells: cells((v) => ({ text: STATUS_TEXT[v.variant.status], status: v.variant.status, verdict: v.variant.status === 'ok' ? 'pass' : 'fail' })) },
    {
      id: 'strength', label: `Strength: factored M / ${resistance}`, hint: 'largest along the span', group: 'results',
      cells: cells((v) => (v.variant.strength ? { text: ratio(v.variant.strength.utilisation), verdict: v.variant.strength.pass ? 'pass' : 'fail' } : { text: NOT_A_VALUE })),
    },
    {
      id: 'resistance', label: `${resistance} of the section`, hint: `${sectionName}, ${direction}`, group: 'results',
      cells: cells((v) => ({ text: q('moment', curveOf(v.variant)?.designResistance) })),
    },
    {
      id: 'capacity', label: 'Peak load of the load–deflection curve', hint: 'all loads of the pattern together', group: 'results',
      cells: cells((v) => {
        const gain = v.role === 'scheme' ? schemeOf(v)?.comparison?.memberCapacity.gainPercent ?? null : null;
        return { text: q('force', v.variant.capacity.peakTotalLoad), ...(gain !== null && Number.isFinite(gain) ? { detail: signed(gain) } : {}) };
      }),
    },
    {
      id: 'deflection', label: 'Service deflection / limit', hint: 'the check most used', group: 'results',
      cells: cells((v) => {
        const c = worstDeflection(v.variant);
        // beyond span/50 no deflection is a result (core/member/small-deflection.ts): words, and the check fails
        if (c && v.variant.serviceOutsideRange) return { text: 'outside the method\'s range', verdict: 'fail', note: say(v.variant.serviceOutsideRange, units.system) };
        return c
          ? { text: `${q('deflection', c.governing, { withUnit: false })} / ${q('deflection', c.limit)}`, detail: `${ratio(c.utilisation)} (ℓ/${c.ratio})`, verdict: c.pass ? 'pass' : 'fail' }
          : { text: NOT_A_VALUE };
      }),
    },
    {
      id: 'ductility', label: 'Displacement ductility μΔ', hint: 'Δu / Δy', group: 'results',
      cells: cells((v) => (v.variant.ductility.available
        ? (v.variant.ductility.displacementDuctility === null ? { text: NOT_A_VALUE, note: say(v.variant.ductility.note, units.system) } : { text: formatNumber(v.variant.ductility.displacementDuctility) })
        : { text: 'not available', note: say(v.variant.ductility.note, units.system) })),
    },
    {
      id: 'rotation', label: 'Rotation capacity θp', hint: 'of the critical hinge', group: 'results',
      cells: cells((v) => ({ text: q('rotation', criticalHinge(v.variant.ductility.hinges, hingeDirection, hingePosition)?.rotationCapacity, { unit: 'mrad' }) })),
    },
    {
      id: 'shear', label: aci ? 'Shear: V / φVn; V / Vn' : 'Shear: V / VRd; V / VRk', hint: 'factored; at the flexural mechanism', group: 'results',
      cells: cells((v) => {
        const s = v.variant.shear;
        if (!s) return { text: NOT_A_VALUE };
        return {
          text: `${ratio(s.factored?.utilisation)}; ${ratio(s.mechanism?.nominalRatio)}`,
          ...(s.governs === 'shear' ? { detail: 'shear governs' } : {}),
          ...(s.factored ? { verdict: s.factored.pass && s.governs !== 'shear' ? 'pass' : 'fail' } : {}),
        };
      }),
    },
  ];

  // The strengthening method's code checks: one row per check any scheme has, in the order met.
  const checks: { id: StrengtheningCheck['id']; name: string; clause: string }[] = [];
  for (const s of retrofit.schemes) for (const c of s.checks) if (!checks.some((r) => r.id === c.id)) checks.push({ id: c.id, name: c.name, clause: c.clause });
  const checkValue = (c: StrengtheningCheck) => (c.quantity === 'stress'
    ? `${q('stress', c.value)} / ${q('stress', c.limit)}`
    : c.quantity === 'strain' ? `${q('strain', c.value, { withUnit: false })} / ${q('strain', c.limit)}` : ratio(c.value));
  for (const row of checks) {
    rows.push({
      id: `check-${row.id}`, label: row.name, hint: row.clause, group: 'checks',
      cells: cells((v) => {
        const c = schemeOf(v)?.checks.find((x) => x.id === row.id);
        return c ? { text: c.pass ? 'passes' : 'fails', detail: checkValue(c), verdict: c.pass ? 'pass' : 'fail', note: say(c.note, units.system) } : { text: NOT_A_VALUE };
      }),
    });
  }
  return { variants, baseSectionId, direction, rows };
}
