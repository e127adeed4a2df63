/**
 * Sentences keep their quantities as data (core/units/phrase.ts) and are said in the units of the
 * moment: switching a project from US customary to SI changes every sentence of its results, with
 * no new analysis. Conversion factors are exact (NIST SP 811: 1 ft = 0.3048 m, 1 lbf = 4.448 222 N).
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { demoProject } from '../../../core/project/demo.ts';
import { bySystem, capitalised, isQuantityOrChoice, joinTexts, lowerFirst, mapWords, phrase, q, say, uniqueTexts, withoutFinalStop, type Phrase, type Text } from '../../../core/units/phrase.ts';

describe('phrases', () => {
  it('say their quantities in the system asked for, in the engineering format of the app', () => {
    const t = phrase`demand ${q('moment', 192e6)} at ${q('spanLength', 2000)}`;
    // 192 kN·m = 141.6 kip·ft (1 kip·ft = 1.355 818 kN·m); 2 m = 6.562 ft
    expect(say(t, 'si')).toBe('demand 192.0 kN·m at 2.00 m');
    expect(say(t, 'US')).toBe('demand 141.6 kip·ft at 6.56 ft');
  });

  it('print compact values for input messages and fixed decimals when asked', () => {
    expect(say(phrase`${q('sectionLength', 600, { compact: true })}`, 'us')).toBe('23.62 in');
    expect(say(phrase`${q('sectionLength', 600, { decimals: 0 })}`, 'si')).toBe('600 mm');
  });

  it('choose words by system (a formula in its SI or in.-lb. form)', () => {
    const t: Text = [bySystem('0.022·fy·db (MPa, mm)', '0.15·fy·db (ksi, in)')];
    expect(say(t, 'si')).toBe('0.022·fy·db (MPa, mm)');
    expect(say(t, 'us')).toBe('0.15·fy·db (ksi, in)');
  });

  it('stay plain words when they hold no quantity, so a list of texts never looks like a phrase', () => {
    expect(phrase`no ${'quantity'} here`).toBe('no quantity here');
    expect(joinTexts(['a', 'b'], '; ')).toBe('a; b');
    expect(isQuantityOrChoice({ quantity: 'immediate deflection', ratio: 360 })).toBe(false);
    expect(isQuantityOrChoice(q('force', 1))).toBe(true);
  });

  it('join, capitalise, lose their full stop, rename words and drop repeats without touching quantities', () => {
    const t = phrase`shear at ${q('spanLength', 1000)}.`;
    expect(say(capitalised(t), 'si')).toBe('Shear at 1.000 m.');
    expect(say(lowerFirst(capitalised(t)), 'si')).toBe('shear at 1.000 m.');
    expect(say(withoutFinalStop(t), 'si')).toBe('shear at 1.000 m');
    expect(say(mapWords(phrase`members[2] at ${q('spanLength', 1000)}`, (w) => w.replace('[2]', '[7]')), 'si')).toBe('members[7] at 1.000 m');
    expect(uniqueTexts([t, phrase`shear at ${q('spanLength', 1000)}.`, 'x'])).toHaveLength(2);
  });
});

/** Every sentence of a result (texts under the keys that hold words), with where it is. */
function sentences(value: unknown, path = '', out: { path: string; text: Text }[] = []): { path: string; text: Text }[] {
  if (Array.isArray(value)) {
    if (value.some(isQuantityOrChoice)) out.push({ path, text: value as Phrase });
    else value.forEach((v, i) => sentences(v, `${path}[${i}]`, out));
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) sentences(v, `${path}.${k}`, out);
  } else if (typeof value === 'string') {
    out.push({ path, text: value });
  }
  return out;
}

describe('switching the unit system of the demo project', () => {
  const results = analyzeProject(demoProject());
  const all = results.members.flatMap((m) => sentences(m, m.memberId));
  const phrases = all.filter((s) => typeof s.text !== 'string');

  it('changes every sentence that holds a quantity', () => {
    expect(phrases.length).toBeGreaterThan(100);
    const same = phrases.filter((s) => say(s.text, 'us') === say(s.text, 'si')).map((s) => `${s.path}: ${say(s.text, 'si')}`);
    expect(same).toEqual([]);
  });

  it('says the governing mode, the strength notes and the hinge-length formulas in the units of the moment', () => {
    const b = results.members.find((m) => m.ductility.hinges.length > 0 && m.strength)!;
    const formula = b.ductility.hinges[0]!.lengthFormula;
    expect(say(formula, 'us')).toMatch(/ in \(/);
    expect(say(formula, 'us')).not.toMatch(/\bmm\b/);
    expect(say(formula, 'si')).toMatch(/ mm \(/);
    expect(say(b.strength!.notes, 'us')).toMatch(/kip·ft/);
    expect(say(b.strength!.notes, 'si')).toMatch(/kN·m/);
    const withShear = results.members.find((m) => m.shear?.mechanism)!;
    expect(say(withShear.governingMode, 'us')).toMatch(/kip/);
    expect(say(withShear.governingMode, 'si')).toMatch(/kN/);
    expect(say(withShear.governingMode, 'si')).not.toMatch(/kip/);
  });

  it('leaves no plain-word sentence with an SI quantity in a US project (every quantity is data)', () => {
    // An SI number with its unit in plain words would not follow a switch of units.
    const si = /\d\s?(mm|kN|kN·m|MPa|m)\b(?!²)/;
    const plain = all.filter((s) => typeof s.text === 'string' && si.test(s.text) && !/\.(name|label|sectionName|memberName|definition|notes|note)\b/.test(s.path));
    expect(plain.map((s) => `${s.path}: ${String(s.text).slice(0, 120)}`)).toEqual([]);
  });

  it('says every sentence of every member without an object printed as text', () => {
    const garbled = all.filter((s) => /\[object |undefined|NaN/.test(say(s.text, 'us')) || /\[object |undefined|NaN/.test(say(s.text, 'si')));
    expect(garbled.map((s) => s.path)).toEqual([]);
  });
});
