/**
 * Words the interface uses for the options of the project format. Model names keep their
 * published names; clause numbers are those of the codes the options implement.
 */
import type { ConcreteCompressionModel, ConcreteTensionModel, SteelModel, CodeBasis } from '../../../core/materials/specs.ts';
import type { DeflectionLimitCase, HingeLengthMethod, SupportType } from '../../../core/member/definition.ts';
import type { ShapeKind } from '../../../core/section/shapes.ts';
import type { MemberStatus } from '../../../core/assessment/results.ts';

export const SUPPORT_LABELS: Readonly<Record<SupportType, string>> = {
  'simply-supported': 'Simply supported',
  cantilever: 'Cantilever (fixed at left)',
  'fixed-fixed': 'Fixed at both ends',
  'propped-cantilever': 'Propped cantilever (fixed left, pinned right)',
};

export const SUPPORT_SHORT: Readonly<Record<SupportType, string>> = {
  'simply-supported': 'simple',
  cantilever: 'cantilever',
  'fixed-fixed': 'fixed–fixed',
  'propped-cantilever': 'propped',
};

export const LOAD_CASE_LABELS = { dead: 'Dead', superimposed: 'Superimposed dead', live: 'Live' } as const;

export const LIMIT_CASE_LABELS: Readonly<Record<DeflectionLimitCase, string>> = {
  'aci-roof-immediate': 'Flat roof, immediate live load: ℓ/180 (ACI 318-19 Table 24.2.2)',
  'aci-floor-immediate': 'Floor, immediate live load: ℓ/360 (ACI 318-19 Table 24.2.2)',
  'aci-sensitive-after-attachment': 'Supports elements likely to be damaged, after attachment: ℓ/480 (ACI 318-19 Table 24.2.2)',
  'aci-insensitive-after-attachment': 'Supports elements not likely to be damaged, after attachment: ℓ/240 (ACI 318-19 Table 24.2.2)',
  'en-appearance': 'Appearance, quasi-permanent total: span/250 (EN 1992-1-1 7.4.1(4))',
  'en-after-construction': 'After construction, may damage adjacent parts: span/500 (EN 1992-1-1 7.4.1(5))',
  custom: 'Own limit on the total long-term deflection: span/ratio',
};

/** Which limit cases belong to which code basis ('custom' to both). */
export function limitCasesFor(code: CodeBasis): DeflectionLimitCase[] {
  return code === 'ACI 318-19'
    ? ['aci-floor-immediate', 'aci-roof-immediate', 'aci-insensitive-after-attachment', 'aci-sensitive-after-attachment', 'custom']
    : ['en-appearance', 'en-after-construction', 'custom'];
}

export const HINGE_METHOD_LABELS: Readonly<Record<HingeLengthMethod, string>> = {
  'priestley-2007': 'Priestley, Calvi & Kowalsky (2007)',
  'paulay-priestley-1992': 'Paulay & Priestley (1992)',
  'mattock-1967': 'Mattock (1967)',
  'corley-1966': 'Corley (1966)',
  user: 'Given length',
};

export const CONCRETE_MODEL_LABELS: Readonly<Record<ConcreteCompressionModel, string>> = {
  hognestad: 'Hognestad (1951)',
  'modified-kent-park': 'Modified Kent–Park (Scott, Park & Priestley 1982)',
  mander: 'Mander, Priestley & Park (1988)',
  popovics: 'Popovics (1973)',
  'thorenfeldt-collins': 'Thorenfeldt et al. (1987), Collins & Mitchell constants',
  'en1992-nonlinear': 'EN 1992-1-1 nonlinear, Eq. (3.14)',
  'en1992-parabola-rectangle': 'EN 1992-1-1 parabola–rectangle, Eqs. (3.17)–(3.18)',
};

export const TENSION_MODEL_LABELS: Readonly<Record<ConcreteTensionModel, string>> = {
  none: 'No tension',
  'linear-brittle': 'Linear to cracking, then none',
  'tension-stiffening': 'Tension stiffening (Vecchio & Collins 1986)',
};

export const STEEL_MODEL_LABELS: Readonly<Record<SteelModel, string>> = {
  'elastic-plastic': 'Elastic–perfectly plastic',
  bilinear: 'Bilinear with hardening',
  'park-paulay': 'Park & Paulay (1975), plateau and hardening',
  'mander-power': 'Mander (1983) power-law hardening',
};

export const SHAPE_LABELS: Readonly<Record<ShapeKind, string>> = {
  rectangle: 'Rectangle',
  tee: 'T (flange on top)',
  'inverted-tee': 'Inverted T (flange at the bottom)',
  ell: 'L (flange on one side)',
  'i-shape': 'I',
  box: 'Box',
  polygon: 'Polygon (outline points)',
};

/** Statuses a row or badge shows: a member's, not analysed, updating, and `review` (a continuous member whose code checks at every station could not be made). */
export type BadgeStatus = MemberStatus | 'pending' | 'outdated' | 'review';

export const STATUS_LABELS: Readonly<Record<BadgeStatus, string>> = {
  ok: 'OK',
  'check-fails': 'Check fails',
  brittle: 'Brittle',
  'not-converged': 'Not converged',
  'input-error': 'Input error',
  pending: 'Not analysed',
  outdated: 'Updating',
  review: 'To review',
};

export const CONTINUOUS_SUPPORT_LABELS = { pinned: 'Pinned', fixed: 'Fixed', column: 'Column (spring)' } as const;
export const COLUMN_FAR_END_LABELS = { fixed: 'Far end fixed (4EI/L)', pinned: 'Far end pinned (3EI/L)' } as const;

export const CODE_BASIS_LABELS: Readonly<Record<CodeBasis, string>> = {
  'ACI 318-19': 'ACI 318-19',
  'EN 1992-1-1': 'EN 1992-1-1',
};

const wholeTables = new WeakMap<object, readonly { value: string; label: string }[]>();

/**
 * Options for a SelectField from a label table. A whole table gives the same array every time,
 * so that a field re-renders only when something it shows changed.
 */
export function optionsOf<T extends string>(labels: Readonly<Record<T, string>>, only?: readonly T[]): readonly { value: T; label: string }[] {
  if (only) return only.map((value) => ({ value, label: labels[value] }));
  let options = wholeTables.get(labels);
  if (!options) {
    options = Object.freeze((Object.keys(labels) as T[]).map((value) => Object.freeze({ value, label: labels[value] })));
    wholeTables.set(labels, options);
  }
  return options as readonly { value: T; label: string }[];
}
