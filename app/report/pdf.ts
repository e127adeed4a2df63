/**
 * pdfmake 0.3 in Node: one configured instance (fonts by absolute path, no network, no file access
 * beyond the report's font files, charts drawn from their figure programs) turning a report
 * document definition into PDF bytes.
 */
import { createRequire } from 'node:module';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { installReportAdjustments, type PdfmakeClass } from '../../core/report/pdfmake-classes.ts';
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
  // Charts drawn from their figure programs, inline measuring with one style push, words that print
  // alike written as one text object (core/report/pdfmake-classes.ts, as in the app's report worker).
  // The classes are the ones pdfmake's own modules load (the same files, so the same module instances).
  const load = (module: unknown) => (module as { default: PdfmakeClass }).default;
  installReportAdjustments({
    documentClass: load(require('pdfmake/js/PDFDocument.js')),
    textInlinesClass: load(require('pdfmake/js/TextInlines.js')),
    rendererClass: load(require('pdfmake/js/Renderer.js')),
  });
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
