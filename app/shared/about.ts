/** Texts of the About box. Node-free. */

import { RESULTS_CAUTION } from '../../core/assessment/results.ts';

/** The caution every result-bearing surface carries (written once, in core). */
export { RESULTS_CAUTION };

export interface AboutVersions {
  readonly app: string;
  readonly electron?: string;
  readonly chrome?: string;
  readonly node?: string;
}

/** Body text of the About dialog: version lines, what the program does, and the caution. */
export function aboutDetail(versions: AboutVersions): string {
  const lines = [`Version ${versions.app}`];
  if (versions.electron) lines.push(`Electron ${versions.electron}`);
  if (versions.chrome) lines.push(`Chromium ${versions.chrome}`);
  if (versions.node) lines.push(`Node.js ${versions.node}`);
  return [
    lines.join('\n'),
    'Moment–curvature, load–deflection, plastic hinge and service-deflection assessment of reinforced-concrete beams.',
    `Caution: ${RESULTS_CAUTION}`,
  ].join('\n\n');
}
