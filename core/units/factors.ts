/**
 * Exact conversion factors between US customary and SI units, in internal units (N, mm, MPa, kg/m³).
 * Every factor is a definition (exact by international agreement), or built from exact definitions
 * by arithmetic only, so no rounded constant enters a conversion.
 *
 * @see NIST Special Publication 811 (2008), Appendix B.8 and B.9 (factors for units listed
 *      alphabetically and by kind of quantity); the inch and the pound are exact by the
 *      international yard and pound agreement of 1959.
 */

/** 1 in = 25.4 mm exactly. @see NIST SP 811 Appendix B.8 (inch → meter 2.54 E−02, exact). */
export const MILLIMETRES_PER_INCH = 25.4;

/** 1 ft = 12 in = 304.8 mm exactly. @see NIST SP 811 Appendix B.8 (foot → meter 3.048 E−01, exact). */
export const MILLIMETRES_PER_FOOT = 304.8;

/** 1 lb (avoirdupois pound, mass) = 0.453 592 37 kg exactly. @see NIST SP 811 Appendix B.8. */
export const KILOGRAMS_PER_POUND = 0.45359237;

/** Standard acceleration of gravity gn = 9.806 65 m/s² exactly. @see NIST SP 811 Appendix B.8 footnote (gn). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² = 4.448 221 615 260 5 N exactly.
 * @see NIST SP 811 Appendix B.8 (pound-force → newton 4.448 222 E+00).
 */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;

/** 1 kip = 1000 lbf, in N. */
export const NEWTONS_PER_KIP = 1000 * NEWTONS_PER_POUND_FORCE;

/** 1 psi = 1 lbf/in², in MPa (N/mm²): 0.006 894 757… @see NIST SP 811 Appendix B.8 (psi → pascal 6.894 757 E+03). */
export const MEGAPASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / (MILLIMETRES_PER_INCH * MILLIMETRES_PER_INCH);

/** 1 ksi = 1000 psi, in MPa: 6.894 757… @see NIST SP 811 Appendix B.8 (kip/in² → pascal 6.894 757 E+06). */
export const MEGAPASCALS_PER_KSI = 1000 * MEGAPASCALS_PER_PSI;

/** 1 lb/ft³ in kg/m³: 16.018 46… @see NIST SP 811 Appendix B.8 (pound per cubic foot → kg/m³ 1.601 846 E+01). */
export const KILOGRAMS_PER_CUBIC_METRE_PER_PCF = KILOGRAMS_PER_POUND / (MILLIMETRES_PER_FOOT / 1000) ** 3;
