import { describe, expect, it } from 'vitest';
import { citationMarker, classifyReference, hingeLengthReference, ReferenceList } from '../../../core/report/references.ts';
import { EN1992_REFERENCE } from '../../../core/materials/concrete/en1992-nonlinear.ts';

describe('reference list', () => {
  it('cites a standard once, keeping each clause it was cited for', () => {
    const c = classifyReference('ACI 318-19 20.2.2.1');
    expect(c.citation.key).toBe('ACI 318-19');
    expect(c.citation.citation).toMatch(/^ACI Committee 318 \(2019\)\. Building Code Requirements for Structural Concrete/);
    expect(c.clause).toBe('20.2.2.1');
    expect(classifyReference('EN 1992-1-1:2004 3.2.7(2) and Figure 3.8')).toMatchObject({ citation: { key: 'EN 1992-1-1' }, clause: '3.2.7(2) and Figure 3.8' });
    expect(classifyReference(EN1992_REFERENCE)).toMatchObject({ citation: { key: 'EN 1992-1-1', citation: EN1992_REFERENCE }, clause: null });
    const paper = 'Hognestad, E. (1951). A study of combined bending and axial load in reinforced concrete members.';
    expect(classifyReference(paper)).toEqual({ citation: { key: paper, citation: paper }, clause: null });
  });

  it('numbers sources in order of first citation and records where each is cited', () => {
    const list = new ReferenceList();
    expect(list.cite('Park, R. (1988). Ductility evaluation.', 'method')).toBe(1);
    expect(list.cite('ACI 318-19 24.2.3.5', 'member B-1', 'effective moment of inertia')).toBe(2);
    expect(list.cite('ACI 318-19 Table 21.2.2', 'member B-2')).toBe(2);
    expect(list.citeAll(['ACI 318-19 22.2.2.1', 'Park, R. (1988). Ductility evaluation.'], 'section S-1')).toEqual([1, 2]);
    const entries = list.list();
    expect(entries).toHaveLength(2);
    expect(entries[1]).toMatchObject({ number: 2, notes: ['24.2.3.5', 'effective moment of inertia', 'Table 21.2.2', '22.2.2.1'], usedIn: ['member B-1', 'member B-2', 'section S-1'] });
  });

  it('writes citation markers with ranges', () => {
    expect(citationMarker([3, 1, 2, 2, 7, 9, 10])).toBe('[1–3, 7, 9, 10]');
    expect(citationMarker([4])).toBe('[4]');
    expect(citationMarker([])).toBe('');
  });

  it('has a publication for every hinge-length expression except the engineer’s own value', () => {
    expect(hingeLengthReference('priestley-2007')).toMatch(/Priestley, M\. J\. N\., Calvi, G\. M\. & Kowalsky, M\. J\. \(2007\)/);
    expect(hingeLengthReference('paulay-priestley-1992')).toMatch(/Paulay, T\. & Priestley/);
    expect(hingeLengthReference('mattock-1967')).toMatch(/Mattock, A\. H\. \(1967\)/);
    expect(hingeLengthReference('corley-1966')).toMatch(/Corley, W\. G\. \(1966\)/);
    expect(hingeLengthReference('user')).toBeNull();
  });
});
