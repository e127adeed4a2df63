import type { Diagnostic } from '../../diagnostics.ts';
import type { ConfinementInput } from '../specs.ts';
import { checkField, fieldPath, reportInconsistent, show } from '../checks.ts';

/**
 * Ultimate strain of unconfined concrete, 0.004: the first term of the hoop-fracture expressions of
 * Scott, Park & Priestley (1982) and Priestley, Seible & Calvi (1996), i.e. their value without hoops.
 */
export const UNCONFINED_ULTIMATE_STRAIN = 0.004;

/** Default rupture strain of hoop steel εsu when the input gives none. // common practice, no source */
export const DEFAULT_HOOP_RUPTURE_STRAIN = 0.1;

/**
 * Confined-to-unconfined strength ratio f′cc/f′co for EQUAL effective lateral pressures f′l:
 *   f′cc/f′co = −1.254 + 2.254 √(1 + 7.94 f′l/f′co) − 2 f′l/f′co.
 * @param lateralPressureRatio f′l/f′co ≥ 0 (dimensionless); 0 gives 1
 * @see Mander, Priestley & Park (1988), Eq. (29) — equation number from memory
 */
export function manderStrengthRatio(lateralPressureRatio: number): number {
  const x = lateralPressureRatio;
  return -1.254 + 2.254 * Math.sqrt(1 + 7.94 * x) - 2 * x;
}

/**
 * Confinement effectiveness coefficient of a rectangular core with rectilinear hoops:
 *   ke = (1 − Σw′i²/(6 bc dc)) (1 − s′/(2 bc)) (1 − s′/(2 dc)) / (1 − ρcc)
 * Lengths in mm; s′ = clear vertical spacing between hoops (s − hoop diameter).
 * @see Mander, Priestley & Park (1988), Eq. (23) — equation number from memory
 */
export function manderEffectivenessRectangular(
  coreWidth: number,
  coreDepth: number,
  clearSpacings: readonly number[],
  clearHoopSpacing: number,
  longitudinalRatio: number,
): number {
  const sumSquares = clearSpacings.reduce((sum, w) => sum + w * w, 0);
  return (
    ((1 - sumSquares / (6 * coreWidth * coreDepth)) *
      (1 - clearHoopSpacing / (2 * coreWidth)) *
      (1 - clearHoopSpacing / (2 * coreDepth))) /
    (1 - longitudinalRatio)
  );
}

/**
 * Ultimate (crushing) strain of the confined core, from an energy balance on hoop fracture:
 *   εcu = 0.004 + 1.4 ρs fyh εsu / f′cc   (MPa; ρs volumetric ratio of confining steel).
 * @see Priestley, Seible & Calvi (1996), Seismic Design and Retrofit of Bridges, Eq. (5.14) — equation number from memory
 */
export function priestleyUltimateStrain(volumetricRatio: number, hoopYieldStress: number, hoopRuptureStrain: number, confinedStrength: number): number {
  return UNCONFINED_ULTIMATE_STRAIN + (1.4 * volumetricRatio * hoopYieldStress * hoopRuptureStrain) / confinedStrength;
}

/** Everything the Mander confined law needs, derived from the hoop layout (MPa, mm, strains dimensionless). */
export interface ManderConfinement {
  /** Area of one hoop leg, mm². */
  readonly hoopArea: number;
  /** ρx = Asx/(s dc): bars running in x (the legs crossing a cut parallel to y, i.e. `legsY`). */
  readonly rhoX: number;
  /** ρy = Asy/(s bc): bars running in y (the legs crossing a cut parallel to x, i.e. `legsX`). */
  readonly rhoY: number;
  /** ρs = ρx + ρy, volumetric ratio used by the ultimate-strain expression. */
  readonly volumetricRatio: number;
  readonly effectiveness: number;
  /** f′lx = ke ρx fyh and f′ly = ke ρy fyh, MPa. */
  readonly lateralPressureX: number;
  readonly lateralPressureY: number;
  /** f′l used in Eq. (29): the smaller of f′lx and f′ly (conservative for unequal pressures). */
  readonly lateralPressure: number;
  readonly confinedStrength: number;
  readonly confinedPeakStrain: number;
  readonly crushingStrain: number;
}

/**
 * Mander, Priestley & Park (1988) confinement of a rectangular core by rectilinear hoops.
 * ke from Eq. (23); ρx = Asx/(s dc), ρy = Asy/(s bc); f′lx = ke ρx fyh, f′ly = ke ρy fyh.
 * For UNEQUAL pressures the paper reads f′cc from a multiaxial failure-surface chart; here f′l is taken
 * as the smaller of f′lx and f′ly in the equal-pressure Eq. (29), which never overestimates f′cc
 * (the chart's f′cc grows with either pressure). εcc = εco [1 + 5 (f′cc/f′co − 1)];
 * εcu from Priestley, Seible & Calvi (1996).
 * @param confinement hoop layout (mm, MPa) from specs.ts; validate with validateConfinementInput first
 * @param unconfinedStrength f′co, MPa
 * @param unconfinedPeakStrain εco (dimensionless), typically 0.002
 */
