/**
 * A new project's starting contents, shared by the app's "New project" and the command line's
 * `import --new`: one concrete, one steel and one rectangular section, ordinary editable inputs (a
 * typical beam), never results. Values are written as an engineer would type them in the display
 * units (m, mm, kN/m, MPa; ft, in, kip/ft, psi/ksi) and stored in internal units (mm, N/mm, MPa).
 */
import type { CodeBasis, ConcreteSpec, MaterialSpec, SteelSpec } from '../materials/specs.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { fromDisplay } from '../units/index.ts';
import { DEFAULT_SETTINGS, PROJECT_FORMAT, PROJECT_VERSION, type Project, type UnitSystem } from './types.ts';

const tidy = (x: number): number => Number(x.toPrecision(9));

/** A value typed in the display unit of `system` (SI: m/mm/kN/MPa; US: ft/in/kip/psi), stored in internal units. */
export function typedValue(quantity: 'spanLength' | 'sectionLength' | 'lineLoad' | 'concreteStress' | 'stress', si: number, us: number, system: UnitSystem): number {
  return system === 'us' ? tidy(fromDisplay(quantity, us, 'US')) : tidy(fromDisplay(quantity, si, 'SI'));
}

/** Concrete `concrete-1` and steel `steel-1` of the code basis (C30/37 and B500B; f′c 28 MPa / 4000 psi and Grade 420 / 60). */
export function starterMaterials(code: CodeBasis, system: UnitSystem): MaterialSpec[] {
  const concrete: ConcreteSpec = code === 'EN 1992-1-1'
    ? { kind: 'concrete', id: 'concrete-1', name: 'C30/37', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' }
    : { kind: 'concrete', id: 'concrete-1', name: system === 'us' ? 'f′c 4000 psi' : 'f′c 28 MPa', strength: typedValue('concreteStress', 28, 4000, system), compressionModel: 'hognestad', tensionModel: 'tension-stiffening' };
  const steel: SteelSpec = code === 'EN 1992-1-1'
    ? { kind: 'steel', id: 'steel-1', name: 'B500B', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.01, ruptureStrain: 0.05 }
    : { kind: 'steel', id: 'steel-1', name: system === 'us' ? 'Grade 60' : 'Grade 420', model: 'park-paulay', yieldStress: typedValue('stress', 420, 60, system), ultimateStress: typedValue('stress', 620, 90, system), hardeningStrain: 0.008, ruptureStrain: 0.09 };
  return [concrete, steel];
}

/** Section `section-1`: a 300 × 600 mm (12 × 24 in) rectangle with three bottom and two top bars. */
export function starterSection(system: UnitSystem): SectionDefinition {
  const mm = (si: number, us: number) => typedValue('sectionLength', si, us, system);
  const width = mm(300, 12);
  const height = mm(600, 24);
  return {
    id: 'section-1',
    name: system === 'us' ? 'Rectangle 12 × 24 in' : 'Rectangle 300 × 600',
    shape: { kind: 'rectangle', width, height },
    concreteId: 'concrete-1',
    bars: [
      { steelId: 'steel-1', depth: tidy(height - mm(55, 2.2)), count: 3, diameter: mm(20, 0.75), label: 'bottom bars' },
      { steelId: 'steel-1', depth: mm(50, 2), count: 2, diameter: mm(16, 0.625), label: 'top bars' },
    ],
    hoops: { steelId: 'steel-1', diameter: mm(10, 0.375), spacing: mm(200, 8), verticalLegs: 2, horizontalLegs: 2, clearCover: mm(30, 1.5), confineCore: false, closedAndAnchored: false },
  };
}

/** A project without members: the starter materials and section, default settings. `date` is ISO (yyyy-mm-dd). */
export function starterProject(system: UnitSystem, code: CodeBasis, date: string, name = 'Untitled project'): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    info: { name, number: '', description: '', engineer: '', checker: '', revision: '', date, codeBasis: code, unitSystem: system },
    materials: starterMaterials(code, system),
    sections: [starterSection(system)],
    members: [],
    settings: { ...DEFAULT_SETTINGS },
  };
}
