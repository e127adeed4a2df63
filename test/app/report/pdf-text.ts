/** Text of a PDF, page by page, read with pdfjs-dist (legacy build for Node). */
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export interface PdfText {
  readonly pages: readonly string[];
  /** All pages, whitespace collapsed to single spaces. */
  readonly all: string;
}

export async function pdfText(bytes: Uint8Array): Promise<PdfText> {
  const document = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= document.numPages; i++) {
    const page = await document.getPage(i);
    const content = await page.getTextContent();
    const text = content.items.map((item) => ('str' in item ? `${item.str}${item.hasEOL ? '\n' : ' '}` : '')).join('');
    pages.push(text.replace(/[ \t]+/g, ' '));
  }
  await document.destroy();
  return { pages, all: pages.join('\n').replace(/\s+/g, ' ') };
}

/** Collapses whitespace, for comparing with text that may wrap over lines in the PDF. */
export function words(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

/**
 * Pages (1-based) of a project report that hold nothing but the caution box besides the running
 * header and footer (issue 15 item 12: the box closes a member chapter together with its
 * limitations, never alone on a page). `header`: the running header's text.
 */
export function cautionOnlyPages(read: PdfText, header: string, cautionText: string): number[] {
  return read.pages.flatMap((page, i) => {
    // What is on the page besides the running header and footer.
    const body = words(page).replace(header, '').replace(/Project \S+ · revision \S+ For review by a qualified engineer\. Local codes and licensed practice govern\. Page \d+ of \d+/, '').trim();
    return body.replace(words(`Caution ${cautionText}`), '').trim() === '' ? [i + 1] : [];
  });
}
