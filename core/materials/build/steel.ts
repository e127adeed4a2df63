import { diagnostic, InputError, type AllowedRange, type Diagnostic } from '../../diagnostics.ts';
import { phrase, q } from '../../units/phrase.ts';
import { STEEL_MODELS, type SteelModel, type SteelSpec } from '../specs.ts';
import type { SteelMaterial } from '../types.ts';
import { checkField, fieldPath } from '../checks.ts';
import { bilinearSteel } from '../steel/bilinear.ts';
import { elasticPlasticSteel } from '../steel/elastic-plastic.ts';
import { manderPowerSteel } from '../steel/mander-power.ts';
import { parkPaulaySteel } from '../steel/park-paulay.ts';
import { checkIdentity, checkOption, collectLawDiagnostics, pathMapper } from './common.ts';

/** Default Es = 200 000 MPa. @see ACI 318-19 20.2.2.2; EN 1992-1-1 3.2.7(4) */
export const DEFAULT_STEEL_MODULUS = 200_000;
/** Default onset of hardening for park-paulay and mander-power. // common practice, no source (hot-rolled bars: 0.005–0.015) */
export const DEFAULT_HARDENING_STRAIN = 0.008;
/** Default rupture strain εsu: 0.10 for the hardening models, 0.05 for elastic–plastic (as specs.ts states). */
export function defaultRuptureStrain(model: SteelModel): number {
  return model === 'elastic-plastic' ? 0.05 : 0.1;
}

function build(spec: SteelSpec): SteelMaterial {
  const elasticModulus = spec.elasticModulus ?? DEFAULT_STEEL_MODULUS;
  const ruptureStrain = spec.ruptureStrain ?? defaultRuptureStrain(spec.model);
  const common = { elasticModulus, yieldStress: spec.yieldStress, ruptureStrain };
  switch (spec.model) {
    case 'elastic-plastic':
      return elasticPlasticSteel(common);
    case 'bilinear':
      return bilinearSteel({ ...common, ultimateStress: spec.ultimateStress, hardeningStrain: spec.hardeningStrain, hardeningModulus: spec.hardeningModulus });
    case 'park-paulay':
      return parkPaulaySteel({ ...common, ultimateStress: spec.ultimateStress, hardeningStrain: spec.hardeningStrain ?? DEFAULT_HARDENING_STRAIN });
    case 'mander-power':
      return manderPowerSteel({ ...common, ultimateStress: spec.ultimateStress, hardeningStrain: spec.hardeningStrain ?? DEFAULT_HARDENING_STRAIN, hardeningModulus: spec.hardeningModulus });
  }
}

/**
 * Checks a steel spec: fy 200–1000 MPa, fu from fy to 2000 MPa, Es 100–250 GPa, εsu 0.01–0.30, εsh between
 * εy and εsu, Esh from 0 to Es, and the model's own conditions (Mander's P ≥ 1, bilinear reaching fu).
 */
export function validateSteelSpec(spec: SteelSpec, path = 'material'): Diagnostic[] {
  const out: Diagnostic[] = [];
  const at = (field: string): string => fieldPath(path, field);
  checkIdentity(out, spec, 'steel', path);
  let ok = checkOption(out, at('model'), 'steel model', spec.model, STEEL_MODELS);
  ok = checkField(out, at('yieldStress'), 'steel yield stress fy', spec.yieldStress, { min: 200, max: 1000, quantity: 'stress' }) && ok;
  ok = checkField(out, at('ultimateStress'), 'steel ultimate stress fu (at least fy)',
    spec.ultimateStress, { min: Number.isFinite(spec.yieldStress) ? spec.yieldStress : 200, max: 2000, quantity: 'stress' }) && ok;
  const optional: [keyof SteelSpec, string, AllowedRange][] = [
    ['elasticModulus', 'steel elastic modulus Es', { min: 100_000, max: 250_000, quantity: 'modulus' }],
    ['hardeningStrain', 'strain at the onset of hardening εsh', { min: 0, max: 0.1 }],
    ['ruptureStrain', 'rupture strain εsu', { min: 0.01, max: 0.3 }],
    ['hardeningModulus', 'hardening modulus Esh', { min: 0, max: 250_000, quantity: 'modulus' }],
  ];
  for (const [field, label, range] of optional) {
    if (spec[field] !== undefined) ok = checkField(out, at(field), label, spec[field], range) && ok;
  }
  if (!ok) return out;
  if (spec.model === 'elastic-plastic' && spec.ultimateStress > spec.yieldStress) {
    out.push(diagnostic('inconsistent', at('ultimateStress'), 'warning',
      phrase`the elastic–perfectly plastic model ignores the ultimate stress fu = ${q('stress', spec.ultimateStress, { compact: true })} (stress stays at fy = ${q('stress', spec.yieldStress, { compact: true })}); choose a hardening model to use it`));
  }
  const table = {
    elasticModulus: at('elasticModulus'), yieldStress: at('yieldStress'), ultimateStress: at('ultimateStress'),
    hardeningStrain: at('hardeningStrain'), ruptureStrain: at('ruptureStrain'), hardeningModulus: at('hardeningModulus'),
  };
  out.push(...collectLawDiagnostics(() => build(spec), pathMapper(table, at('model'))));
  return out;
}

/**
 * Builds the steel law of a spec (MPa, compression positive, symmetric). Defaults: Es = 200 000 MPa,
 * εsh = 0.008 (park-paulay, mander-power) or εy (bilinear), εsu = 0.10 (0.05 elastic–plastic).
 * A bilinear law warns (and does not throw) when a given Esh tops out below fu. Throws InputError with
 * every diagnostic when the spec is invalid.
 */
export function buildSteel(spec: SteelSpec, path = 'material'): SteelMaterial {
  const diagnostics = validateSteelSpec(spec, path);
  if (diagnostics.some((d) => d.severity === 'error')) throw new InputError(diagnostics);
  return build(spec);
}
