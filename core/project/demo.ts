/**
 * The demo projects shipped with Hingeline: invented scenarios, no real building, client or person.
 *
 *  - `demoProject()` — Wrenfield Mill, Building B: a two-storey light-industrial building of about
 *    1962 being converted to offices (US customary display units, ACI 318-19). Ten beams that between
 *    them use every feature: simply supported T-beams, an edge (L-shaped) beam, a cantilever, a
 *    fixed-ended beam and a propped cantilever with support zones carrying top bars, point and partial
 *    loads, a lightly reinforced beam near cracking at service, an over-reinforced beam of low
 *    ductility, a beam with a hoop-confined core (Mander), tension stiffening, all five hinge-length
 *    methods and every ACI deflection limit case plus a custom one — with passing and failing
 *    deflection checks, so that results and reports show both outcomes — and one beam with an
 *    as-found condition (cores, steel of the period, corroded bars) and a CFRP strengthening scheme.
 *  - `demoProjectSI()` — a small EN 1992-1-1 variant in SI units (four beams of a mezzanine) and two
 *    continuous beams: a three-span floor beam on columns that passes, and a two-span beam with a
 *    cantilever whose long end span fails its deflection limit.
 *
 * Values are chosen in the display units an engineer would use (ft, in, psi, ksi, kip/ft, kip; m, mm,
 * MPa, kN/m, kN) and stored in internal SI units (mm, N, MPa, N/mm) through core/units, rounded to
 * nine significant figures so that the file reads cleanly. Bar diameters are the nominal diameters of
 * ASTM A615 bar sizes #3–#9 (from memory: #n has a nominal diameter of n/8 in up to #8; #9 is
 * 1.128 in). Pure functions: each call returns a fresh object.
 */
import type { MaterialSpec } from '../materials/specs.ts';
import type { DeflectionLimitCase, HingeLengthMethod, MemberLoad, MemberZone } from '../member/definition.ts';
import type { BarLayer, HoopSet, SectionDefinition } from '../section/definition.ts';
import { fromDisplay } from '../units/index.ts';
import { astmBarDiameter } from '../section/bar-designations.ts';
import { DEFAULT_SETTINGS, PROJECT_FORMAT, PROJECT_VERSION, type ContinuousMemberDefinition, type Project, type MemberDefinition } from './types.ts';

/** Nine significant figures: exact conversions without binary noise in the file (6705.6, not 6705.600000000001). */
const tidy = (x: number): number => Number(x.toPrecision(9));

// US customary → internal.
const ft = (v: number) => tidy(fromDisplay('spanLength', v, 'US'));
const inch = (v: number) => tidy(fromDisplay('sectionLength', v, 'US'));
const psi = (v: number) => tidy(fromDisplay('concreteStress', v, 'US'));
const ksi = (v: number) => tidy(fromDisplay('stress', v, 'US'));
const pcf = (v: number) => tidy(fromDisplay('density', v, 'US'));
/** kip/ft → N/mm. */
const klf = (v: number) => tidy(fromDisplay('lineLoad', v, 'US'));
const kip = (v: number) => tidy(fromDisplay('force', v, 'US'));

/** Nominal diameter of ASTM bar #`size`, mm (core/section/bar-designations.ts). */
const barSize = (size: number): number => astmBarDiameter(size)!;

/** A layer of `count` #`size` bars at `depthIn` inches below the top. */
function bars(steelId: string, count: number, size: number, depthIn: number, label: string, spread?: BarLayer['spread']): BarLayer {
  return { steelId, depth: inch(depthIn), count, diameter: barSize(size), label, ...(spread ? { spread } : {}) };
}

/**
 * #`size` hoops at `spacingIn`, 1.5 in clear cover. Hoops of the 1962 structure are not confirmed closed
 * and anchored (no confined core); `confined` marks new work with closed hoops and 135° hooks.
 */
