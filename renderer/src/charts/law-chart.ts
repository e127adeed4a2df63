/**
 * Chart spec of a stress–strain law for the materials panel, in the same library-neutral form as
 * core/charts (drawn by the same `toChartJsConfig`). The law itself is evaluated by the material
 * core/materials builds (its `stress(strain)`); this file only samples it for plotting.
 * Sign convention of core: strain and stress positive in compression.
 */
import type { ChartSpec, SeriesSpec, MarkerSpec } from '../../../core/charts/types.ts';
import { axisFor, axisScale, display, resolveUnits, unitText } from '../../../core/charts/units.ts';
import type { UniaxialMaterial } from '../../../core/materials/types.ts';
import type { Quantity } from '../../../core/units/quantities.ts';
import type { UnitSystem } from '../../../core/project/types.ts';

/** A chart spec of a material law ('material-law' is not one of core's chart kinds). */
export type LawChartSpec = Omit<ChartSpec, 'kind'> & { readonly kind: 'material-law' };

export interface LawCurve {
  readonly material: UniaxialMaterial;
  /** Legend text, e.g. `unconfined (cover)`. */
  readonly label: string;
}

/** Strains where the plot samples the law: evenly spaced, plus every breakpoint and its neighbours. */
export function sampleStrains(from: number, to: number, breakpoints: readonly number[], count = 240): number[] {
  const strains = new Set<number>();
  for (let i = 0; i <= count; i++) strains.add(from + ((to - from) * i) / count);
  for (const b of breakpoints) {
    if (b < from || b > to) continue;
    strains.add(b);
    const step = Math.max(Math.abs(b) * 1e-6, 1e-9);
    if (b - step >= from) strains.add(b - step);
    if (b + step <= to) strains.add(b + step);
  }
  return [...strains].sort((a, b) => a - b);
}

/** The strain range that shows a law whole: its tension limit to a little beyond its compression limit. */
export function strainRange(material: UniaxialMaterial & { crackingStrain?: number; ruptureStrain?: number; crushingStrain?: number }, kind: 'concrete' | 'steel' | 'frp'): [number, number] {
  if (kind === 'concrete') {
    const crushing = material.crushingStrain ?? 0.0035;
    const cracking = material.crackingStrain ?? 0;
    const tensionEnd = cracking > 0 ? -Math.max(cracking * 8, 0.001) : -0.0005;
    return [tensionEnd, crushing * 1.08];
  }
  const rupture = material.ruptureStrain ?? 0.1;
  return kind === 'frp' ? [-rupture * 1.1, 0] : [-rupture * 1.05, rupture * 1.05];
}

/**
 * Spec of one or more laws of the same kind, strain in per mille against stress in the display
 * unit of `stressQuantity` (concrete: MPa / psi; steel: MPa / ksi).
 */
export function lawChart(curves: readonly LawCurve[], kind: 'concrete' | 'steel' | 'frp', stressQuantity: Quantity, system: UnitSystem, title: string): LawChartSpec {
  const units = resolveUnits(system);
  const colours = ['blue', 'orange', 'green', 'purple'] as const;
  const raw = curves.map(({ material, label }) => {
    const [from, to] = strainRange(material, kind);
    const strains = sampleStrains(from, to, material.breakpoints);
    return { label, material, points: strains.map((e) => ({ strain: e, stress: material.stress(e) })) };
  });
  const xScale = axisScale(raw.flatMap((c) => c.points.map((p) => display('strain', p.strain, units))));
  const yScale = axisScale(raw.flatMap((c) => c.points.map((p) => display(stressQuantity, p.stress, units))));
  const series: SeriesSpec[] = raw.map((c, i) => ({
    id: `law-${i}`,
    label: c.label,
    points: c.points
      .map((p) => ({ x: display('strain', p.strain, units) / xScale, y: display(stressQuantity, p.stress, units) / yScale }))
      .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y)),
    colour: colours[i % colours.length]!,
    style: 'solid',
    width: 1.8,
  }));
  const markers: MarkerSpec[] = [];
  raw.forEach((c, i) => {
    const m = c.material as UniaxialMaterial & { peakStrain?: number; peakStress?: number; yieldStress?: number };
    if (kind === 'concrete' && m.peakStrain !== undefined && m.peakStress !== undefined) {
      markers.push({ x: display('strain', m.peakStrain, units) / xScale, y: display(stressQuantity, m.peakStress, units) / yScale, label: i === 0 ? 'peak' : '', shape: 'star', colour: colours[i % colours.length]! });
    }
    if (kind === 'steel' && m.yieldStrain !== undefined && m.yieldStress !== undefined) {
      markers.push({ x: display('strain', m.yieldStrain, units) / xScale, y: display(stressQuantity, m.yieldStress, units) / yScale, label: 'yield', shape: 'triangle', colour: colours[i % colours.length]! });
    }
  });
  return {
    kind: 'material-law',
    title,
    subtitle: '',
    x: axisFor('Strain ε, compression +', unitText('strain', units), xScale),
    y: axisFor('Stress σ, compression +', unitText(stressQuantity, units), yScale),
    series,
    markers,
    bands: [],
    referenceLines: [
      { axis: 'x', value: 0, label: '', colour: 'ink', style: 'solid' },
      { axis: 'y', value: 0, label: '', colour: 'ink', style: 'solid' },
    ],
    notes: [],
  };
}
