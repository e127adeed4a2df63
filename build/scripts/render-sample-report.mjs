#!/usr/bin/env node
// Writes the sample report of the demo project to build/sample/ and renders chosen pages to PNG
// with poppler's pdftoppm, so that reviewers can look at the report without running anything.
// The work is in render-sample-report.ts, loaded through tsx. Usage:
//   node build/scripts/render-sample-report.mjs [--pages 1,3,5-8] [--dpi 70] [--out build/sample]
import { tsImport } from 'tsx/esm/api';

const { main } = await tsImport('./render-sample-report.ts', import.meta.url);
process.exitCode = await main(process.argv.slice(2));