function hoopsUS(size: number, spacingIn: number, confined: boolean, steelId = 'g60'): HoopSet {
  return { steelId, diameter: barSize(size), spacing: inch(spacingIn), verticalLegs: 2, horizontalLegs: 2, clearCover: inch(1.5), confineCore: confined, closedAndAnchored: confined };
}

function uniform(loadCase: MemberLoad['loadCase'], magnitude: number, label: string, from?: number, to?: number): MemberLoad {
  return { kind: 'uniform', loadCase, magnitude, ...(from !== undefined ? { from } : {}), ...(to !== undefined ? { to } : {}), label };
}

function point(loadCase: MemberLoad['loadCase'], magnitude: number, position: number, label: string): MemberLoad {
  return { kind: 'point', loadCase, magnitude, position, label };
}

interface MemberInput extends Pick<MemberDefinition, 'id' | 'name' | 'supports' | 'span' | 'zones' | 'loads'> {
  readonly limitCases: readonly DeflectionLimitCase[];
  readonly hinge: HingeLengthMethod;
  readonly notes: string;
  readonly sustainedLiveFraction?: number;
  readonly customLimitRatio?: number;
  readonly userHingeLength?: number;
  readonly pattern?: 'proportional' | 'live-only';
  readonly asFound?: MemberDefinition['asFound'];
  readonly schemes?: MemberDefinition['schemes'];
}

function member(m: MemberInput): MemberDefinition {
  return {
    id: m.id,
    name: m.name,
    supports: m.supports,
    span: m.span,
    zones: m.zones,
    loads: m.loads,
    includeSelfWeight: true,
    service: {
      sustainedLiveFraction: m.sustainedLiveFraction ?? 0.25,
      durationMonths: 60,
      limitCases: m.limitCases,
      ...(m.customLimitRatio !== undefined ? { customLimitRatio: m.customLimitRatio } : {}),
    },
    capacity: { pattern: m.pattern ?? 'proportional', hingeLengthMethod: m.hinge, ...(m.userHingeLength !== undefined ? { userHingeLength: m.userHingeLength } : {}) },
    notes: m.notes,
    ...(m.asFound ? { asFound: m.asFound } : {}),
    ...(m.schemes ? { schemes: m.schemes } : {}),
  };
}

/** One zone over the whole span. */
const whole = (span: number, sectionId: string): MemberZone[] => [{ from: 0, to: span, sectionId }];

// --- US demo: Wrenfield Mill, Building B ---------------------------------------------------------------

function usMaterials(): MaterialSpec[] {
  return [
    {
      kind: 'concrete', id: 'c3000-existing', name: 'Existing concrete, f′c 3000 psi (from cores), Hognestad, tension stiffening',
      strength: psi(3000), compressionModel: 'hognestad', tensionModel: 'tension-stiffening', density: pcf(145),
    },
    {
      kind: 'concrete', id: 'c3000-brittle', name: 'Existing concrete, f′c 3000 psi, Thorenfeldt–Collins, brittle tension',
      strength: psi(3000), compressionModel: 'thorenfeldt-collins', tensionModel: 'linear-brittle', density: pcf(145),
    },
    {
      kind: 'concrete', id: 'c4000-new', name: 'New concrete, f′c 4000 psi, Mander (confined core)',
      strength: psi(4000), compressionModel: 'mander', tensionModel: 'linear-brittle', density: pcf(145),
    },
    {
      kind: 'concrete', id: 'c4000-kent-park', name: 'New concrete, f′c 4000 psi, Modified Kent–Park',
      strength: psi(4000), compressionModel: 'modified-kent-park', tensionModel: 'tension-stiffening', density: pcf(145),
    },
    { kind: 'steel', id: 'g40', name: 'Existing bars, Grade 40 (fy 40 ksi, fu 60 ksi)', model: 'park-paulay', yieldStress: ksi(40), ultimateStress: ksi(60), hardeningStrain: 0.012, ruptureStrain: 0.12 },
    { kind: 'steel', id: 'g60', name: 'Grade 60 bars (fy 60 ksi, fu 90 ksi)', model: 'park-paulay', yieldStress: ksi(60), ultimateStress: ksi(90), hardeningStrain: 0.008, ruptureStrain: 0.09 },
    // Interior exposure, carbon: CE = 0.95 (ACI 440.2R-17 Table 9.4, from memory).
    { kind: 'frp', id: 'cfrp-sheet', name: 'CFRP sheet (Ef 33 000 ksi, ε*fu 1.67 %), interior', tensileModulus: ksi(33000), ruptureStrain: 0.0167, environmentalFactor: 0.95 },
  ];
}

