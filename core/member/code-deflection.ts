/**
 * Code methods for immediate and long-term deflection, each one published formula per function.
 * Units: mm, mm⁴, N·mm, MPa.
 */

/**
 * Effective moment of inertia, ACI 318-19 Eq. (24.2.3.5a) (Bischoff's form):
 *   Ie = Icr / (1 − ((2/3)·Mcr/Ma)²·(1 − Icr/Ig))   for Ma > (2/3)·Mcr, otherwise Ig.
 * @param ma   service moment Ma, N·mm (magnitude)
 * @param mcr  cracking moment fr·Ig/yt, N·mm (ACI 318-19 Eq. 24.2.3.5b)
 */
export function aciEffectiveInertia(ma: number, mcr: number, ig: number, icr: number): number {
  if (!(ma > (2 / 3) * mcr)) return ig;
  const ie = icr / (1 - ((2 / 3) * mcr / ma) ** 2 * (1 - icr / ig));
  return Math.min(ie, ig);
}

/**
 * Branson's effective moment of inertia (ACI 318-14 Eq. 24.2.3.5a and earlier editions):
 *   Ie = (Mcr/Ma)³·Ig + (1 − (Mcr/Ma)³)·Icr ≤ Ig.
 * Kept for comparison with legacy calculations.
 */
export function bransonEffectiveInertia(ma: number, mcr: number, ig: number, icr: number): number {
  if (!(ma > mcr)) return ig;
  const r = (mcr / ma) ** 3;
  return Math.min(r * ig + (1 - r) * icr, ig);
}

/**
 * Time-dependent factor ξ for sustained loads, ACI 318-19 Table 24.2.4.1.3:
 * 3 months 1.0, 6 months 1.2, 12 months 1.4, 5 years or more 2.0; linear between the tabulated
 * durations (the commentary's curve, Fig. R24.2.4.1, is smooth — linear interpolation is our choice).
 */
export function aciTimeFactor(months: number): number {
  const table: [number, number][] = [
    [0, 0],
    [3, 1.0],
    [6, 1.2],
    [12, 1.4],
    [60, 2.0],
  ];
  if (months >= 60) return 2.0;
  for (let i = 1; i < table.length; i++) {
    const [m1, x1] = table[i]!;
    const [m0, x0] = table[i - 1]!;
    if (months <= m1) return x0 + ((x1 - x0) * (months - m0)) / (m1 - m0);
  }
  return 2.0;
}

/** Long-term multiplier λΔ = ξ/(1 + 50ρ′), ACI 318-19 Eq. (24.2.4.1.1). */
export function aciLongTermMultiplier(xi: number, compressionRatio: number): number {
  return xi / (1 + 50 * compressionRatio);
}

/**
 * Distribution coefficient ζ = 1 − β·(σsr/σs)² ≈ 1 − β·(Mcr/M)², EN 1992-1-1 Eq. (7.19); ζ = 0
 * for an uncracked section (M ≤ Mcr). β = 1.0 for a single short-term load, 0.5 for sustained or
 * repeated loading.
 */
export function enDistributionCoefficient(moment: number, crackingMoment: number, beta: number): number {
  if (!(moment > crackingMoment) || !(crackingMoment >= 0)) return 0;
  return 1 - beta * (crackingMoment / moment) ** 2;
}

/** Effective modulus for creep Ec,eff = Ecm/(1 + φ(∞, t0)), EN 1992-1-1 Eq. (7.20). */
export function enEffectiveModulus(ecm: number, creepCoefficient: number): number {
  return ecm / (1 + creepCoefficient);
}

/**
 * Shrinkage curvature 1/rcs = εcs·αe·S/I, EN 1992-1-1 Eq. (7.21), 1/mm.
 * @param firstMoment S, first moment of area of the reinforcement about the section's centroid, mm³
 * @param inertia I of the (uncracked or cracked) section, mm⁴
 */
export function enShrinkageCurvature(shrinkageStrain: number, modularRatio: number, firstMoment: number, inertia: number): number {
  return (shrinkageStrain * modularRatio * firstMoment) / inertia;
}

/** Allowed deflection ratio ℓ/ratio of each limit case. */
export function limitRatio(limitCase: string, custom?: number): number {
  switch (limitCase) {
    case 'aci-roof-immediate': return 180; // ACI 318-19 Table 24.2.2
    case 'aci-floor-immediate': return 360; // ACI 318-19 Table 24.2.2
    case 'aci-sensitive-after-attachment': return 480; // ACI 318-19 Table 24.2.2
    case 'aci-insensitive-after-attachment': return 240; // ACI 318-19 Table 24.2.2
    case 'en-appearance': return 250; // EN 1992-1-1 7.4.1(4)
    case 'en-after-construction': return 500; // EN 1992-1-1 7.4.1(5)
    default: return custom ?? 250;
  }
}
