/**
 * The method statement in plain words: a chapter that describes, once, how sections and members
 * are analysed, and a short statement per member naming the models its analysis used. Every
 * published model is cited by its number in the reference list.
 */
import type { HingeLengthMethod } from '../member/definition.ts';
import type { Project } from '../project/types.ts';
import type { WriteContext } from './context.ts';
import { pageOf } from './context.ts';
import type { MemberPlan } from './figures.ts';
import { CAUTION_TEXT, bullets, cautionBox, h2, heading, keepTogether, STYLES } from './layout.ts';
import { materialLines, tensionStiffeningZones } from './materials.ts';
import { materialMethodParagraphs } from './method-materials.ts';
import { citationMarker, hingeLengthReference, METHOD_REFERENCES } from './references.ts';
import type { Content } from './types.ts';

export const HINGE_WORDS: Readonly<Record<HingeLengthMethod, string>> = {
  'priestley-2007': 'Priestley, Calvi & Kowalsky (2007)',
  'paulay-priestley-1992': 'Paulay & Priestley (1992)',
  'mattock-1967': 'Mattock (1967)',
  'corley-1966': 'Corley (1966)',
  user: 'value given by the engineer',
};

/** General limitations of the analysis (the first depends on whether shear was checked). */
export function limitations(shearChecked: boolean): string[] {
  return [
    shearChecked
      ? 'Flexure and shear only: torsion, bond and anchorage, lap splices, buckling of compression bars and lateral stability are not checked.'
      : 'Flexure only: shear, torsion, bond and anchorage, lap splices, buckling of compression bars and lateral stability are not checked.',
    ...LIMITATIONS.slice(1),
  ];
}

/** General limitations of the analysis, for a report without shear checks. */
export const LIMITATIONS: readonly string[] = [
  'Flexure only: shear, torsion, bond and anchorage, lap splices, buckling of compression bars and lateral stability are not checked.',
  'Plane sections remain plane and the reinforcement is perfectly bonded; bending is about the horizontal axis only, with a constant axial force.',
  'Loading is static and monotonic: no load reversal, cyclic or dynamic effects, and no fatigue.',
  'The strength check takes moments from an elastic analysis with gross stiffness and no redistribution; it is not a complete code design.',
  'Long-term behaviour depends on the creep coefficient and shrinkage strain given for each concrete; plastic hinge length expressions are empirical and scatter widely.',
];

export const METHOD_ANCHOR = 'method';