function usSections(): SectionDefinition[] {
  return [
    {
      id: 'T24', name: 'T 24 × 12 in web, 54 in flange (Level 2 floor)', concreteId: 'c3000-existing',
      shape: { kind: 'tee', height: inch(24), webWidth: inch(12), flangeWidth: inch(54), flangeThickness: inch(5) },
      bars: [bars('g40', 3, 8, 21.5, 'bottom 3 #8'), bars('g40', 2, 5, 2.3, 'top 2 #5')],
      hoops: hoopsUS(3, 10, false, 'g40'),
      notes: 'As built (1962 drawings, confirmed by cover-meter survey).',
    },
    {
      id: 'T20', name: 'T 20 × 12 in web, 48 in flange (roof)', concreteId: 'c3000-existing',
      shape: { kind: 'tee', height: inch(20), webWidth: inch(12), flangeWidth: inch(48), flangeThickness: inch(4) },
      bars: [bars('g40', 3, 8, 17.5, 'bottom 3 #8'), bars('g40', 2, 4, 2.3, 'top 2 #4')],
      hoops: hoopsUS(3, 9, false, 'g40'),
    },
    {
      id: 'L24', name: 'Edge beam L 24 × 12 in, 30 in flange one side', concreteId: 'c3000-existing',
      shape: { kind: 'ell', height: inch(24), webWidth: inch(12), flangeWidth: inch(30), flangeThickness: inch(5), flangeSide: 'right' },
      bars: [bars('g40', 3, 7, 21.5, 'bottom 3 #7'), bars('g40', 2, 5, 2.3, 'top 2 #5')],
      hoops: hoopsUS(3, 10, false, 'g40'),
    },
    {
      id: 'L24-end', name: 'Edge beam L 24 in, fixed end: top 4 #8', concreteId: 'c3000-existing',
      shape: { kind: 'ell', height: inch(24), webWidth: inch(12), flangeWidth: inch(30), flangeThickness: inch(5), flangeSide: 'right' },
      bars: [bars('g60', 4, 8, 2.5, 'top 4 #8 (new, doweled)', 'chord'), bars('g40', 3, 7, 21.5, 'bottom 3 #7')],
      hoops: hoopsUS(3, 6, false),
    },
    {
      id: 'R24-support', name: 'Rectangle 14 × 24 in, support: top 4 #8, bottom 3 #7', concreteId: 'c3000-brittle',
      shape: { kind: 'rectangle', width: inch(14), height: inch(24) },
      bars: [bars('g60', 4, 8, 2.5, 'top 4 #8'), bars('g60', 3, 7, 21.5, 'bottom 3 #7')],
      hoops: hoopsUS(4, 5, false),
    },
    {
      id: 'R24-mid', name: 'Rectangle 14 × 24 in, midspan: top 2 #5, bottom 3 #7', concreteId: 'c3000-brittle',
      shape: { kind: 'rectangle', width: inch(14), height: inch(24) },
      bars: [bars('g60', 2, 5, 2.3, 'top 2 #5'), bars('g60', 3, 7, 21.5, 'bottom 3 #7')],
      hoops: hoopsUS(4, 10, false),
    },
    {
      id: 'R22-cant', name: 'Rectangle 14 × 22 in canopy beam: top 4 #7, bottom 2 #5', concreteId: 'c4000-kent-park',
      shape: { kind: 'rectangle', width: inch(14), height: inch(22) },
      bars: [bars('g60', 4, 7, 2.5, 'top 4 #7'), bars('g60', 2, 5, 19.7, 'bottom 2 #5')],
      hoops: hoopsUS(4, 6, true),
    },
    {
      id: 'R30-light', name: 'Rectangle 16 × 30 in, bottom 2 #5 only (lightly reinforced)', concreteId: 'c3000-brittle',
      shape: { kind: 'rectangle', width: inch(16), height: inch(30) },
      bars: [bars('g40', 2, 5, 27.5, 'bottom 2 #5'), bars('g40', 2, 4, 2.3, 'top 2 #4')],
      hoops: hoopsUS(3, 12, false, 'g40'),
    },
    {
      id: 'R20-heavy', name: 'Rectangle 12 × 20 in, bottom 6 #9 in two layers (over-reinforced)', concreteId: 'c3000-brittle',
      shape: { kind: 'rectangle', width: inch(12), height: inch(20) },
      bars: [bars('g60', 3, 9, 17.4, 'bottom 3 #9 (lower)'), bars('g60', 3, 9, 14.9, 'bottom 3 #9 (upper)'), bars('g60', 2, 5, 2.3, 'top 2 #5')],
      hoops: hoopsUS(3, 8, false),
    },
    {
      id: 'R22-mander', name: 'Rectangle 14 × 22 in, #4 hoops at 4 in (confined core)', concreteId: 'c4000-new',
      shape: { kind: 'rectangle', width: inch(14), height: inch(22) },
      bars: [bars('g60', 4, 7, 19.5, 'bottom 4 #7'), bars('g60', 2, 6, 2.5, 'top 2 #6')],
      hoops: hoopsUS(4, 4, true),
    },
  ];
}

