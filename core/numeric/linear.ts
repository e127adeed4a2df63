/**
 * Solves the small dense system A·x = b by Gaussian elimination with partial pivoting.
 * A is row-major n×n and is overwritten; returns undefined when A is singular.
 */
export function solveLinear(a: number[][], b: number[]): number[] | undefined {
  const n = b.length;
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let row = col + 1; row < n; row++) if (Math.abs(a[row]![col]!) > Math.abs(a[pivot]![col]!)) pivot = row;
    const scale = Math.max(...a.map((r) => Math.abs(r[col]!)), 1e-300);
    if (Math.abs(a[pivot]![col]!) <= 1e-14 * scale) return undefined;
    [a[col], a[pivot]] = [a[pivot]!, a[col]!];
    [b[col], b[pivot]] = [b[pivot]!, b[col]!];
    for (let row = col + 1; row < n; row++) {
      const f = a[row]![col]! / a[col]![col]!;
      if (f === 0) continue;
      for (let k = col; k < n; k++) a[row]![k]! -= f * a[col]![k]!;
      b[row]! -= f * b[col]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let row = n - 1; row >= 0; row--) {
    let s = b[row]!;
    for (let k = row + 1; k < n; k++) s -= a[row]![k]! * x[k]!;
    x[row] = s / a[row]![row]!;
  }
  return x.every(Number.isFinite) ? x : undefined;
}
