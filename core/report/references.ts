/**
 * The report's reference list: every standard and publication an analysis used, numbered in order
 * of first citation. Sources come from the material laws (`references` of each law) and from the
 * methods the member analysis applied (hinge length, idealisation, code deflection, strength).
 * A clause reference such as `ACI 318-19 20.2.2.1` cites the standard; the clause is kept as a note.
 */
import { EN1992_REFERENCE } from '../materials/concrete/en1992-nonlinear.ts';
import { ACI_440_REFERENCE } from '../materials/frp/linear-frp.ts';
import type { HingeLengthMethod } from '../member/definition.ts';

export interface Citation {
  /** Stable key (a standard's designation or the citation text). */
  readonly key: string;
  readonly citation: string;
}

/** Standards recognised by their designation at the start of a reference string. */
const STANDARDS: readonly { readonly designation: RegExp; readonly key: string; readonly citation: string }[] = [
  // Citations of standards are written from memory of their title pages.
  { designation: /^ACI 318-19\b/, key: 'ACI 318-19', citation: 'ACI Committee 318 (2019). Building Code Requirements for Structural Concrete (ACI 318-19) and Commentary (ACI 318R-19). American Concrete Institute, Farmington Hills, MI.' },
  { designation: /^ACI 318-14\b/, key: 'ACI 318-14', citation: 'ACI Committee 318 (2014). Building Code Requirements for Structural Concrete (ACI 318-14) and Commentary (ACI 318R-14). American Concrete Institute, Farmington Hills, MI.' },
  { designation: /^EN 1992-1-1(:2004)?\b/, key: 'EN 1992-1-1', citation: EN1992_REFERENCE },
  { designation: /^EN 1998-3(:2005)?\b/, key: 'EN 1998-3', citation: 'EN 1998-3:2005 Eurocode 8 — Design of structures for earthquake resistance — Part 3: Assessment and retrofitting of buildings. CEN, Brussels.' },
  { designation: /^EN 1990(:2002)?\b/, key: 'EN 1990', citation: 'EN 1990:2002 Eurocode — Basis of structural design. CEN, Brussels.' },
  { designation: /^ACI 440\.2R(-17)?\b/, key: 'ACI 440.2R-17', citation: ACI_440_REFERENCE },
];

/** Publications of the member methods (citations from memory; the code comments give the same sources). */
export const METHOD_REFERENCES = {
  priestley2007: 'Priestley, M. J. N., Calvi, G. M. & Kowalsky, M. J. (2007). Displacement-Based Seismic Design of Structures. IUSS Press, Pavia.',
  paulayPriestley1992: 'Paulay, T. & Priestley, M. J. N. (1992). Seismic Design of Reinforced Concrete and Masonry Buildings. Wiley, New York.',
  mattock1967: 'Mattock, A. H. (1967). Discussion of "Rotational capacity of hinging regions in reinforced concrete beams" by W. G. Corley. Journal of the Structural Division, ASCE 93(ST2), 519–522.',
  corley1966: 'Corley, W. G. (1966). Rotational capacity of reinforced concrete beams. Journal of the Structural Division, ASCE 92(ST5), 121–146.',
  park1988: 'Park, R. (1988). Ductility evaluation from laboratory and analytical testing. Proceedings of the 9th World Conference on Earthquake Engineering, Tokyo–Kyoto, Vol. VIII, 605–616.',
  bischoff2005: 'Bischoff, P. H. (2005). Reevaluation of deflection prediction for concrete beams reinforced with steel and fiber reinforced polymer bars. Journal of Structural Engineering, ASCE 131(5), 752–767.',
  scottFenves2006: 'Scott, M. H. & Fenves, G. L. (2006). Plastic hinge integration methods for force-based beam–column elements. Journal of Structural Engineering, ASCE 132(2), 244–252.',
  colemanSpacone2001: 'Coleman, J. & Spacone, E. (2001). Localization issues in force-based frame elements. Journal of Structural Engineering, ASCE 127(11), 1257–1265.',
  branson1965: 'Branson, D. E. (1965). Instantaneous and time-dependent deflections of simple and continuous reinforced concrete beams. HPR Report No. 7, Part 1, Alabama Highway Department, Bureau of Public Roads.',
} as const;