function usMembers(): MemberDefinition[] {
  const floorSDL = 0.3; // kip/ft: partitions 15 psf + finishes and ceiling 15 psf over a 10 ft bay
  const officeLive = 0.5; // kip/ft: office 50 psf over 10 ft
  return [
    member({
      id: 'B-201', name: 'B-201', supports: 'simply-supported', span: ft(24), zones: whole(ft(24), 'T24'),
      loads: [uniform('superimposed', klf(floorSDL), 'partitions, finishes, ceiling'), uniform('live', klf(officeLive), 'office live load 50 psf')],
      limitCases: ['aci-floor-immediate', 'aci-insensitive-after-attachment'], hinge: 'priestley-2007',
      notes: 'Level 2 typical floor T-beam, grid C between lines 2 and 3.',
    }),
    member({
      id: 'B-204', name: 'B-204', supports: 'simply-supported', span: ft(22), zones: whole(ft(22), 'T24'),
      loads: [
        uniform('superimposed', klf(floorSDL), 'partitions, finishes, ceiling'),
        point('superimposed', kip(6), ft(8), 'new air-handling unit on its frame'),
        uniform('live', klf(officeLive), 'office live load 50 psf'),
        uniform('live', klf(0.6), 'file storage 125 psf over the first 10 ft', 0, ft(10)),
      ],
      limitCases: ['aci-floor-immediate', 'aci-sensitive-after-attachment'], hinge: 'paulay-priestley-1992',
      notes: 'Level 2 T-beam under the new air-handling unit and the file store (partial live load). Cores and a corroded bottom layer found on site; CFRP strengthening compared.',
      asFound: {
        cores: [{ concreteId: 'c3000-existing', meanStrength: psi(3500), count: 6, coefficientOfVariation: 0.11, note: 'cores C1–C6 from the Level 2 beams, corrected to in-place cylinder strength' }],
        steel: [{ steelId: 'g40', source: 'era-default', yieldStress: ksi(40), ultimateStress: ksi(60), note: 'no coupons taken; intermediate grade of the period' }],
        defects: [
          { kind: 'section-loss', layer: 0, lossPercent: 8, note: 'bottom bars corroded near the former loading-dock door' },
          { kind: 'cover-loss', face: 'bottom', depth: inch(0.75), note: 'soffit spalled over about 4 ft at midspan' },
        ],
      },
      schemes: [
        { kind: 'frp', id: 'cfrp-2', name: 'Two plies of CFRP sheet, 10 in wide, on the repaired soffit', frpId: 'cfrp-sheet', plyThickness: inch(0.0065), plies: 2, width: inch(10), repairSpalls: true },
        { kind: 'concrete-layer', id: 'overlay-3', name: '3 in bonded overlay, 4000 psi, 4 #4', face: 'top', thickness: inch(3), concreteId: 'c4000-kent-park', bars: [{ steelId: 'g60', distanceFromFace: inch(1.5), count: 4, diameter: barSize(4) }] },
      ],
    }),
    member({
      id: 'R-301', name: 'R-301', supports: 'simply-supported', span: ft(28), zones: whole(ft(28), 'T20'),
      loads: [uniform('superimposed', klf(0.35), 'new green-roof trays, saturated, 35 psf over 10 ft'), uniform('live', klf(0.3), 'roof live / snow 30 psf')],
      limitCases: ['aci-roof-immediate', 'aci-sensitive-after-attachment'], hinge: 'mattock-1967', sustainedLiveFraction: 0.2,
      notes: 'Roof T-beam over the former loading dock; the green roof adds a heavy sustained load.',
    }),
    member({
      id: 'R-305', name: 'R-305', supports: 'simply-supported', span: ft(22), zones: whole(ft(22), 'T20'),
      loads: [uniform('superimposed', klf(0.2), 'roofing and insulation'), uniform('live', klf(0.3), 'roof live / snow 30 psf')],
      limitCases: ['aci-roof-immediate', 'custom'], customLimitRatio: 240, hinge: 'corley-1966', sustainedLiveFraction: 0,
      notes: 'Typical roof T-beam, membrane roof kept; custom limit ℓ/240 on the total deflection for the new skylight curb.',
    }),
    member({
      id: 'C-101', name: 'C-101', supports: 'cantilever', span: ft(12), zones: whole(ft(12), 'R22-cant'),
      loads: [
        uniform('superimposed', klf(0.25), 'canopy deck and glazing'),
        point('superimposed', kip(1.5), ft(12), 'fascia and gutter at the tip'),
        uniform('live', klf(0.3), 'snow 30 psf over 10 ft'),
      ],
      limitCases: ['aci-roof-immediate', 'aci-insensitive-after-attachment'], hinge: 'corley-1966', sustainedLiveFraction: 0.2,
      notes: 'New entrance canopy beam cantilevering from the stair core (new concrete, closed hoops).',
    }),
    member({
      id: 'F-205', name: 'F-205', supports: 'fixed-fixed', span: ft(18),
      zones: [
        { from: 0, to: ft(4), sectionId: 'R24-support' },
        { from: ft(4), to: ft(14), sectionId: 'R24-mid' },
        { from: ft(14), to: ft(18), sectionId: 'R24-support' },
      ],
      loads: [
        uniform('superimposed', klf(0.6), 'stair landing and finishes'),
        point('superimposed', kip(6), ft(9), 'landing post at midspan'),
        uniform('live', klf(0.8), 'stair live load 100 psf over 8 ft'),
      ],
      limitCases: ['aci-floor-immediate', 'aci-sensitive-after-attachment'], hinge: 'paulay-priestley-1992',
      notes: 'Stair-core beam cast into both core walls; support zones carry top 4 #8.',
    }),
    member({
      id: 'P-206', name: 'P-206', supports: 'propped-cantilever', span: ft(20),
      zones: [
        { from: 0, to: ft(4), sectionId: 'L24-end' },
        { from: ft(4), to: ft(20), sectionId: 'L24' },
      ],
      loads: [
        uniform('superimposed', klf(0.45), 'cladding, partitions, finishes'),
        uniform('live', klf(0.25), 'office live load over 5 ft'),
        point('live', kip(2), ft(14), 'balustrade post at the atrium'),
      ],
      limitCases: ['aci-floor-immediate', 'aci-sensitive-after-attachment'], hinge: 'priestley-2007',
      notes: 'Edge beam at the new atrium opening: fixed into the retained wall at the left, on a new column at the right.',
    }),
    member({
      id: 'L-102', name: 'L-102', supports: 'simply-supported', span: ft(20), zones: whole(ft(20), 'R30-light'),
      loads: [uniform('superimposed', klf(0.45), 'raised floor and services'), uniform('live', klf(0.5), 'office live load 50 psf')],
      limitCases: ['aci-floor-immediate', 'aci-insensitive-after-attachment'], hinge: 'mattock-1967',
      notes: 'Original mezzanine beam, deep and lightly reinforced (below the ACI minimum): close to cracking under service load, and its flexural strength is below the cracking moment.',
    }),
    member({
      id: 'H-103', name: 'H-103', supports: 'simply-supported', span: ft(16), zones: whole(ft(16), 'R20-heavy'),
      loads: [uniform('superimposed', klf(1.2), 'masonry wall over the former crane-bay opening'), uniform('live', klf(0.8), 'floor above, 50 psf over 16 ft')],
      limitCases: ['aci-floor-immediate', 'aci-sensitive-after-attachment'], hinge: 'user', userHingeLength: inch(10),
      notes: 'Heavily reinforced lintel beam: the steel does not yield before the concrete crushes (low ductility).',
    }),
    member({
      id: 'M-207', name: 'M-207', supports: 'simply-supported', span: ft(26), zones: whole(ft(26), 'R22-mander'),
      loads: [uniform('superimposed', klf(0.4), 'new floor plate and finishes'), uniform('live', klf(0.5), 'office live load 50 psf')],
      limitCases: ['aci-floor-immediate', 'aci-insensitive-after-attachment'], hinge: 'priestley-2007',
      notes: 'New infill beam where the old freight lift was removed; closed #4 hoops at 4 in confine the core.',
    }),
  ];
}

