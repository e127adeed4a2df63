/**
 * The text of a numeric tick of the app's charts: six significant figures at most (an axis end
 * such as 24.000000000000004 reads 24), thousands grouped as chart.js does, very large and very
 * small values in exponent form.
 */
/** One formatter for every tick (building one per call, as `toLocaleString(…, options)` does, was the largest cost of a redraw). */
const TICK_FORMAT = new Intl.NumberFormat('en-US', { maximumFractionDigits: 6 });

/**
 * Tick texts already formatted, by value. chart.js formats every tick of every axis at each pass
 * of its layout (several per redraw), and the formatting was about a sixth of a redraw of the
 * moment–curvature chart; the values repeat from one redraw to the next (round numbers).
 */
const tickTexts = new Map<number, string>();
const TICK_TEXTS_KEPT = 2000;

/** A tick value: six significant figures at most, thousands grouped as chart.js does. */
export function tickText(value: number): string {
  const known = tickTexts.get(value);
  if (known !== undefined) return known;
  const rounded = Number(value.toPrecision(6));
  const text = Math.abs(rounded) >= 1e5 || (rounded !== 0 && Math.abs(rounded) < 1e-4) ? rounded.toExponential(2) : TICK_FORMAT.format(rounded);
  if (tickTexts.size >= TICK_TEXTS_KEPT) tickTexts.clear();
  tickTexts.set(value, text);
  return text;
}
