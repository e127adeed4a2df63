/**
 * Structural sharing for the project document: an edit returns a new root in which only the
 * objects and arrays on the edited path are copied; everything else is the same object as before.
 * That keeps undo snapshots cheap (a 500-member project shares all untouched members) and lets the
 * analysis scheduler find changed members by identity (`===`) instead of by deep comparison.
 */

export type PathKey = string | number;

function copyOf(container: unknown): Record<PathKey, unknown> | unknown[] {
  if (Array.isArray(container)) return [...container];
  if (typeof container === 'object' && container !== null) return { ...(container as Record<string, unknown>) };
  throw new TypeError('cannot descend into a value that is not an object or an array');
}

/** The value at `path` under `root` (undefined when any step is missing). */
export function getIn(root: unknown, path: readonly PathKey[]): unknown {
  let node: unknown = root;
  for (const key of path) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<PathKey, unknown>)[key];
  }
  return node;
}

/**
 * A copy of `root` with `value` at `path`. Setting `undefined` on an object key removes the key
 * (optional fields stay absent in the saved file). Missing containers on the way are created.
 * Returns `root` itself when nothing changes.
 */
export function setIn<T>(root: T, path: readonly PathKey[], value: unknown): T {
  if (path.length === 0) return value as T;
  const [head, ...rest] = path as [PathKey, ...PathKey[]];
  const container = (root ?? (typeof head === 'number' ? [] : {})) as Record<PathKey, unknown>;
  const current = container[head];
  const next = rest.length === 0 ? value : setIn(current ?? (typeof rest[0] === 'number' ? [] : {}), rest, value);
  if (next === undefined && rest.length === 0 && !Array.isArray(container)) {
    if (!(head in container)) return root;
    const copy = copyOf(container) as Record<PathKey, unknown>;
    delete copy[head];
    return copy as T;
  }
  if (next === current && head in container) return root;
  const copy = copyOf(container) as Record<PathKey, unknown>;
  copy[head] = next;
  return copy as T;
}

/** A copy of `root` with the value at `path` replaced by `update(old)`. */
export function updateIn<T, V>(root: T, path: readonly PathKey[], update: (old: V) => V): T {
  return setIn(root, path, update(getIn(root, path) as V));
}

/** A copy of `list` with the item at `index` removed. */
export function without<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index);
}

/** A copy of `list` with `item` inserted at `index` (clamped to the list). */
export function inserted<T>(list: readonly T[], index: number, item: T): T[] {
  const at = Math.max(0, Math.min(list.length, index));
  return [...list.slice(0, at), item, ...list.slice(at)];
}