/** Publication of each hinge-length expression (none for a value given by the engineer). */
export function hingeLengthReference(method: HingeLengthMethod): string | null {
  switch (method) {
    case 'priestley-2007':
      return METHOD_REFERENCES.priestley2007;
    case 'paulay-priestley-1992':
      return METHOD_REFERENCES.paulayPriestley1992;
    case 'mattock-1967':
      return METHOD_REFERENCES.mattock1967;
    case 'corley-1966':
      return METHOD_REFERENCES.corley1966;
    case 'user':
      return null;
  }
}

/** Splits a reference string into the cited document and the clause it points at (if any). */
export function classifyReference(reference: string): { citation: Citation; clause: string | null } {
  const text = reference.trim();
  for (const standard of STANDARDS) {
    const match = standard.designation.exec(text);
    if (!match) continue;
    if (text === standard.citation) return { citation: { key: standard.key, citation: standard.citation }, clause: null };
    const rest = text.slice(match[0].length).trim();
    return { citation: { key: standard.key, citation: standard.citation }, clause: rest === '' ? null : rest };
  }
  return { citation: { key: text, citation: text }, clause: null };
}

export interface ReferenceEntry extends Citation {
  readonly number: number;
  /** Clauses and purposes it was cited for, in order of first mention. */
  readonly notes: readonly string[];
  /** Chapters that cite it, e.g. `member B-1`, `section S-2`, `method`. */
  readonly usedIn: readonly string[];
}

/** Numbered reference list, built while the document is written. */
export class ReferenceList {
  private readonly entries = new Map<string, { number: number; citation: string; notes: string[]; usedIn: string[] }>();

  /**
   * Cites a source (a full citation or a clause reference) from the chapter `usedIn` (e.g.
   * `member B-1`), optionally noting what it is cited for; returns its number in the list.
   */
  cite(reference: string, usedIn: string, note?: string): number {
    const { citation, clause } = classifyReference(reference);
    let entry = this.entries.get(citation.key);
    if (!entry) {
      entry = { number: this.entries.size + 1, citation: citation.citation, notes: [], usedIn: [] };
      this.entries.set(citation.key, entry);
    }
    for (const n of [clause, note]) if (n && !entry.notes.includes(n)) entry.notes.push(n);
    if (!entry.usedIn.includes(usedIn)) entry.usedIn.push(usedIn);
    return entry.number;
  }

  /** Cites several sources; returns their numbers, sorted and without repeats. */
  citeAll(references: readonly string[], usedIn: string, note?: string): number[] {
    return [...new Set(references.map((r) => this.cite(r, usedIn, note)))].sort((a, b) => a - b);
  }

  /** Every entry, by number. */
  list(): ReferenceEntry[] {
    return [...this.entries.entries()].map(([key, e]) => ({ key, number: e.number, citation: e.citation, notes: [...e.notes], usedIn: [...e.usedIn] })).sort((a, b) => a.number - b.number);
  }
}

/** `[1, 3–5]` style marker for a set of reference numbers (empty string for none). */
export function citationMarker(numbers: readonly number[]): string {
  const sorted = [...new Set(numbers)].sort((a, b) => a - b);
  if (sorted.length === 0) return '';
  const parts: string[] = [];
  let start = sorted[0]!;
  let previous = start;
  for (const n of [...sorted.slice(1), Number.NaN]) {
    if (n === previous + 1) {
      previous = n;
      continue;
    }
    parts.push(previous === start ? `${start}` : previous === start + 1 ? `${start}, ${previous}` : `${start}–${previous}`);
    start = n;
    previous = n;
  }
  return `[${parts.join(', ')}]`;
}
