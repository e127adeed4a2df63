/**
 * Which zone of a member holds a position: a binary search over the zones sorted by their start,
 * O(log n) per station instead of a scan of every zone (10,000 zones made building the stations
 * quadratic, issue 17 "large inputs"). Units: mm.
 */

/**
 * A function giving the index (in the given order) of the first zone with from ≤ x ≤ to, or −1.
 * Zones that tile the span (validated) hold each inner point once; where zones overlap, the scan
 * in the given order decides, so the answer is always that of `findIndex`.
 */
export function zoneLookup(zones: readonly { readonly from: number; readonly to: number }[]): (x: number) => number {
  const order = zones.map((_, i) => i).sort((a, b) => zones[a]!.from - zones[b]!.from || a - b);
  const starts = Float64Array.from(order, (i) => zones[i]!.from);
  // Furthest end among the zones up to each one in start order: tells whether an earlier zone also holds x.
  const reach = new Float64Array(order.length);
  order.forEach((i, k) => (reach[k] = Math.max(k > 0 ? reach[k - 1]! : -Infinity, zones[i]!.to)));
  return (x) => {
    // Last zone in start order with from ≤ x.
    let lo = 0;
    let hi = starts.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (starts[mid]! <= x) lo = mid + 1;
      else hi = mid;
    }
    const candidate = lo > 0 ? order[lo - 1]! : -1;
    const zone = candidate >= 0 ? zones[candidate]! : undefined;
    const unique = zone !== undefined && x <= zone.to && (lo < 2 || reach[lo - 2]! < x);
    return unique ? candidate : zones.findIndex((z) => x >= z.from && x <= z.to);
  };
}