/** The Method chapter: how every reported analysis was made, with the general limitations. */
export function methodChapter(ctx: WriteContext): Content[] {
  const { project, refs, f } = ctx;
  const used = 'method';
  const cite = (reference: string, note?: string) => citationMarker([refs.cite(reference, used, note)]);
  const aci = project.info.codeBasis === 'ACI 318-19';
  const paragraphs: { title: string; text: string }[] = [
    {
      title: 'Sections',
      text: `Each cross-section is analysed once for its moment–curvature relation under increasing curvature, in each bending direction that has tension reinforcement, assuming that plane sections remain plane and that the reinforcement is perfectly bonded to the concrete. The concrete is divided into depth strips that follow the outline; stresses from the stress–strain laws of the materials (listed with their sources in each section's chapter) are integrated over the depth, with the integration split wherever a law changes branch. At each curvature the depth of the neutral axis follows from equilibrium with the axial force. Cracking, first yield of the reinforcement, the code crushing strain of the concrete (${aci ? `0.003 ${cite('ACI 318-19 22.2.2.1', 'crushing strain 0.003')}` : `εcu2 ${cite('EN 1992-1-1 Table 3.1', 'strain limits εcu2, εc1, εcu1')}`}), the nominal point (εc = 0.004 or εs = 0.015, whichever comes first), the peak moment and ultimate are located exactly between curvature steps. Ultimate is the first of: crushing of the concrete that governs (the confined core where the hoops confine it, the cover spalling), rupture of the reinforcement, or the moment falling below ${f.fixed(project.settings.momentDropFraction * 100, 0)} % of its post-yield peak.`,
    },
    ...materialMethodParagraphs(project, cite),
    {
      title: 'Idealisation',
      text: project.settings.bilinearMethod === 'priestley-2007'
        ? `Each curve is idealised as bilinear: an elastic branch through first yield M′y extended to the moment at the limit strains εc = 0.004 or εs = 0.015 gives the nominal yield point of the idealisation (φy, My; My is not the code's Mn, and not first yield) ${cite(METHOD_REFERENCES.priestley2007, 'bilinear idealisation of moment–curvature')}. The curvature ductility is μφ = φu/φy.`
        : 'Each curve is idealised as bilinear: an elastic branch through first yield, with the yield point chosen so that the bilinear curve encloses the same area as the computed curve up to ultimate (equal-energy rule, common practice). The curvature ductility is μφ = φu/φy.',
    },
    {
      title: 'Members',
      text: `A member is loaded by its load–deflection pattern (all service loads together, or the live load with the dead load held) increased in steps of the load factor λ. At each load level the bending moments follow from equilibrium and, for a statically indeterminate member, from compatibility with its current nonlinear flexibility, so that moments redistribute as sections crack and yield. The whole moment–curvature relation up to the top of its curve — cracking, tension stiffening, yield and strain hardening — is integrated along the member at ${project.settings.stations} or more stations (at least 120 for the load–deflection curve), so plasticity spreads wherever the moment exceeds first yield: a zone of nearly constant moment yields throughout. A section that unloads keeps its plastic curvature and unloads along its yield secant. Only the softening part beyond the top of a section's curve is localised, over the equivalent plastic hinge length Lp of the expression chosen for the member, which keeps the results independent of the number of stations ${cite(METHOD_REFERENCES.colemanSpacone2001, 'localisation of softening sections')} ${cite(METHOD_REFERENCES.scottFenves2006, 'plastic hinge integration')}; in a zone of equal moment the hinge sits at its middle (common practice). The steel feels the moment shifted by a_l = z(cot θ − cot α)/2 with θ = 45° and vertical links ${cite('EN 1992-1-1 9.2.1.3(2)', 'tension shift a_l')}, and at a restrained support face the bars' strain penetration adds a rotation Lsp·φ with Lsp = 0.13·db·fy/√fc ${cite('EN 1998-3 Eq. (A.10a)', 'bond-slip term of the yield chord rotation')} unless chosen otherwise. Shear deformation adds to the deflections a cracked shear flexibility fitted so that the shear span Lv of the first section to yield rotates by 0.0013(1 + 1.5h/Lv) when it yields ${cite('EN 1998-3 Eq. (A.10a)', 'shear term of the yield chord rotation')} (it does not change the redundant moments). Two ultimates are reported: the code ultimate, where a section first reaches the code's crushing strain, and the best-estimate member ultimate, where the load on the descending branch has fallen to 80 % of the peak or a section reaches the end of its curve (bar rupture, crushing at the law's ultimate strain), whichever comes first ${cite(METHOD_REFERENCES.park1988, 'ultimate at 80 % of the peak load')}. The displacement ductility is μΔ = Δu/Δy, with Δy the nominal yield deflection on the secant through the point at 75 % of the peak load ${cite(METHOD_REFERENCES.park1988, 'nominal yield deflection')}; where that point lies below the cracking load (lightly reinforced members), or where the tension steel of a simply supported beam or cantilever yields below 75 % of the peak (the secant there would include plastic deformation), the secant through first yield of the tension steel is used instead ${cite(METHOD_REFERENCES.priestley2007, 'nominal yield from first yield')}, and a μΔ above 10 is flagged as outside the range the definitions are meant for.`,
    },
    {
      title: 'Service deflections',
      text: aci
        ? `Service deflections are computed in two ways and compared: (a) by integrating the curvatures of the moment–curvature relations along the span, short term and under sustained load, with creep through the effective modulus Ec/(1 + φ) ${cite('EN 1992-1-1 Eq. (7.20)', 'effective modulus for creep')} and shrinkage in the concrete law; (b) by the code method, the effective moment of inertia of ACI 318-19 24.2.3.5 ${cite('ACI 318-19 24.2.3.5', 'effective moment of inertia Ie')} (Bischoff's expression ${cite(METHOD_REFERENCES.bischoff2005, 'effective moment of inertia')}), one Ie for the member with each zone's own Ec, and the long-term multiplier λΔ = ξ/(1 + 50ρ′) of 24.2.4.1 ${cite('ACI 318-19 24.2.4.1', 'long-term multiplier λΔ')}; Branson's Ie of ACI 318-14 ${cite('ACI 318-14 24.2.3.5', 'Branson effective moment of inertia, for comparison')} ${cite(METHOD_REFERENCES.branson1965, 'effective moment of inertia (legacy)')} is shown for comparison. Each limit check uses the larger of the two values, against the limits of Table 24.2.2 ${cite('ACI 318-19 Table 24.2.2', 'deflection limits')} chosen for the member.`
        : `Service deflections are computed in two ways and compared: (a) by integrating the curvatures of the moment–curvature relations along the span, short term and under sustained load with creep and shrinkage in the concrete law; (b) by the code method of EN 1992-1-1 7.4.3 ${cite('EN 1992-1-1 7.4.3', 'deflection by curvature interpolation')}: curvatures interpolated between the uncracked and cracked states with ζ (Eq. 7.19), the effective modulus Ec,eff = Ecm/(1 + φ) (Eq. 7.20) and the shrinkage curvature (Eq. 7.21). Each limit check uses the larger of the two values, against the limits of 7.4.1 ${cite('EN 1992-1-1 7.4.1', 'deflection limits')} chosen for the member.`,
    },
    {
      title: 'Flexural strength',
      text: aci
        ? `The strength check compares, at every station of the span, at both sides of every zone boundary, at every point load and at every point of zero shear, in both bending senses and for every load combination, the factored moment of an elastic analysis with gross stiffness (no redistribution) with the design strength φMn of the section there; the largest ratio governs and its position, sense and combination are reported. φMn follows the code's own assumptions whatever laws were chosen for the behaviour ${cite('ACI 318-19 22.2', 'design flexural strength')}: an extreme-fibre concrete strain of 0.003, the rectangular stress block 0.85f′c over β1c of each concrete part's own f′c, no concrete tension, steel stress Es·εs not above fy (no strain hardening); φ follows from the net tensile strain ${cite('ACI 318-19 Table 21.2.2', 'strength reduction factor φ')}. With bonded FRP, the FRP reaches its effective strain first when it governs, the concrete then by the parabola of ACI 440.2R-17, and ψf = 0.85 reduces the FRP's part ${cite('ACI 440.2R-17 10.2.10', 'FRP flexural strength')}. The load combinations are 1.4D and 1.2D + 1.6L ${cite('ACI 318-19 5.3.1', 'load combinations')} unless the engineer gave factors. A member whose checks pass but which would fail without warning — shear before its flexural mechanism, strength before its tension steel yields or a net tensile strain below 0.004 ${cite('ACI 318-19 9.3.3.1', 'net tensile strain of beams')}, or a largest moment before its tension steel yields (the first crack, or the hump a tension-stiffening law adds after it) at or above what it carries once they yield, or less than the minimum steel ${cite('ACI 318-19 9.6.1', 'minimum flexural reinforcement')} — is reported as brittle, never OK, and its ductility and hinge rotations are not given.`
        : `The strength check compares, at every station of the span, at both sides of every zone boundary, at every point load and at every point of zero shear, in both bending senses and for every load combination, the factored moment of an elastic analysis with gross stiffness (no redistribution) with the design resistance M_Rd of the section there; the largest ratio governs and its position, sense and combination are reported. M_Rd follows the code's own assumptions whatever laws were chosen for the behaviour: every concrete part the parabola–rectangle diagram of its own fck with fcd = fck/1.5 to its own εcu2, no concrete tension, and steel with a horizontal top branch at fyd = fyk/1.15 without a strain limit ${cite('EN 1992-1-1 3.1.7 and 3.2.7', 'design stress–strain laws for M_Rd')}. The load combination is EN 1990 Eq. (6.10), or the less favourable of Eqs. (6.10a) and (6.10b) when the project says so ${cite('EN 1990 6.4.3.2', 'load combinations')}, unless the engineer gave factors. A member whose checks pass but which would fail without warning — shear before its flexural mechanism, strength before its tension steel yields, or a largest moment before its tension steel yields (the first crack, or the hump a tension-stiffening law adds after it) at or above what it carries once they yield, or less than the minimum steel ${cite('EN 1992-1-1 9.2.1.1', 'minimum reinforcement')} — is reported as brittle, never OK, and its ductility and hinge rotations are not given.`,
    },
  ];
  const out: Content[] = [heading('Method', 'h1', { pageBreak: true, id: METHOD_ANCHOR })];
  for (const p of paragraphs) out.push(keepTogether([h2(p.title), { text: p.text, ...STYLES.body }]));
  const shearChecked = ctx.plan.members.some((m) => m.result?.shear !== undefined);
  out.push(keepTogether([h2('Limitations'), bullets(limitations(shearChecked)), cautionBox('Caution', CAUTION_TEXT)]));
  return out;
}

