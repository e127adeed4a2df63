/**
 * Material lookup for a list of specs (a project's material library, or one with derived as-found
 * specs added): builds each material once (per confinement) and reports problems with the
 * material's path in the project file.
 */
import type { Diagnostic } from '../diagnostics.ts';
import { InputError } from '../diagnostics.ts';
import { buildConcrete, buildSteel, buildFrp } from './factory.ts';
import type { CodeBasis, ConcreteSpec, ConfinementInput, FrpSpec, MaterialSpec, SteelSpec, UltimateStrainChoice } from './specs.ts';
import type { ConcreteMaterial, FrpMaterial, SteelMaterial } from './types.ts';

/** Looks up materials by id (what the section builder needs). */
export interface MaterialResolver {
  /**
   * Unconfined law, and the confined core law when `confinement` is given and the model supports it,
   * with the specified compressive strength (f′c, fck or in-place; default: the cover law's peak).
   */
  concrete(id: string, confinement?: ConfinementInput): { cover: ConcreteMaterial; core?: ConcreteMaterial; strength?: number; warnings?: readonly string[] } | undefined;
  steel(id: string): SteelMaterial | undefined;
}

export interface MaterialLibrary extends MaterialResolver {
  concreteSpec(id: string): ConcreteSpec | undefined;
  steelSpec(id: string): SteelSpec | undefined;
  frp(id: string): FrpMaterial | undefined;
  frpSpec(id: string): FrpSpec | undefined;
  /** Problems met while building materials (each once). */
  readonly problems: Diagnostic[];
}

function materialPath(specs: readonly MaterialSpec[], id: string): string {
  const i = specs.findIndex((m) => m.id === id);
  return `materials[${i}] "${id}"`;
}

/** Project settings the materials are built with. */
export interface MaterialSettings {
  /** Where εcu of unconfined concrete comes from when a concrete spec says nothing (default: the code's value). */
  readonly concreteUltimateStrain?: UltimateStrainChoice;
}

/**
 * Materials built from the same spec, code, confinement, settings and path, shared between
 * libraries: the app's worker makes a new library for every edit of a project, and a built law
 * carries the tables the section integrator fits lazily to it (core/section/law-table.ts) — about a
 * tenth of re-analysing a section after an edit went into building the same laws and fitting the
 * same table cells again. Built materials are never changed after building (the tables fill in, each
 * cell the same whoever asks first), so sharing them changes no result. Only successful builds are
 * kept; the most recent 64 of each kind.
 */
const SHARED_LIMIT = 64;
function sharedBuild<T>(store: Map<string, T>, key: string, build: () => T): T {
  const known = store.get(key);
  if (known !== undefined) {
    store.delete(key);
    store.set(key, known);
    return known;
  }
  const built = build();
  store.set(key, built);
  if (store.size > SHARED_LIMIT) store.delete(store.keys().next().value!);
  return built;
}
const sharedConcrete = new Map<string, ReturnType<typeof buildConcrete>>();
const sharedSteel = new Map<string, SteelMaterial>();
const sharedFrp = new Map<string, FrpMaterial>();

/** A caching resolver over a list of material specs. */
export function materialLibrary(specs: readonly MaterialSpec[], code: CodeBasis, settings: MaterialSettings = {}): MaterialLibrary {
  const problems: Diagnostic[] = [];
  const reported = new Set<string>();
  const concreteCache = new Map<string, { cover: ConcreteMaterial; core?: ConcreteMaterial; warnings: string[] } | undefined>();
  const steelCache = new Map<string, SteelMaterial | undefined>();
  const frpCache = new Map<string, FrpMaterial | undefined>();
  const byId = (id: string, kind: MaterialSpec['kind']) => specs.find((m) => m.id === id && m.kind === kind);
  const record = (id: string, error: unknown) => {
    if (reported.has(id)) return;
    reported.add(id);
    if (error instanceof InputError) problems.push(...error.diagnostics);
    else problems.push({ code: 'inconsistent', path: materialPath(specs, id), severity: 'error', message: String(error instanceof Error ? error.message : error) });
  };
  return {
    problems,
    concreteSpec: (id) => byId(id, 'concrete') as ConcreteSpec | undefined,
    steelSpec: (id) => byId(id, 'steel') as SteelSpec | undefined,
    frpSpec: (id) => byId(id, 'frp') as FrpSpec | undefined,
    concrete(id: string, confinement?: ConfinementInput) {
      const key = `${id}|${confinement ? JSON.stringify(confinement) : ''}`;
      if (concreteCache.has(key)) return concreteCache.get(key);
      const spec = byId(id, 'concrete') as ConcreteSpec | undefined;
      let built: { cover: ConcreteMaterial; core?: ConcreteMaterial; strength: number; warnings: string[] } | undefined;
      if (spec) {
        try {
          const options = { path: materialPath(specs, id), ...(settings.concreteUltimateStrain ? { ultimateStrain: settings.concreteUltimateStrain } : {}) };
          const b = sharedBuild(sharedConcrete, JSON.stringify([spec, code, confinement ?? null, options]), () => buildConcrete(spec, code, confinement, options));
          built = { cover: b.cover, ...(b.core ? { core: b.core } : {}), strength: spec.strength, warnings: b.diagnostics.filter((d) => d.severity === 'warning').map((d) => d.message) };
        } catch (error) {
          record(id, error);
        }
      }
      concreteCache.set(key, built);
      return built;
    },
    steel(id: string) {
      if (steelCache.has(id)) return steelCache.get(id);
      const spec = byId(id, 'steel') as SteelSpec | undefined;
      let built: SteelMaterial | undefined;
      if (spec) {
        try {
          const path = materialPath(specs, id);
          built = sharedBuild(sharedSteel, JSON.stringify([spec, path]), () => buildSteel(spec, path));
        } catch (error) {
          record(id, error);
        }
      }
      steelCache.set(id, built);
      return built;
    },
    frp(id: string) {
      if (frpCache.has(id)) return frpCache.get(id);
      const spec = byId(id, 'frp') as FrpSpec | undefined;
      let built: FrpMaterial | undefined;
      if (spec) {
        try {
          const path = materialPath(specs, id);
          built = sharedBuild(sharedFrp, JSON.stringify([spec, path]), () => buildFrp(spec, path));
        } catch (error) {
          record(id, error);
        }
      }
      frpCache.set(id, built);
      return built;
    },
  };
}
