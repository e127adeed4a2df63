import { describe, expect, it } from 'vitest';
import { manderStrengthRatio } from '../../core/materials/concrete/mander-confinement.ts';
import { manderConfinedCompression } from '../../core/materials/concrete/mander.ts';

// Mander, Priestley & Park (1988), J. Struct. Eng. 114(8), equal effective lateral pressures:
// f′cc/f′co = −1.254 + 2.254 √(1 + 7.94 f′l/f′co) − 2 f′l/f′co.
describe('Mander et al. (1988) confined strength ratio', () => {
  it('is 1 without confinement', () => {
    expect(manderStrengthRatio(0)).toBeCloseTo(1, 12);
  });

  it('matches the published equation at f′l/f′co = 0.05, 0.1, 0.2 and 0.3 (hand-evaluated)', () => {
    // 0.1: −1.254 + 2.254·√1.794 − 0.2 = −1.254 + 2.254·1.339403 − 0.2 = 1.565014
    expect(manderStrengthRatio(0.1)).toBeCloseTo(1.5650, 4);
    // 0.05: −1.254 + 2.254·√1.397 − 0.1 = 1.310122
    expect(manderStrengthRatio(0.05)).toBeCloseTo(1.3101, 4);
    // 0.2: −1.254 + 2.254·√2.588 − 0.4 = 1.972084
    expect(manderStrengthRatio(0.2)).toBeCloseTo(1.9721, 4);
    // 0.3: −1.254 + 2.254·√3.382 − 0.6 = 2.291154
    expect(manderStrengthRatio(0.3)).toBeCloseTo(2.2912, 4);
  });

  it('agrees with the equal-pressure diagonal of the published chart (from memory: about 1.56 at 0.1, about 2.3 at 0.3)', () => {
    // Values read from the chart of confined strength against the two lateral stress ratios (from memory),
    // tolerance 0.05 for reading a printed chart.
    expect(Math.abs(manderStrengthRatio(0.1) - 1.56)).toBeLessThan(0.05);
    expect(Math.abs(manderStrengthRatio(0.3) - 2.3)).toBeLessThan(0.05);
  });

  it('grows monotonically over the chart range 0–0.3', () => {
    let previous = manderStrengthRatio(0);
    for (let x = 0.01; x <= 0.3; x += 0.01) {
      const ratio = manderStrengthRatio(x);
      expect(ratio).toBeGreaterThan(previous);
      previous = ratio;
    }
  });

  it('moves the peak to εcc = εco[1 + 5(f′cc/f′co − 1)] (Richart’s factor-5 rule used by Mander et al.)', () => {
    const law = manderConfinedCompression({ compressiveStrength: 30, confinedStrength: 30 * manderStrengthRatio(0.1), crushingStrain: 0.03 });
    expect(law.peakStrain).toBeCloseTo(0.002 * (1 + 5 * 0.565014), 6);
  });
});
