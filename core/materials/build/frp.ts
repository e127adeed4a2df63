import { InputError, type Diagnostic } from '../../diagnostics.ts';
import type { FrpSpec } from '../specs.ts';
import type { FrpMaterial } from '../types.ts';
import { linearFrp, validateLinearFrpParameters } from '../frp/linear-frp.ts';
import { checkIdentity } from './common.ts';

/** Checks an FRP spec: Ef 10–700 GPa, ε*fu 0.002–0.05, 0 < CE ≤ 1 (ACI 440.2R-17 Table 9.4). */
export function validateFrpSpec(spec: FrpSpec, path = 'material'): Diagnostic[] {
  const out: Diagnostic[] = [];
  checkIdentity(out, spec, 'frp', path);
  out.push(...validateLinearFrpParameters(spec, path));
  return out;
}

/** Builds the FRP law of a spec (MPa, compression positive; tension only). Throws InputError when invalid. */
export function buildFrp(spec: FrpSpec, path = 'material'): FrpMaterial {
  const diagnostics = validateFrpSpec(spec, path);
  if (diagnostics.some((d) => d.severity === 'error')) throw new InputError(diagnostics);
  return linearFrp(spec);
}

