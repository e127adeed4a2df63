/**
 * The project: what a Hingeline file holds once parsed, migrated and validated.
 * Plain data in internal units (mm, N, MPa); the display unit system only changes what is shown.
 * The file format is documented in docs/project-format.md.
 */
import { DEFAULT_ULTIMATE_STRAIN_CHOICE, type CodeBasis, type MaterialSpec, type UltimateStrainChoice } from '../materials/specs.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BilinearMethod } from '../section/results.ts';
import type { BeamDefinition } from '../member/definition.ts';
import type { ContinuousBeamDefinition } from '../continuous/definition.ts';
import type { AsFoundCondition, StrengtheningScheme } from '../retrofit/types.ts';
import type { CombinationSettings } from '../assessment/combinations.ts';

export const PROJECT_FORMAT = 'hingeline-project';
export const PROJECT_VERSION = 3;

/** Display unit systems of a project file, in menu order (the file's spelling; core/units writes 'SI' and 'US'). */
export const UNIT_SYSTEMS = ['si', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** A member as the project file stores it: the beam, and what is known of it as it stands. */
export interface MemberDefinition extends BeamDefinition {
  /** The member as found: tested strengths and deterioration (core/retrofit). */
  readonly asFound?: AsFoundCondition;
  /** Strengthening schemes to compare (core/retrofit). */
  readonly schemes?: readonly StrengtheningScheme[];
  /** Id of the scheme the engineer prefers (one of `schemes`); the report's summary lists it. */
  readonly preferredSchemeId?: string;
}

/** A continuous member: a beam of several spans with its supports (core/continuous/definition.ts). */
export type ContinuousMemberDefinition = ContinuousBeamDefinition;

export interface ProjectInfo {
  readonly name: string;
  readonly number: string;
  /** Client-neutral description of the job. */
  readonly description: string;
  readonly engineer: string;
  readonly checker: string;
  readonly revision: string;
  /** ISO date, yyyy-mm-dd. */
  readonly date: string;
  readonly codeBasis: CodeBasis;
  readonly unitSystem: UnitSystem;
}

export interface AnalysisSettings extends CombinationSettings {
  /** Fraction of the post-yield peak moment below which a section's curve ends (default 0.8). */
  readonly momentDropFraction: number;
  readonly bilinearMethod: BilinearMethod;
  /** Number of equal integration segments along a span (default 60); zone boundaries, load positions and the control point are added as stations, and service deflections refine the count until it no longer matters (core/member/service.ts). */
  readonly stations: number;
  /**
   * Where the ultimate strain εcu of unconfined concrete comes from for every concrete that does not
   * say (ConcreteSpec.ultimateStrain, crushingStrain): the code basis's value or the law's own
   * (core/materials/specs.ts ULTIMATE_STRAIN_CHOICES). Absent: `code`.
   */
  readonly concreteUltimateStrain?: UltimateStrainChoice;
}

export interface Project {
  readonly format: typeof PROJECT_FORMAT;
  readonly version: typeof PROJECT_VERSION;
  readonly info: ProjectInfo;
  readonly materials: readonly MaterialSpec[];
  readonly sections: readonly SectionDefinition[];
  readonly members: readonly MemberDefinition[];
  /** Continuous beams (version 3): spans, cantilevers, supports; absent or empty in older files. */
  readonly continuousMembers?: readonly ContinuousMemberDefinition[];
  readonly settings: AnalysisSettings;
}

export const DEFAULT_SETTINGS: AnalysisSettings = {
  momentDropFraction: 0.8,
  bilinearMethod: 'priestley-2007',
  stations: 60,
  concreteUltimateStrain: DEFAULT_ULTIMATE_STRAIN_CHOICE,
};