/**
 * The method statement of one member: which laws, hinge length, load pattern and code methods its
 * analysis used, each cited; the general description is in the Method chapter.
 */
export function memberMethod(ctx: WriteContext, member: MemberPlan, project: Project): Content[] {
  const { refs, f } = ctx;
  const d = member.definition;
  const used = `member ${d.name}`;
  const sections = [...new Set(d.zones.map((z) => z.sectionId))].map((id) => project.sections.find((s) => s.id === id)).filter((s) => s !== undefined);
  const laws = materialLines(project, sections, f).map((l) => `${l.name}: ${l.law} ${citationMarker(refs.citeAll(l.references, used, 'stress–strain law'))}`);
  const hingeRef = hingeLengthReference(d.capacity.hingeLengthMethod);
  const aci = project.info.codeBasis === 'ACI 318-19';
  const codeRefs = aci
    ? [refs.cite('ACI 318-19 24.2.3.5', used), refs.cite(METHOD_REFERENCES.bischoff2005, used), refs.cite('ACI 318-19 24.2.4.1', used)]
    : [refs.cite('EN 1992-1-1 7.4.3', used)];
  const strengthRefs = aci ? [refs.cite('ACI 318-19 22.2', used), refs.cite('ACI 318-19 Table 21.2.2', used), refs.cite('ACI 318-19 5.3.1', used)] : [refs.cite('EN 1992-1-1 3.1.7 and 3.2.7', used), refs.cite('EN 1990 6.4.3.2', used)];
  const idealisation = project.settings.bilinearMethod === 'priestley-2007' ? ` ${citationMarker([refs.cite(METHOD_REFERENCES.priestley2007, used)])}` : ' (equal-energy rule)';
  const zones = tensionStiffeningZones(project, sections);
  const area = zones.has('effective-area') ? `within the effective tension area around the bars ${citationMarker([refs.cite('EN 1992-1-1 7.3.2(3)', used, 'effective tension area hc,ef')])}` : '';
  const where = [area, zones.has('tension-zone') ? 'over the whole tension zone' : ''].filter((w) => w !== '').join(' or ');
  const tension = zones.size > 0 ? ` Tension stiffening acts ${where} and ends when the bars yield.` : '';
  const text: Content[] = [
    `The sections of this member use these laws: ${laws.join('; ')}.${tension} Their curves are idealised as bilinear${idealisation}. `,
    `The load–deflection curve increases ${d.capacity.pattern === 'proportional' ? 'all service loads together' : 'the live load with the dead load held'}; plastic hinges take the hinge length of ${HINGE_WORDS[d.capacity.hingeLengthMethod]}${hingeRef ? ` ${citationMarker([refs.cite(hingeRef, used, 'plastic hinge length')])}` : ''}, and the nominal yield deflection follows ${citationMarker([refs.cite(METHOD_REFERENCES.park1988, used)])}. `,
    `Service deflections: integration of the moment–curvature relations and the code method ${citationMarker(codeRefs)}; strength: ${aci ? 'φMn' : 'M_Rd'} by the code's assumptions against elastic factored moments at every station, for every combination ${citationMarker(strengthRefs)}.`,
  ];
  return [keepTogether([h2('Method statement'), { text, ...STYLES.body }, { text: ['The method in full: Method chapter, page ', pageOf(METHOD_ANCHOR)], ...STYLES.note }])];
}
