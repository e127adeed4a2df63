/**
 * Ties between candidates for "the largest" (the governing shear, the first hinge, the worst check).
 *
 * A symmetric beam has twins: two supports, two spans, two hinges whose values agree to the last
 * few bits. Which of them a strict `>` picks then depends on rounding, and rounding differs between
 * JavaScript engines (the app's Chromium and the command line's Node.js print different spans for
 * the same project) and moves with unrelated changes. The rule here: a later candidate replaces the
 * one held only when it is larger beyond rounding, so of twins the first in the order of the scan
 * (left to right along the beam, first combination first) is kept, on every engine.
 */

/** Relative margin within which two values count as equal (far above rounding, far below engineering meaning). */
export const TIE_RELATIVE = 1e-9;

/** True when `candidate` exceeds `held` by more than rounding (relative `TIE_RELATIVE`, absolute floor 1e-300). */
export function exceedsBeyondRounding(candidate: number, held: number, relative = TIE_RELATIVE): boolean {
  return candidate - held > relative * Math.max(Math.abs(candidate), Math.abs(held), 1e-300);
}

/** True when two values differ beyond rounding (either exceeds the other), e.g. to keep twins in the order found. */
export function differBeyondRounding(a: number, b: number, relative = TIE_RELATIVE): boolean {
  return exceedsBeyondRounding(a, b, relative) || exceedsBeyondRounding(b, a, relative);
}
