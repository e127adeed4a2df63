/**
 * Older project files brought up to the current format, one version step at a time.
 *
 * Version 1 (Hingeline 0.x, documented in docs/project-format.md, "Version 1") differed from
 * version 2 in these ways:
 *  - project information sat under `project` (not `info`), with `code` for the code basis and
 *    `units` for the display unit system, and had no `description`;
 *  - sections called their hoops `stirrups`;
 *  - members were called `beams`: `mark` (not `name`), `support` with short names (`simple`,
 *    `cantilever`, `fixed`, `propped`), the span in metres (`spanM`), either one `sectionId` for the
 *    whole span or `segments` with `fromM`/`toM` in metres, and one flat `loads` object per beam
 *    (`deadKNm`, `superimposedKNm`, `liveKNm` in kN/m over the whole span, and `points` with `kN` at
 *    `atM` metres); `selfWeight`, `factors`, `deflection` {limits, sustainedLive, months,
 *    customRatio, shrinkage}, `hinge` {method, lengthMm} and `pattern` held the member settings;
 *  - analysis settings had no `bilinearMethod` (version 1 always used Priestley et al. 2007).
 *
 * A migration never throws and never drops a field: values it does not recognise are carried over
 * unchanged (unknown fields keep riding along, wrong types are left for validation to report at
 * their version-2 path). Pure functions on plain data.
 */
import type { Diagnostic } from '../diagnostics.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from './types.ts';

/** The oldest version this program reads. */
export const OLDEST_READABLE_VERSION = 1;

type Data = Record<string, unknown>;

const isObject = (v: unknown): v is Data => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Copies `source` without `taken` keys (what is left over rides along unchanged). */
function rest(source: Data, taken: readonly string[]): Data {
  const out: Data = {};
  for (const [key, value] of Object.entries(source)) if (!taken.includes(key)) out[key] = value;
  return out;
}

/** Metres → mm when a number; anything else passes through for validation to report. */
const metres = (v: unknown): unknown => (typeof v === 'number' ? v * 1000 : v);
/** kN → N when a number. */
const kiloNewtons = (v: unknown): unknown => (typeof v === 'number' ? v * 1000 : v);
/** Sets `key` only when the value is present (keeps optional fields absent). */
function put(target: Data, key: string, value: unknown): void {
  if (value !== undefined) target[key] = value;
}

const SUPPORT_NAMES_V1: Readonly<Record<string, string>> = {
  simple: 'simply-supported',
  cantilever: 'cantilever',
  fixed: 'fixed-fixed',
  propped: 'propped-cantilever',
};

function infoFromV1(project: unknown): unknown {
  if (!isObject(project)) return project;
  const info: Data = {
    name: project.name,
    number: project.number,
    description: project.description ?? '',
    engineer: project.engineer,
    checker: project.checker,
    revision: project.revision,
    date: project.date,
    codeBasis: project.code,
    unitSystem: project.units,
  };
  for (const key of Object.keys(info)) if (info[key] === undefined) delete info[key];
  return { ...info, ...rest(project, ['name', 'number', 'description', 'engineer', 'checker', 'revision', 'date', 'code', 'units']) };
}

function sectionFromV1(section: unknown): unknown {
  if (!isObject(section) || !('stirrups' in section)) return section;
  const out: Data = {};
  for (const [key, value] of Object.entries(section)) out[key === 'stirrups' ? 'hoops' : key] = value;
  return out;
}

function zonesFromV1(beam: Data): unknown {
  if (Array.isArray(beam.segments)) {
    return beam.segments.map((s: unknown) => {
      if (!isObject(s)) return s;
      const zone: Data = {};
      put(zone, 'from', metres(s.fromM));
      put(zone, 'to', metres(s.toM));
      put(zone, 'sectionId', s.sectionId);
      return { ...zone, ...rest(s, ['fromM', 'toM', 'sectionId']) };
    });
  }
  if (beam.segments !== undefined) return beam.segments;
  if (typeof beam.sectionId === 'string') return [{ from: 0, to: metres(beam.spanM), sectionId: beam.sectionId }];
  return [];
}

