/** Edits copy only the objects on their path; everything else stays the same object. */
import { describe, expect, it } from 'vitest';
import { getIn, inserted, setIn, without } from '../../../renderer/src/project/immutable.ts';

const root = { a: { b: [{ c: 1 }, { c: 2 }] }, d: { e: 3 } };

describe('setIn', () => {
  it('copies the path to the change and shares the rest', () => {
    const next = setIn(root, ['a', 'b', 1, 'c'], 5);
    expect(next).not.toBe(root);
    expect(next.a.b[1]).toEqual({ c: 5 });
    expect(next.a.b[0]).toBe(root.a.b[0]);
    expect(next.d).toBe(root.d);
    expect(root.a.b[1]!.c).toBe(2);
  });

  it('returns the same root when the value is already there', () => {
    expect(setIn(root, ['d', 'e'], 3)).toBe(root);
  });

  it('removes an optional key when given undefined, and keeps arrays as arrays', () => {
    const next = setIn(root, ['d', 'e'], undefined);
    expect('e' in next.d).toBe(false);
    expect(Array.isArray(setIn(root, ['a', 'b', 0, 'c'], 9).a.b)).toBe(true);
    expect(setIn(root, ['d', 'missing'], undefined)).toBe(root);
  });

  it('creates missing containers on the way', () => {
    const next = setIn<Record<string, unknown>>({}, ['x', 'y'], 1);
    expect(next).toEqual({ x: { y: 1 } });
  });

  it('reads back with getIn, and undefined for a path that does not exist', () => {
    expect(getIn(root, ['a', 'b', 1, 'c'])).toBe(2);
    expect(getIn(root, ['a', 'z', 'q'])).toBeUndefined();
  });
});

describe('list helpers', () => {
  it('without and inserted leave the original list alone', () => {
    const list = [1, 2, 3];
    expect(without(list, 1)).toEqual([1, 3]);
    expect(inserted(list, 1, 9)).toEqual([1, 9, 2, 3]);
    expect(inserted(list, 99, 9)).toEqual([1, 2, 3, 9]);
    expect(list).toEqual([1, 2, 3]);
  });
});
