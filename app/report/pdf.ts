/**
 * pdfmake 0.3 in Node: one configured instance (fonts by absolute path, no network, no file access
 * beyond the report's font files, charts drawn from their figure programs) turning a report
 * document definition into PDF bytes.
 */
import { createRequire } from 'node:module';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { installFigureDrawing } from '../../core/report/pdfmake-figures.ts';
import { installInlineMeasuring } from '../../core/report/pdfmake-measure.ts';
import type { DocumentDefinition } from '../../core/report/types.ts';
import { nodeFontDescriptors, reportFontPaths } from './fonts.ts';

const require = createRequire(import.meta.url);

let configured = false;

function configure(): void {
  if (configured) return;
  const allowed = new Set(reportFontPaths());
  // The report reads nothing but its font files and fetches nothing from the network.
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy((path: string) => allowed.has(path));
  pdfmake.setFonts(nodeFontDescriptors());
  // Charts given as figure programs are drawn directly (core/report/pdfmake-figures.ts). The class
  // is the one pdfmake's own modules load (the same file, so the same module instance).
  installFigureDrawing((require('pdfmake/js/PDFDocument.js') as { default: { prototype: object } }).default);
  // Each inline's style is pushed once while it is measured, not once per style property
  // (core/report/pdfmake-measure.ts; same measurements, a third less CPU on the report's tables).
  installInlineMeasuring((require('pdfmake/js/TextInlines.js') as { default: { prototype: object } }).default);
  configured = true;
}

/**
 * Lays out and writes the document to PDF bytes. `generatedOn` (ISO 8601) becomes the PDF creation
 * date, so the same inputs give the same bytes. Throws when `generatedOn` is not a date.
 */
export async function renderPdf(definition: DocumentDefinition, generatedOn: string): Promise<Buffer> {
  configure();
  const creationDate = new Date(generatedOn);
  if (Number.isNaN(creationDate.getTime())) throw new Error(`The report date "${generatedOn}" is not an ISO 8601 date.`);
  const document = { ...definition, info: { ...definition.info, creationDate } };
  // The definition is pdfmake-shaped by construction; core declares only the subset it uses.
  return pdfmake.createPdf(document as unknown as TDocumentDefinitions).getBuffer();
}
