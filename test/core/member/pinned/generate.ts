/**
 * Writes the pinned key results (pinned-results.json beside this file) from the engine as it stands.
 * Run only on a commit whose results are accepted as the reference:
 *   npx tsx test/core/member/pinned/generate.ts
 * The JSON records the last commit that changed core/ (and whether core/ had uncommitted changes).
 */
import { execSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { pinnedResults } from './members.ts';

// The engine the values come from: the last commit that changed core/.
const commit = execSync('git log -1 --format=%H -- core', { encoding: 'utf8' }).trim();
const dirty = execSync('git status --porcelain -- core', { encoding: 'utf8' }).trim() !== '';
const file = fileURLToPath(new URL('./pinned-results.json', import.meta.url));
const body = { producedOn: `${commit}${dirty ? ' (core/ modified)' : ''}`, how: 'npx tsx test/core/member/pinned/generate.ts', results: pinnedResults() };
writeFileSync(file, `${JSON.stringify(body, null, 1)}\n`);
process.stderr.write(`${Object.keys(body.results).length} members written to ${file}\n`);
