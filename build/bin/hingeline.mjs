#!/usr/bin/env node
// The `hingeline` command (package.json "bin"). Registers tsx's ESM loader so that the TypeScript
// sources run directly, then hands over to app/cli/main.ts. See docs/cli.md.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../../app/cli/main.ts');
const { nodeIo } = await import('../../app/cli/io.ts');
const io = nodeIo();
process.exitCode = await main(process.argv.slice(2), io);
// Workers and timers are done; leave without waiting for anything left behind (e.g. after Ctrl+C).
if (io.signal.aborted) process.exit(process.exitCode);
