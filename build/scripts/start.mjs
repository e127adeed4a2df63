#!/usr/bin/env node
// `npm start`: builds and starts Hingeline (the desktop app, or the same UI in the browser when
// the Electron runtime is missing). The work is in start-app.ts, loaded through tsx.
import { tsImport } from 'tsx/esm/api';

const { main } = await tsImport('./start-app.ts', import.meta.url);
process.exitCode = await main(process.argv.slice(2));
