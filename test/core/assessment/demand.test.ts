/**
 * The largest moment within zones (demand.ts largestZoneMoment), which the strengthening checks
 * (service stresses, FRP creep rupture) and the installation moment of a scheme read: a peak between
 * the equal stations — under a point load, or at zero shear under a partial load — is not missed,
 * whatever the station count.
 */
import { describe, expect, it } from 'vitest';
import { largestZoneMoment } from '../../../core/assessment/demand.ts';
import { materialLibrary } from '../../../core/materials/library.ts';
import type { MemberLoad } from '../../../core/member/definition.ts';
import { analyzeSection } from '../../../core/section/analyze.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

const project = smallProject('ACI 318-19');
const analysis = analyzeSection(project.sections[0]!, 'sections[0]', materialLibrary(project.materials, 'ACI 318-19'), { code: 'ACI 318-19', momentDropFraction: 0.8, bilinearMethod: 'priestley-2007' });
const L = 6000;
const beam = (loads: MemberLoad[]) => member('M', 'simply-supported', L, 'r1', { loads, includeSelfWeight: false });
const zones = [{ from: 0, to: L, analysis }];
const unit = { dead: 1, superimposed: 1, live: 1 };

describe('largestZoneMoment finds the peak between stations', () => {
  it.each([4, 10, 60])('a point load at 1234.5 mm with %i segments: M = P·a·b/L', (segments) => {
    const P = 50_000;
    const a = 1234.5;
    const m = largestZoneMoment(beam([{ kind: 'point', loadCase: 'live', magnitude: P, position: a }]), zones, unit, [0], 'sagging', segments);
    // AISC Manual Table 3-23 case 8 (from memory): simple beam, concentrated load at any point, Mmax = P·a·b/L under the load
    expect(m.moment).toBeCloseTo((P * a * (L - a)) / L, 3);
    expect(m.position).toBeCloseTo(a, 9);
  });

  it('a partial uniform load from 1000 to 2700 mm with 7 segments: the peak at zero shear', () => {
    const w = 20;
    const from = 1000;
    const to = 2700;
    const m = largestZoneMoment(beam([{ kind: 'uniform', loadCase: 'live', magnitude: w, from, to }]), zones, unit, [0], 'sagging', 7);
    // AISC Manual Table 3-23 case 4 (from memory), uniform load partially distributed; by statics: R1 = w·c·(L − x̄)/L with c = to − from, x̄ its centroid; V = 0 at x0 = from + R1/w; M = R1·x0 − w(x0 − from)²/2
    const c = to - from;
    const r1 = (w * c * (L - (from + to) / 2)) / L;
    const x0 = from + r1 / w;
    expect(m.position).toBeCloseTo(x0, 6);
    expect(m.moment).toBeCloseTo(r1 * x0 - (w * (x0 - from) ** 2) / 2, 3);
  });
});
