/**
 * Section results travel once per worker, not once per chunk (parallel.ts). A member's result holds
 * its sections' curves and elastic properties, objects shared by every member that uses the same
 * section; a structured clone keeps that sharing only within one message, so with results posted
 * chunk by chunk every chunk would carry its own copy (measured: 1,000 generated members, peak
 * memory 339 → 480 MB). The worker sends each such object once with a number and afterwards only
 * the number; the parent puts the objects back, shared again as in a serial analysis.
 */
import type { MemberResult } from '../../core/assessment/results.ts';
import type { SectionResult } from '../../core/member/results.ts';

/** The shared parts of a section result. */
const SHARED = ['elastic', 'sagging', 'hogging', 'warnings'] as const;
type SharedKey = (typeof SHARED)[number];

/** A reference to an object sent earlier (or in the same message's `objects`). */
export interface SharedRef {
  readonly $shared: number;
}

/** A chunk's results with the shared section parts replaced by references, and the new objects. */
export interface PackedResults {
  readonly results: readonly MemberResult[];
  readonly objects: ReadonlyArray<readonly [number, unknown]>;
}

/** The worker's side: numbers every shared object the first time it is sent. */
export function resultPacker(): (results: readonly MemberResult[]) => PackedResults {
  const numbers = new Map<object, number>();
  return (results) => {
    const objects: [number, unknown][] = [];
    const refOf = (value: object): SharedRef => {
      let n = numbers.get(value);
      if (n === undefined) {
        n = numbers.size;
        numbers.set(value, n);
        objects.push([n, value]);
      }
      return { $shared: n };
    };
    const packed = results.map((r) => ({
      ...r,
      sections: r.sections.map((s) => {
        const out: Record<string, unknown> = { ...s };
        for (const key of SHARED) if (s[key] !== undefined && s[key] !== null && typeof s[key] === 'object') out[key] = refOf(s[key] as object);
        return out as unknown as SectionResult;
      }),
    }));
    return { results: packed, objects };
  };
}

/** The parent's side, one per worker: restores the shared objects in arrival order. */
export function resultUnpacker(): (packed: PackedResults) => MemberResult[] {
  const known = new Map<number, unknown>();
  return ({ results, objects }) => {
    for (const [n, value] of objects) known.set(n, value);
    const restore = (value: unknown): unknown => {
      const ref = value as Partial<SharedRef> | null;
      if (ref && typeof ref === 'object' && typeof ref.$shared === 'number') {
        if (!known.has(ref.$shared)) throw new Error(`a worker referred to section data it never sent (#${ref.$shared})`);
        return known.get(ref.$shared);
      }
      return value;
    };
    return results.map((r) => ({
      ...r,
      sections: r.sections.map((s) => {
        const out: Record<string, unknown> = { ...s };
        for (const key of SHARED as readonly SharedKey[]) if (key in out) out[key] = restore(out[key]);
        return out as unknown as SectionResult;
      }),
    }));
  };
}
