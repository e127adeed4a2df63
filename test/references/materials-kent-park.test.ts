import { describe, expect, it } from 'vitest';
import { modifiedKentParkEps50u } from '../../core/materials/concrete/modified-kent-park.ts';
import { convertUnit } from '../../core/units/convert.ts';

// Kent & Park (1971) give ε50u = (3 + 0.002 f′c)/(f′c − 1000) with f′c in psi (from memory); Scott, Park &
// Priestley (1982) state it in MPa as (3 + 0.29 f′c)/(145 f′c − 1000). Both must agree after conversion.
describe('ε50u of Kent & Park / Scott, Park & Priestley', () => {
  it.each([3000, 4000, 5000, 6000])('f′c = %d psi: the psi and MPa forms agree within 0.1 %', (fcPsi) => {
    const psiForm = (3 + 0.002 * fcPsi) / (fcPsi - 1000);
    const mpaForm = modifiedKentParkEps50u(convertUnit(fcPsi, 'psi', 'MPa'));
    expect(Math.abs(mpaForm / psiForm - 1)).toBeLessThan(1e-3);
  });
});