function loadsFromV1(loads: unknown): unknown {
  if (loads === undefined) return [];
  if (!isObject(loads)) return loads;
  const out: unknown[] = [];
  const uniform = [['deadKNm', 'dead'], ['superimposedKNm', 'superimposed'], ['liveKNm', 'live']] as const;
  // kN/m equals N/mm, the version-2 unit of line loads: the number carries over unchanged.
  for (const [key, loadCase] of uniform) if (loads[key] !== undefined) out.push({ kind: 'uniform', loadCase, magnitude: loads[key] });
  if (Array.isArray(loads.points)) {
    for (const p of loads.points as unknown[]) {
      if (!isObject(p)) {
        out.push(p);
        continue;
      }
      const load: Data = { kind: 'point' };
      put(load, 'loadCase', p.case);
      put(load, 'magnitude', kiloNewtons(p.kN));
      put(load, 'position', metres(p.atM));
      put(load, 'label', p.label);
      out.push({ ...load, ...rest(p, ['case', 'kN', 'atM', 'label']) });
    }
  } else if (loads.points !== undefined) {
    out.push(loads.points);
  }
  return out;
}

/** Fields of the old flat loads object that version 1 did not define either (kept, and reported as unknown). */
function unknownLoadFields(loads: unknown): Data | undefined {
  if (!isObject(loads)) return undefined;
  const extra = rest(loads, ['deadKNm', 'superimposedKNm', 'liveKNm', 'points']);
  return Object.keys(extra).length > 0 ? extra : undefined;
}

function memberFromV1(beam: unknown): unknown {
  if (!isObject(beam)) return beam;
  const member: Data = {};
  put(member, 'id', beam.id);
  put(member, 'name', beam.mark);
  put(member, 'supports', typeof beam.support === 'string' ? (SUPPORT_NAMES_V1[beam.support] ?? beam.support) : beam.support);
  put(member, 'span', metres(beam.spanM));
  member.zones = zonesFromV1(beam);
  member.loads = loadsFromV1(beam.loads);
  put(member, 'includeSelfWeight', beam.selfWeight);
  put(member, 'strengthFactors', beam.factors);
  const deflection = beam.deflection;
  if (isObject(deflection)) {
    const service: Data = {};
    put(service, 'sustainedLiveFraction', deflection.sustainedLive);
    put(service, 'durationMonths', deflection.months);
    put(service, 'limitCases', deflection.limits);
    put(service, 'customLimitRatio', deflection.customRatio);
    put(service, 'includeShrinkage', deflection.shrinkage);
    member.service = { ...service, ...rest(deflection, ['sustainedLive', 'months', 'limits', 'customRatio', 'shrinkage']) };
  } else {
    put(member, 'service', deflection);
  }
  const hinge = beam.hinge;
  const capacity: Data = {};
  put(capacity, 'pattern', beam.pattern ?? 'proportional');
  if (isObject(hinge)) {
    put(capacity, 'hingeLengthMethod', hinge.method);
    put(capacity, 'userHingeLength', hinge.lengthMm);
    Object.assign(capacity, rest(hinge, ['method', 'lengthMm']));
  } else {
    put(capacity, 'hingeLengthMethod', hinge);
  }
  member.capacity = capacity;
  put(member, 'notes', beam.notes);
  // Unknown keys of the old flat loads object have no place in a list of loads: keep them beside it,
  // where validation reports them as unknown fields instead of losing them.
  put(member, 'version1Loads', unknownLoadFields(beam.loads));
  const taken = ['id', 'mark', 'support', 'spanM', 'sectionId', 'segments', 'loads', 'selfWeight', 'factors', 'deflection', 'hinge', 'pattern', 'notes'];
  return { ...member, ...rest(beam, taken) };
}