/**
 * The US-customary demo project (ACI 318-19): Wrenfield Mill, Building B, converted to offices.
 * Internal units as every project (mm, N, MPa, N/mm); `info.unitSystem` is 'us' for display.
 */
export function demoProject(): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    info: {
      name: 'Wrenfield Mill, Building B — office conversion',
      number: 'HL-DEMO-US',
      description: 'Assessment of the cast-in-place floor and roof beams of a two-storey light-industrial building (about 1962) for its conversion to offices: new partitions, an air-handling unit, a file store, a green roof, a stair core, an atrium and an entrance canopy. Invented example project.',
      engineer: 'R. T.',
      checker: 'M. K.',
      revision: 'A',
      date: '2026-03-02',
      codeBasis: 'ACI 318-19',
      unitSystem: 'us',
    },
    materials: usMaterials(),
    sections: usSections(),
    members: usMembers(),
    settings: { ...DEFAULT_SETTINGS },
  };
}

// --- SI demo: Linden Yard depot mezzanine -------------------------------------------------------------

const m = (v: number) => tidy(fromDisplay('spanLength', v, 'SI'));

/**
 * The SI demo project (EN 1992-1-1): a steel-framed depot receiving a new concrete mezzanine with
 * four beams. Internal units (mm, N, MPa, N/mm; kN/m equals N/mm); `info.unitSystem` is 'si'.
 */
