/**
 * Sorting and filtering of the project overview (pure, so it can be tested on its own).
 * Values compared are the internal ones of the key results (never formatted text).
 */
import type { MemberKeyResults } from '../../../core/project/key-results.ts';
import type { OverviewColumn, StatusFilter } from '../stores/workspace.ts';
import type { MemberDefinition, UnitSystem } from '../../../core/project/types.ts';
import { say } from '../../../core/units/phrase.ts';
import type { ContinuousRowData } from './continuous-rows.ts';

export type RowStatus = MemberKeyResults['status'] | 'pending' | 'outdated' | 'review';

/** What a row needs of its member: a single-span member's definition, or a continuous member's name and notes. */
export type OverviewMember = MemberDefinition | Pick<MemberDefinition, 'id' | 'name' | 'notes'>;

export interface OverviewRow {
  readonly member: OverviewMember;
  readonly key: MemberKeyResults | null;
  readonly status: RowStatus;
  /** A continuous member's row (project version 3): its governing span and picked results. */
  readonly continuous?: ContinuousRowData;
}

/** Most severe first when sorting by status ascending. */
export const STATUS_ORDER: Readonly<Record<RowStatus, number>> = { 'input-error': 0, 'not-converged': 1, 'check-fails': 2, brittle: 3, review: 4, outdated: 5, pending: 6, ok: 7 };

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

export function sortValue(row: OverviewRow, column: OverviewColumn, units: UnitSystem = 'si'): number | string | null {
  const k = row.key;
  const c = row.continuous;
  if (c) {
    switch (column) {
      case 'name': return row.member.name;
      case 'supports': return c.supportsText;
      case 'span': return c.governingLength;
      case 'displacementDuctility': return c.displacementDuctility;
      case 'rotation': return c.rotationCapacity;
      case 'deflection': return c.deflection ? Math.abs(c.deflection.deflection) : null; // upward spans by magnitude
      case 'utilisation': return c.deflection?.utilisation ?? null;
      case 'strength': return c.strengthUtilisation;
      case 'governing': return say(c.governingMode, units);
      case 'status': return STATUS_ORDER[row.status];
      default: return null;
    }
  }
  switch (column) {
    case 'name': return row.member.name;
    case 'supports': return 'supports' in row.member ? row.member.supports : null;
    case 'span': return 'span' in row.member ? row.member.span : null;
    case 'yieldMoment': return k?.yieldMoment ?? null;
    case 'ultimateMoment': return k?.ultimateMoment ?? null;
    case 'curvatureDuctility': return k?.curvatureDuctility ?? null;
    case 'displacementDuctility': return k?.displacementDuctility ?? null;
    case 'rotation': return k?.plasticRotationCapacity ?? null;
    case 'deflection': return k?.deflection?.deflection ?? null;
    case 'utilisation': return k?.deflection?.utilisation ?? null;
    case 'strength': return k?.strengthUtilisation ?? null;
    case 'governing': return k ? say(k.governingMode, units) : null;
    case 'status': return STATUS_ORDER[row.status];
  }
}

/**
 * Rows sorted by a column: text in natural order (B-2 before B-10), numbers by value; rows
 * without a value always last, whatever the direction; ties keep the project order.
 */
export function sortRows(list: readonly OverviewRow[], column: OverviewColumn, descending: boolean, units: UnitSystem = 'si'): OverviewRow[] {
  return list
    .map((row, index) => ({ row, index, value: sortValue(row, column, units) }))
    .sort((a, b) => {
      if (a.value === null || b.value === null) return a.value === b.value ? a.index - b.index : a.value === null ? 1 : -1;
      const order = typeof a.value === 'string' ? collator.compare(a.value, String(b.value)) : a.value - (b.value as number);
      return (descending ? -order : order) || a.index - b.index;
    })
    .map((x) => x.row);
}

/** Rows whose status matches and whose mark, governing mode or notes contain the text (any case). */
export function filterRows(list: readonly OverviewRow[], text: string, status: StatusFilter, units: UnitSystem = 'si'): OverviewRow[] {
  const needle = text.trim().toLowerCase();
  return list.filter((row) => {
    if (status !== 'all' && !(status === 'pending' ? row.status === 'pending' || row.status === 'outdated' : row.status === status)) return false;
    if (needle === '') return true;
    return row.member.name.toLowerCase().includes(needle)
      || (row.key ? say(row.key.governingMode, units).toLowerCase().includes(needle) : false)
      || (row.continuous ? say(row.continuous.governingMode, units).toLowerCase().includes(needle) : false)
      || (row.member.notes?.toLowerCase().includes(needle) ?? false);
  });
}
