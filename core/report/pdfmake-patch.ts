/**
 * Replacing one method of a pdfmake class, once, keeping pdfmake's own: the inline measuring
 * (pdfmake-measure.ts) and the line merging (pdfmake-lines.ts) change a method of a class that both
 * hosts find in their own pdfmake (pdfmake-classes.ts). pdfmake's method stays on the prototype under
 * a symbol, for the replacement to call and for the tests that pin it by digest.
 */

/** pdfmake's own method `name` of `cls`, stored under `key` when replaced (else the current one). */
export function originalMethod<F>(cls: { readonly prototype: object }, name: string, key: symbol): F {
  const prototype = cls.prototype as Record<string | symbol, unknown>;
  return (prototype[key] ?? prototype[name]) as F;
}

/**
 * Replaces method `name` of `cls` by `replacement(original)`, keeping the original under `key`; a
 * second call changes nothing. Throws `unsupported` when the class has no such method.
 */
export function replaceMethodOnce<F>(cls: { readonly prototype: object }, name: string, key: symbol, replacement: (original: F) => F, unsupported: string): void {
  const prototype = cls.prototype as Record<string | symbol, unknown>;
  if (prototype[key]) return;
  const original = prototype[name];
  if (typeof original !== 'function') throw new Error(unsupported);
  Object.defineProperty(prototype, key, { value: original });
  prototype[name] = replacement(original as F);
}
