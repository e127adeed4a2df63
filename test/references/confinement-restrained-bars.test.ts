/**
 * Confinement counts only restrained bars (issue 11 item 4): Mander's effectiveness coefficient ke takes
 * the clear spacings w′i between bars held at a hoop corner or by a leg or cross-tie, and a core is
 * confined only when the engineer confirms the hoops closed and anchored. Hand calculation of ke for a
 * 400 × 600 mm section with four 25 mm bars top and bottom.
 */
import { describe, expect, it } from 'vitest';
import { materialLibrary, type MaterialResolver } from '../../core/materials/library.ts';
import { manderEffectivenessRectangular } from '../../core/materials/concrete/mander-confinement.ts';
import type { ConfinementInput, MaterialSpec } from '../../core/materials/specs.ts';
import { buildSectionModel, restrainedBars } from '../../core/section/build.ts';
import type { HoopSet, SectionDefinition } from '../../core/section/definition.ts';
import { validateProject } from '../../core/project/validate.ts';
import { DEFAULT_SETTINGS, PROJECT_FORMAT, PROJECT_VERSION, type Project } from '../../core/project/types.ts';

const specs: MaterialSpec[] = [
  { kind: 'concrete', id: 'c', name: 'C30', strength: 30, compressionModel: 'mander', tensionModel: 'none' },
  { kind: 'steel', id: 's', name: 'B500', model: 'park-paulay', yieldStress: 500, ultimateStress: 600 },
];
/** Hoops asked to confine the core; `closedAndAnchored` 'unsaid' leaves the field out (a file from before it existed). */
const hoops = (verticalLegs: number, closedAndAnchored: boolean | 'unsaid' = true): HoopSet => ({
  steelId: 's', diameter: 10, spacing: 100, verticalLegs, horizontalLegs: 2, clearCover: 30, confineCore: true,
  ...(closedAndAnchored === 'unsaid' ? {} : { closedAndAnchored }),
});
// Bars 25 mm at 30 + 10 + 12.5 = 52.5 mm from each face.
const section = (h: HoopSet): SectionDefinition => ({
  id: 'r', name: 'R', shape: { kind: 'rectangle', width: 400, height: 600 }, concreteId: 'c', hoops: h,
  bars: [{ steelId: 's', depth: 52.5, count: 4, diameter: 25 }, { steelId: 's', depth: 547.5, count: 4, diameter: 25 }],
});

/** The confinement the section builder hands to the material library. */
function confinementOf(def: SectionDefinition): ConfinementInput | undefined {
  const library = materialLibrary(specs, 'ACI 318-19');
  let seen: ConfinementInput | undefined;
  const recording: MaterialResolver = {
    concrete: (id, confinement) => {
      seen = confinement;
      return library.concrete(id, confinement);
    },
    steel: (id) => library.steel(id),
  };
  buildSectionModel(def, recording);
  return seen;
}

// Core to the hoop centrelines: bc = 400 − 2·(30 + 5) = 330 mm, dc = 600 − 70 = 530 mm; s′ = 100 − 10 = 90 mm;
// ρcc = 8·π·25²/4 / (330·530) = 0.022453.
const bc = 330;
const dc = 530;
const rhoCc = (8 * Math.PI * 25 ** 2) / 4 / (bc * dc);
/** Mander, Priestley & Park (1988) Eq. (23) (from memory) with the numbers written out. */
const keByHand = (sumSquares: number) => ((1 - sumSquares / (6 * bc * dc)) * (1 - 90 / (2 * bc)) * (1 - 90 / (2 * dc))) / (1 - rhoCc);

describe('Mander’s ke counts only restrained bars', () => {
  it('two-leg hoops with 4 bars per face restrain the corner bars only: ke = 0.347, not 0.441', () => {
    const c = confinementOf(section(hoops(2)))!;
    // Top and bottom: one gap between the corner bars, 330 − 2·25 = 280 mm; sides: 547.5 − 52.5 − 25 = 470 mm, twice.
    expect(c.clearSpacings).toHaveLength(4);
    [280, 280, 470, 470].forEach((w, i) => expect(c.clearSpacings[i]).toBeCloseTo(w, 9));
    const restrained = keByHand(2 * 280 ** 2 + 2 * 470 ** 2);
    expect(restrained).toBeCloseTo(0.3473, 4);
    expect(manderEffectivenessRectangular(c.coreWidth, c.coreDepth, c.clearSpacings, c.spacing - c.hoopDiameter, c.longitudinalRatio)).toBeCloseTo(restrained, 12);
    // Counting every bar as restrained (three gaps of (330 − 4·25)/3 = 76.67 mm per face) would give 0.441.
    expect(keByHand(6 * (230 / 3) ** 2 + 2 * 470 ** 2)).toBeCloseTo(0.4409, 4);
  });

  it('four vertical legs (a cross-tie pair) hold every bar of the face', () => {
    const c = confinementOf(section(hoops(4)))!;
    expect(c.clearSpacings).toHaveLength(8);
    expect(manderEffectivenessRectangular(c.coreWidth, c.coreDepth, c.clearSpacings, 90, c.longitudinalRatio)).toBeCloseTo(keByHand(6 * (230 / 3) ** 2 + 2 * 470 ** 2), 12);
  });

  it('restrained bars: the corners and one per interior leg, spread evenly', () => {
    // common practice, no source: legs placed at bars as evenly as the bars allow
    expect(restrainedBars(4, 2)).toEqual([0, 3]);
    expect(restrainedBars(5, 3)).toEqual([0, 2, 4]);
    expect(restrainedBars(6, 4)).toEqual([0, 2, 3, 5]);
    expect(restrainedBars(3, 6)).toEqual([0, 1, 2]);
  });

  it('no confined core unless the hoops are confirmed closed and anchored; the file says so', () => {
    expect(confinementOf(section(hoops(2, false)))).toBeUndefined();
    expect(confinementOf(section(hoops(2, 'unsaid')))).toBeUndefined();
    const project: Project = {
      format: PROJECT_FORMAT, version: PROJECT_VERSION,
      info: { name: 'P', number: '', description: '', engineer: '', checker: '', revision: '', date: '', codeBasis: 'ACI 318-19', unitSystem: 'si' },
      materials: specs, sections: [section(hoops(2, 'unsaid'))], members: [], settings: DEFAULT_SETTINGS,
    };
    const warnings = validateProject(project).filter((d) => d.path.endsWith('hoops.closedAndAnchored'));
    expect(warnings.map((d) => d.severity)).toEqual(['warning']);
    expect(warnings[0]!.message).toMatch(/analysed unconfined.*closed and anchored.*saved before/);
  });
});