export function demoProjectSI(): Project {
  const hoops = (spacing: number): HoopSet => ({ steelId: 'b500b', diameter: 8, spacing, verticalLegs: 2, horizontalLegs: 2, clearCover: 30, confineCore: false, closedAndAnchored: false });
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    info: {
      name: 'Linden Yard depot — mezzanine beams',
      number: 'HL-DEMO-SI',
      description: 'Check of the beams of a new cast-in-place mezzanine inside an existing depot: storage over the office area, a cantilevered walkway and a plant platform. Invented example project.',
      engineer: 'R. T.',
      checker: 'M. K.',
      revision: '0',
      date: '2026-03-02',
      codeBasis: 'EN 1992-1-1',
      unitSystem: 'si',
    },
    materials: [
      { kind: 'concrete', id: 'c30', name: 'C30/37, EN 1992-1-1 nonlinear (Eq. 3.14), tension stiffening', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' },
      { kind: 'concrete', id: 'c30-pr', name: 'C30/37, parabola–rectangle, brittle tension', strength: 30, compressionModel: 'en1992-parabola-rectangle', tensionModel: 'linear-brittle' },
      { kind: 'steel', id: 'b500b', name: 'B500B (fyk 500 MPa, k 1.08, εuk 5 %)', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.01, ruptureStrain: 0.05 },
    ],
    sections: [
      {
        id: 'T500', name: 'T 500 × 300 web, 1200 flange', concreteId: 'c30',
        shape: { kind: 'tee', height: 500, webWidth: 300, flangeWidth: 1200, flangeThickness: 150 },
        bars: [{ steelId: 'b500b', depth: 447, count: 3, diameter: 20, label: 'bottom 3 Ø20' }, { steelId: 'b500b', depth: 46, count: 2, diameter: 12, label: 'top 2 Ø12' }],
        hoops: hoops(200),
      },
      {
        id: 'T500-end', name: 'T 500, support: top 4 Ø20', concreteId: 'c30',
        shape: { kind: 'tee', height: 500, webWidth: 300, flangeWidth: 1200, flangeThickness: 150 },
        bars: [{ steelId: 'b500b', depth: 50, count: 4, diameter: 20, label: 'top 4 Ø20', spread: 'chord' }, { steelId: 'b500b', depth: 447, count: 3, diameter: 20, label: 'bottom 3 Ø20' }],
        hoops: hoops(125),
      },
      {
        id: 'R400', name: 'Rectangle 300 × 400', concreteId: 'c30-pr',
        shape: { kind: 'rectangle', width: 300, height: 400 },
        bars: [{ steelId: 'b500b', depth: 50, count: 3, diameter: 16, label: 'top 3 Ø16' }, { steelId: 'b500b', depth: 352, count: 2, diameter: 12, label: 'bottom 2 Ø12' }],
        hoops: hoops(150),
      },
    ],
    members: [
      member({
        id: 'MB-1', name: 'MB-1', supports: 'simply-supported', span: m(7.2), zones: whole(m(7.2), 'T500'),
        loads: [uniform('superimposed', 4, 'screed, services, ceiling'), uniform('live', 8.4, 'storage 3.5 kN/m² over 2.4 m')],
        limitCases: ['en-appearance', 'en-after-construction'], hinge: 'priestley-2007', sustainedLiveFraction: 0.8,
        notes: 'Mezzanine beam under the storage area (ψ2 = 0.8 for storage).',
      }),
      member({
        id: 'MB-2', name: 'MB-2', supports: 'propped-cantilever', span: m(8),
        zones: [{ from: 0, to: m(1.6), sectionId: 'T500-end' }, { from: m(1.6), to: m(8), sectionId: 'T500' }],
        loads: [uniform('superimposed', 4.5, 'screed, services, ceiling'), uniform('live', 7.2, 'offices 3 kN/m² over 2.4 m'), point('live', 18_000, m(5), 'plant platform leg, 18 kN')],
        limitCases: ['en-appearance', 'en-after-construction'], hinge: 'paulay-priestley-1992', sustainedLiveFraction: 0.3,
        notes: 'Fixed into the stair core at the left, on a column at the right.',
      }),
      member({
        id: 'MB-3', name: 'MB-3', supports: 'fixed-fixed', span: m(6),
        zones: [{ from: 0, to: m(1.2), sectionId: 'T500-end' }, { from: m(1.2), to: m(4.8), sectionId: 'T500' }, { from: m(4.8), to: m(6), sectionId: 'T500-end' }],
        loads: [uniform('superimposed', 4.5, 'screed, services, ceiling'), uniform('live', 7.2, 'offices 3 kN/m² over 2.4 m')],
        limitCases: ['en-appearance'], hinge: 'mattock-1967', sustainedLiveFraction: 0.3,
        notes: 'Between two cores, cast monolithically with both.',
      }),
      member({
        id: 'WK-1', name: 'WK-1', supports: 'cantilever', span: m(2.4), zones: whole(m(2.4), 'R400'),
        loads: [uniform('superimposed', 2, 'walkway grating and balustrade'), uniform('live', 3, 'walkway 5 kN/m² over 0.6 m')],
        limitCases: ['en-appearance', 'custom'], customLimitRatio: 180, hinge: 'user', userHingeLength: 200, sustainedLiveFraction: 0.3,
        notes: 'Cantilevered walkway bracket; custom limit span/180 for the balustrade glazing.',
      }),
    ],
    continuousMembers: siContinuousMembers(),
    settings: { ...DEFAULT_SETTINGS },
  };
}

