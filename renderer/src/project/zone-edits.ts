/**
 * Edits of a list of zones and of a list of deflection limits shared by the beam editor and the
 * continuous beam's span editor (pure: each returns a new list, or the same one when nothing changes).
 * Positions are mm.
 */
import type { DeflectionLimitCase, MemberZone } from '../../../core/member/definition.ts';

/** Zone `index` split in two at its middle (both halves keep its section). */
export function zonesSplit(zones: readonly MemberZone[], index: number): readonly MemberZone[] {
  const zone = zones[index];
  if (!zone) return zones;
  const middle = Number(((zone.from + zone.to) / 2).toPrecision(9));
  const next = [...zones];
  next.splice(index, 1, { ...zone, to: middle }, { ...zone, from: middle });
  return next;
}

/** Zone `index` removed, its neighbour (the one before, else the one after) taking its length; a single zone stays. */
export function zonesRemoved(zones: readonly MemberZone[], index: number): readonly MemberZone[] {
  if (zones.length <= 1 || !zones[index]) return zones;
  const next = [...zones];
  const [removed] = next.splice(index, 1);
  if (index > 0) next[index - 1] = { ...next[index - 1]!, to: removed!.to };
  else next[0] = { ...next[0]!, from: removed!.from };
  return next;
}

/** The limit cases with `limit` turned on or off (no repeats). */
export function limitsToggled(current: readonly DeflectionLimitCase[], limit: DeflectionLimitCase, on: boolean): DeflectionLimitCase[] {
  return on ? [...current, limit].filter((c, i, all) => all.indexOf(c) === i) : current.filter((c) => c !== limit);
}