export function manderConfinement(confinement: ConfinementInput, unconfinedStrength: number, unconfinedPeakStrain: number): ManderConfinement {
  const { hoopDiameter, spacing, coreWidth, coreDepth, hoopYieldStress } = confinement;
  const hoopArea = (Math.PI * hoopDiameter * hoopDiameter) / 4;
  const rhoX = (confinement.legsY * hoopArea) / (spacing * coreDepth);
  const rhoY = (confinement.legsX * hoopArea) / (spacing * coreWidth);
  const effectiveness = manderEffectivenessRectangular(coreWidth, coreDepth, confinement.clearSpacings, spacing - hoopDiameter, confinement.longitudinalRatio);
  const lateralPressureX = effectiveness * rhoX * hoopYieldStress;
  const lateralPressureY = effectiveness * rhoY * hoopYieldStress;
  const lateralPressure = Math.min(lateralPressureX, lateralPressureY);
  const confinedStrength = unconfinedStrength * manderStrengthRatio(lateralPressure / unconfinedStrength);
  const volumetricRatio = rhoX + rhoY;
  return {
    hoopArea,
    rhoX,
    rhoY,
    volumetricRatio,
    effectiveness,
    lateralPressureX,
    lateralPressureY,
    lateralPressure,
    confinedStrength,
    confinedPeakStrain: unconfinedPeakStrain * (1 + 5 * (confinedStrength / unconfinedStrength - 1)),
    crushingStrain: priestleyUltimateStrain(volumetricRatio, hoopYieldStress, confinement.hoopRuptureStrain ?? DEFAULT_HOOP_RUPTURE_STRAIN, confinedStrength),
  };
}

/**
 * Checks a hoop layout: positive dimensions, integer leg counts ≥ 2, clear spacings, ρcc, and a positive
 * effectiveness ke. `requireClearSpacings` (Mander) asks for at least four w′i (one per side).
 */
export function validateConfinementInput(c: ConfinementInput, path = 'confinement', requireClearSpacings = true): Diagnostic[] {
  const out: Diagnostic[] = [];
  let ok = checkField(out, fieldPath(path, 'hoopYieldStress'), 'hoop yield stress fyh', c.hoopYieldStress, { min: 200, max: 1000, quantity: 'stress' });
  ok = checkField(out, fieldPath(path, 'hoopDiameter'), 'hoop bar diameter', c.hoopDiameter, { min: 4, max: 40, quantity: 'sectionLength' }) && ok;
  ok = checkField(out, fieldPath(path, 'spacing'), 'hoop spacing s', c.spacing, { min: 0, exclusiveMin: true, max: 1000, quantity: 'sectionLength' }) && ok;
  ok = checkField(out, fieldPath(path, 'coreWidth'), 'core width bc (to hoop centrelines)', c.coreWidth, { min: 0, exclusiveMin: true, max: 5000, quantity: 'sectionLength' }) && ok;
  ok = checkField(out, fieldPath(path, 'coreDepth'), 'core depth dc (to hoop centrelines)', c.coreDepth, { min: 0, exclusiveMin: true, max: 5000, quantity: 'sectionLength' }) && ok;
  for (const legs of ['legsX', 'legsY'] as const) {
    const value = c[legs];
    if (checkField(out, fieldPath(path, legs), `number of hoop legs ${legs}`, value, { min: 2, max: 20 }) && !Number.isInteger(value)) {
      out.push({ code: 'must-be-integer', path: fieldPath(path, legs), severity: 'error', message: `number of hoop legs ${legs} must be a whole number, got ${value}` });
      ok = false;
    } else if (!Number.isFinite(value) || value < 2 || value > 20) {
      ok = false;
    }
  }
  ok = checkField(out, fieldPath(path, 'longitudinalRatio'), 'longitudinal steel ratio of the core ρcc', c.longitudinalRatio, { min: 0, max: 0.08 }) && ok;
  if (c.hoopRuptureStrain !== undefined) {
    ok = checkField(out, fieldPath(path, 'hoopRuptureStrain'), 'hoop rupture strain εsu', c.hoopRuptureStrain, { min: 0.02, max: 0.3 }) && ok;
  }
  if (!Array.isArray(c.clearSpacings)) {
    out.push({ code: 'required', path: fieldPath(path, 'clearSpacings'), severity: 'error', message: 'clear spacings w′i between restrained longitudinal bars must be a list of lengths in mm' });
    return out;
  }
  if (requireClearSpacings && c.clearSpacings.length < 4) {
    out.push({ code: 'required', path: fieldPath(path, 'clearSpacings'), severity: 'error',
      message: `Mander's ke needs the clear spacings w′i between laterally restrained bars around the core, at least four (one per side), got ${c.clearSpacings.length}` });
    ok = false;
  }
  c.clearSpacings.forEach((w, i) => {
    ok = checkField(out, `${fieldPath(path, 'clearSpacings')}[${i}]`, 'clear spacing w′ between restrained bars', w, { min: 0, max: 5000, quantity: 'sectionLength' }) && ok;
  });
  if (!ok) return out;
  if (c.spacing <= c.hoopDiameter) {
    reportInconsistent(out, fieldPath(path, 'spacing'), `hoop spacing s = ${show(c.spacing)} mm must exceed the hoop diameter ${show(c.hoopDiameter)} mm`);
    return out;
  }
  const perimeter = 2 * (c.coreWidth + c.coreDepth);
  const sum = c.clearSpacings.reduce((a, b) => a + b, 0);
  if (sum > perimeter) {
    reportInconsistent(out, fieldPath(path, 'clearSpacings'), `the clear spacings add up to ${show(sum)} mm, more than the core perimeter 2(bc + dc) = ${show(perimeter)} mm`);
  }
  const ke = manderEffectivenessRectangular(c.coreWidth, c.coreDepth, c.clearSpacings, c.spacing - c.hoopDiameter, c.longitudinalRatio);
  if (!(ke > 0)) {
    reportInconsistent(out, fieldPath(path, 'spacing'), `the confinement effectiveness ke = ${show(ke)} is not positive: the hoops are too far apart for this core (s′ must be below 2·min(bc, dc))`);
  }
  return out;
}