/**
 * The SI demo's continuous beams. CB-1: three spans on the mezzanine columns (300 × 300 mm, C30/37,
 * EI = Ecm·b⁴/12 with Ecm 32.8 GPa, 3.6 m storeys) with support zones carrying top bars; CB-2: a
 * long end span and a short one over a wall, with a loading-bay cantilever, whose end span is too
 * slender for its storage load (it fails span/250).
 */
function siContinuousMembers(): ContinuousMemberDefinition[] {
  const column = { stiffness: 3.3e4 * (300 ** 4 / 12), height: m(3.6), farEnd: 'fixed' as const };
  const onColumn = { kind: 'column' as const, below: column };
  const service = (limitCases: DeflectionLimitCase[], sustainedLiveFraction: number) => ({ sustainedLiveFraction, durationMonths: 60, limitCases });
  return [
    {
      id: 'CB-1', name: 'CB-1', spans: [m(6), m(7), m(6)],
      supports: [{ kind: 'pinned' }, onColumn, onColumn, { kind: 'pinned' }],
      zones: [
        { from: 0, to: m(4.8), sectionId: 'T500' },
        { from: m(4.8), to: m(7.4), sectionId: 'T500-end' },
        { from: m(7.4), to: m(11.6), sectionId: 'T500' },
        { from: m(11.6), to: m(14.2), sectionId: 'T500-end' },
        { from: m(14.2), to: m(19), sectionId: 'T500' },
      ],
      loads: [1, 2, 3].flatMap((span) => [
        { kind: 'uniform' as const, loadCase: 'superimposed' as const, span, magnitude: 4.5, label: 'screed, services, ceiling' },
        { kind: 'uniform' as const, loadCase: 'live' as const, span, magnitude: 7.2, label: 'offices 3 kN/m² over 2.4 m' },
      ]),
      service: service(['en-appearance'], 0.3),
      capacity: { pattern: 'proportional', arrangement: { kind: 'all-spans' }, hingeLengthMethod: 'priestley-2007' },
      notes: 'Office floor beam over two mezzanine columns; top bars over the columns.',
    },
    {
      id: 'CB-2', name: 'CB-2', spans: [m(8.4), m(4.2)], rightCantilever: m(1.5),
      supports: [{ kind: 'pinned' }, { kind: 'pinned' }, { kind: 'pinned' }],
      zones: [
        { from: 0, to: m(7.2), sectionId: 'T500' },
        { from: m(7.2), to: m(14.1), sectionId: 'T500-end' },
      ],
      loads: [
        ...[1, 2, 'right-cantilever' as const].map((span) => ({ kind: 'uniform' as const, loadCase: 'superimposed' as const, span, magnitude: 4, label: 'screed, services' })),
        ...[1, 2, 'right-cantilever' as const].map((span) => ({ kind: 'uniform' as const, loadCase: 'live' as const, span, magnitude: 10, label: 'storage 5 kN/m² over 2 m' })),
      ],
      service: service(['en-appearance', 'en-after-construction'], 0.8),
      capacity: { pattern: 'proportional', arrangement: { kind: 'governing-span', span: 1 }, hingeLengthMethod: 'mattock-1967' },
      notes: 'Storage-area beam: a long span to the loading bay, a short one over the wall, and the bay canopy. The long span is too slender for the storage load.',
    },
  ];
}
