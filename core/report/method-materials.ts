/**
 * The assumptions of the best-estimate material and section model in the Method chapter (issue 11):
 * the concrete strain limits, tension stiffening, confinement, as-found strengths and the load history
 * of the service deflections — one paragraph each, with its sources. Kept apart from the member
 * engine's paragraphs (method.ts) so that each part of the model states its own assumptions.
 */
import { MANDER_REFERENCE, PRIESTLEY_SEIBLE_CALVI_REFERENCE } from '../materials/concrete/mander.ts';
import { SCOTT_PARK_PRIESTLEY_REFERENCE } from '../materials/concrete/modified-kent-park.ts';
import { VECCHIO_COLLINS_REFERENCE } from '../materials/concrete/tension.ts';
import type { Project } from '../project/types.ts';

/** Cites a reference in the method chapter and returns its marker. */
export type Cite = (reference: string, note?: string) => string;

export interface MethodParagraph {
  readonly title: string;
  readonly text: string;
}

/** The material and section paragraphs of the Method chapter, in reading order. */
export function materialMethodParagraphs(project: Project, cite: Cite): MethodParagraph[] {
  const aci = project.info.codeBasis === 'ACI 318-19';
  const choice = project.settings.concreteUltimateStrain ?? 'code';
  const codeStrain = aci
    ? `εcu = 0.003 ${cite('ACI 318-19 22.2.2.1', 'crushing strain 0.003')}`
    : `εcu1 for the nonlinear laws and εcu2 for the parabola–rectangle ${cite('EN 1992-1-1 Table 3.1', 'strain limits εcu2, εc1, εcu1')}`;
  return [
    {
      title: 'Concrete strain limits',
      text: `Two strains of the concrete are kept apart. The code crushing point (${aci ? '0.003' : 'εcu2'}) is marked on every curve and is where every code check reads the section. The best-estimate curves end where the concrete that governs reaches its ultimate strain εcu, which this project takes ${choice === 'code' ? `from the code: ${codeStrain}` : `from each stress–strain law: Hognestad 0.0038, Modified Kent–Park and Mander 0.004 for unconfined concrete, EN 1992-1-1 εcu1 and εcu2; laws that publish none (Popovics, Thorenfeldt–Collins) use the code value, ${codeStrain}`}, unless a material says otherwise or gives a value; each section's ultimate states the value used and where it comes from. A confined core ends at the hoop-fracture strain of its model ${cite(SCOTT_PARK_PRIESTLEY_REFERENCE, 'ultimate strain of confined concrete')} ${cite(PRIESTLEY_SEIBLE_CALVI_REFERENCE, 'ultimate strain of confined concrete')}.`,
    },
    {
      title: 'Concrete in tension',
      text: `Concrete cracks at its tensile strength. The linear–brittle law takes the code value (${aci ? `the modulus of rupture fr = 0.62λ√f′c ${cite('ACI 318-19 19.2.3.1', 'modulus of rupture fr')}` : `fctm ${cite('EN 1992-1-1 Table 3.1', 'mean tensile strength fctm')}`}). The tension-stiffening law fcr/(1 + √(c·εt)) ${cite(VECCHIO_COLLINS_REFERENCE, 'average tensile stress after cracking')} is fed the direct cracking stress it was calibrated on, ${aci ? 'fcr = 0.33λ√f′c (from memory), about half the modulus of rupture' : 'fctm'}, unless a material gives its own value. It acts, as chosen per material, in the effective tension area around each face's bars, of depth hc,ef = min(2.5(h − d), h/2) ${cite('EN 1992-1-1 7.3.2(3)', 'effective tension area hc,ef')}, with the rest of the tension zone cracking brittly, or in the whole tension zone. Between cracks the concrete carries no more tension than the bars can still pick up at a crack, As·(fy − σs) (the crack check of the same reference), so its share falls as the bars approach yield and is nil once they yield: the moment does not fall after first yield through stiffening lost. The law itself ends at εt = 0.005, tapered from 0.004 (common practice, no source), beyond the yield strain of bars up to 800 MPa. The code deflection method keeps the code's ${aci ? 'fr' : 'fctm'}.`,
    },
    {
      title: 'Service deflections by integration: load history, creep and shrinkage',
      text: `The integration follows the load history: the dead load, then the live load (the largest service state, whose cracks form then), then the sustained part D + ψL stays. The sustained state keeps the damage of the largest state: at each section its curvature lies on the secant from the state at zero moment to the state under the largest service moment, and never below the curve itself — the same assumption as the code method's Ie at dead + live for the sustained load (common practice, no source). Under sustained load creep enters through the effective modulus Ec/(1 + φ) applied to the whole concrete law ${cite('EN 1992-1-1 Eq. (7.20)', 'effective modulus for creep')}, shrinkage as a free shortening εcs of the concrete that the bars restrain (so it bends a section whose steel is not symmetric), and tension stiffening decays to half its short-term value, β = 0.5 ${cite('EN 1992-1-1 Eq. (7.19)', 'β = 0.5 for sustained load')}. The long-term addition is the difference between that state and the short-term sustained state. Where the two methods differ by more than 25 %, the member's service table says which assumptions differ: how cracking and tension stiffening enter, ${aci ? "one Ie for the whole member, and the code's single multiplier λΔ for creep and shrinkage together" : 'and the code\'s interpolation with ζ and its shrinkage curvature'}.`,
    },
    {
      title: 'As-found strengths',
      text: `Where cores were tested, two strengths of the concrete are kept. The code checks (flexural design resistance, shear capacity) use the lower fractile, ${aci ? `the equivalent specified strength f′c,eq = f̄c − K·s at the 10 % fractile with 75 % confidence (ACI 214.4R-10, tolerance-factor approach, from memory)` : `fck,is = f̄c·(1 − kn·V) at the 5 % fractile (EN 1990 Annex D, Eq. (D.1) and Table D1, from memory; EN 13791 rests on the same statistics)`}. The behaviour — the stress–strain laws and curves, Ec, the tensile strength, both service-deflection methods and the shear demand at the flexural mechanism — uses the measured mean f̄c${aci ? '' : ' as fcm (never fck,is + 8, which would fall below the mean)'}, the expected value a best estimate needs. Both are shown with the as-found condition.`,
    },
    {
      title: 'Confinement',
      text: `A core is modelled as confined ${cite(MANDER_REFERENCE, 'confined concrete')} only where the engineer asks for it and confirms the hoops closed and anchored in the core (135° hooks or welded): open stirrups and hoops with 90° hooks, usual in older buildings, are not taken to confine anything. The confinement effectiveness ke counts as laterally restrained only the bars at hoop corners and those held by a leg or cross-tie, with the clear spacings w′ between them (Mander et al. 1988, Eq. 23, from memory); the unrestrained bars between them do not shorten the arching.`,
    },
  ];
}
