/**
 * An invented bay for the retrofit tests: the engine-test project (test/fixtures/projects.ts) with
 * an FRP sheet, an overlay concrete and a plate steel added, and a simply supported 6 m beam on the
 * 300 × 600 section whose as-found condition and schemes each test sets. SI internal units.
 */
import type { CodeBasis } from '../../../core/materials/specs.ts';
import type { Project, MemberDefinition } from '../../../core/project/types.ts';
import type { AsFoundCondition, ConcreteLayerScheme, FrpScheme, SteelPlateScheme } from '../../../core/retrofit/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

export function retrofitProject(code: CodeBasis = 'ACI 318-19', overrides: Partial<MemberDefinition> = {}): Project {
  const base = smallProject(code);
  return {
    ...base,
    materials: [
      ...base.materials,
      { kind: 'frp', id: 'cfrp', name: 'Carbon sheet', tensileModulus: 230_000, ruptureStrain: 0.0167, environmentalFactor: 0.95 },
      { kind: 'concrete', id: 'c40', name: 'C40 overlay', strength: 40, compressionModel: 'hognestad', tensionModel: 'linear-brittle' },
      { kind: 'steel', id: 's355', name: 'S355 plate', model: 'bilinear', yieldStress: 355, ultimateStress: 490, ruptureStrain: 0.15 },
    ],
    members: [member('B1', 'simply-supported', 6000, 'r1', overrides)],
  };
}

export const CORES_AND_DEFECTS: AsFoundCondition = {
  cores: [{ meanStrength: 27, count: 4, coefficientOfVariation: 0.12, note: 'four cores from the soffit' }],
  steel: [{ steelId: 'b500', source: 'coupons', yieldStress: 520, ultimateStress: 640, note: 'two coupons' }],
  defects: [
    { kind: 'section-loss', layer: 0, lossPercent: 12, note: 'bottom bars pitted near midspan' },
    { kind: 'cover-loss', face: 'bottom', depth: 20, note: 'soffit spalled' },
  ],
  notes: 'survey of the invented bay',
};

export const FRP_SCHEME: FrpScheme = { kind: 'frp', id: 'frp2', name: 'CFRP, 2 plies', frpId: 'cfrp', plyThickness: 0.165, plies: 2, width: 250 };
export const PLATE_SCHEME: SteelPlateScheme = { kind: 'steel-plate', id: 'plate6', name: 'Plate 6 mm', steelId: 's355', thickness: 6, width: 200 };
export const OVERLAY_SCHEME: ConcreteLayerScheme = { kind: 'concrete-layer', id: 'ov75', name: 'Overlay 75 mm', face: 'top', thickness: 75, concreteId: 'c40', bars: [{ steelId: 'b500', distanceFromFace: 40, count: 4, diameter: 12 }] };

/** Walks a result and fails on a number that is not finite or on anything that JSON cannot carry. */
export function plainAndFinite(value: unknown, path = 'result'): string[] {
  const bad: string[] = [];
  const walk = (v: unknown, p: string) => {
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) bad.push(`${p} = ${v}`);
    } else if (typeof v === 'function') bad.push(`${p} is a function`);
    else if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${p}[${i}]`));
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, `${p}.${k}`);
  };
  walk(value, path);
  return bad;
}