/** Version 1 → version 2 (see the file comment for what changed). */
export function migrateV1ToV2(data: Data): Data {
  const out: Data = { format: data.format, version: 2 };
  put(out, 'info', infoFromV1(data.project));
  put(out, 'materials', data.materials);
  put(out, 'sections', Array.isArray(data.sections) ? data.sections.map(sectionFromV1) : data.sections);
  put(out, 'members', Array.isArray(data.beams) ? data.beams.map(memberFromV1) : data.beams);
  const settings = data.settings;
  put(out, 'settings', isObject(settings) ? { bilinearMethod: 'priestley-2007', ...settings } : settings);
  return { ...out, ...rest(data, ['format', 'version', 'project', 'materials', 'sections', 'beams', 'settings']) };
}

/**
 * Version 2 → version 3: version 3 adds `continuousMembers` (beams of several spans). A version-2
 * file has none; its members are read exactly as before, so their results do not change.
 */
function migrateV2ToV3(data: Data): Data {
  return { ...data, version: 3 };
}

/** Steps from version n to n + 1, indexed by n. */
const STEPS: Readonly<Record<number, (data: Data) => Data>> = {
  1: migrateV1ToV2,
  2: migrateV2ToV3,
};

export interface MigrationResult {
  /** The data in the current version, or null when it cannot be read (see diagnostics). */
  readonly data: Data | null;
  /** The version the file was written in (null when unknown). */
  readonly fromVersion: number | null;
  readonly diagnostics: readonly Diagnostic[];
}

/**
 * Checks the `format` and `version` of parsed JSON and migrates older versions to PROJECT_VERSION.
 * A migrated file gets a warning saying so (saving writes the current version). Never throws.
 */
export function migrateProject(raw: unknown): MigrationResult {
  const fail = (d: Diagnostic, fromVersion: number | null = null): MigrationResult => ({ data: null, fromVersion, diagnostics: [d] });
  if (!isObject(raw)) {
    return fail({ code: 'schema', path: '(file)', severity: 'error', message: `must be a JSON object holding a Hingeline project, got ${Array.isArray(raw) ? 'a list' : raw === null ? 'null' : `a ${typeof raw}`}` });
  }
  if (raw.format !== PROJECT_FORMAT) {
    return fail({ code: 'schema', path: 'format', severity: 'error', message: `must be "${PROJECT_FORMAT}": this is not a Hingeline project file (got ${raw.format === undefined ? 'no format field' : JSON.stringify(raw.format)})` });
  }
  const version = raw.version;
  if (typeof version !== 'number' || !Number.isInteger(version)) {
    return fail({ code: 'unsupported-version', path: 'version', severity: 'error', message: `must be a whole version number (${OLDEST_READABLE_VERSION} to ${PROJECT_VERSION}), got ${version === undefined ? 'nothing' : JSON.stringify(version)}` });
  }
  if (version > PROJECT_VERSION) {
    return fail({ code: 'unsupported-version', path: 'version', severity: 'error', message: `the file was written in version ${version} of the format by a newer Hingeline; this one reads versions ${OLDEST_READABLE_VERSION} to ${PROJECT_VERSION}. Open it with a newer Hingeline.` }, version);
  }
  if (version < OLDEST_READABLE_VERSION) {
    return fail({ code: 'unsupported-version', path: 'version', severity: 'error', message: `must be ${OLDEST_READABLE_VERSION} to ${PROJECT_VERSION}, got ${version}` }, version);
  }
  let data: Data = raw;
  for (let v = version; v < PROJECT_VERSION; v++) data = STEPS[v]!(data);
  const diagnostics: Diagnostic[] = version < PROJECT_VERSION
    ? [{ code: 'unsupported-version', path: 'version', severity: 'warning', message: `the file is in version ${version} of the format and was brought up to version ${PROJECT_VERSION}; saving writes version ${PROJECT_VERSION}` }]
    : [];
  return { data, fromVersion: version, diagnostics };
}
