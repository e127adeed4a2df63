/**
 * pdfmake draws the report's charts from their figure programs (figure-pdf.ts) instead of through
 * its SVG reader. The same code serves the command line (pdfmake's Node modules) and the app's
 * report worker (pdfmake's browser build), so both print the same PDF.
 *
 * How: a chart is an `image` node whose entry in the document's image dictionary is its figure
 * program. pdfmake asks its document (`PDFDocument.provideImage`) for every image while measuring;
 * `installFigureDrawing` lets that method answer for figure programs with a PDF form (an XObject
 * drawn by reference, ISO 32000-1 §8.10) of the figure's size, which PDFKit then places like an
 * image (`image()` scales the unit square to the node's box). Nothing is parsed but the program
 * itself; a figure whose program is the same as an earlier one's is the same form, written once.
 * pdfmake is not imported here: the host passes the document class it uses.
 */
import { FIGURE_PROGRAM, figureContent, type FigureGlyphs } from './figure-pdf.ts';

/** The parts of PDFKit's object references used here. */
interface PdfReference {
  readonly data: Record<string, unknown>;
  write(chunk: string): void;
  end(): void;
}

/** The parts of PDFKit's embedded fonts used here. */
interface PdfFont {
  readonly id: string;
  ref(): PdfReference;
  encode(text: string): [string[], FigureGlyphs['positions']];
}

/** The parts of pdfmake's document (a PDFKit document) used here. */
interface PdfMakeDocument {
  readonly images?: Readonly<Record<string, unknown>>;
  readonly _imageRegistry: Record<string, unknown>;
  readonly fonts: Readonly<Record<string, unknown>>;
  ref(data?: Record<string, unknown>): PdfReference;
  provideFont(family: string, bold: boolean, italics: boolean): PdfFont;
  provideImage(src: unknown): unknown;
}

/** What PDFKit's `image()` needs of an image: its size, a unique resource name and the object. */
interface FigureForm {
  readonly width: number;
  readonly height: number;
  readonly label: string;
  obj: PdfReference | null;
  embed(document: PdfMakeDocument): void;
}

/** Per document: forms by program, graphics states by opacity. */
interface FigureStore {
  readonly forms: Map<string, FigureForm>;
  readonly states: Map<string, { name: string; ref: PdfReference }>;
}

const STORE = Symbol('hingeline figures');
const INSTALLED = Symbol('hingeline figure drawing');

function store(document: PdfMakeDocument): FigureStore {
  const holder = document as unknown as { [STORE]?: FigureStore };
  holder[STORE] ??= { forms: new Map(), states: new Map() };
  return holder[STORE];
}

/** Numbers of the placing matrix: enough digits that a 600 pt figure lands within 1e-6 pt. */
function exact(v: number): string {
  return String(Number(v.toPrecision(12)));
}

/** The family pdfmake knows by this name (case-insensitive), else the report font, as pdfmake's SVG reader chose. */
function familyName(document: PdfMakeDocument, family: string): string {
  const wanted = family.toLowerCase();
  return Object.keys(document.fonts).find((name) => name.toLowerCase() === wanted) ?? 'Roboto';
}

/** Writes the form of `program` (see the module comment) into `document`. */
function writeForm(document: PdfMakeDocument, program: string): PdfReference {
  const fonts: Record<string, PdfReference> = {};
  const states: Record<string, PdfReference> = {};
  const known = store(document).states;
  const { width, height, content } = figureContent(program, {
    glyphs(family, bold, text) {
      const font = document.provideFont(familyName(document, family), bold, false);
      const [codes, positions] = font.encode(text);
      fonts[font.id] = font.ref();
      return { font: font.id, codes, positions };
    },
    opacity(fill, stroke) {
      const key = `${fill} ${stroke}`;
      let state = known.get(key);
      if (!state) {
        const ref = document.ref({ Type: 'ExtGState', ca: fill, CA: stroke });
        ref.end();
        state = { name: `HG${known.size + 1}`, ref };
        known.set(key, state);
      }
      states[state.name] = state.ref;
      return state.name;
    },
  });
  const resources: Record<string, unknown> = {};
  if (Object.keys(fonts).length > 0) resources.Font = fonts;
  if (Object.keys(states).length > 0) resources.ExtGState = states;
  // PDFKit places an image by scaling the unit square to its box (y upwards); the figure's own
  // points run from its top left downwards, so the form maps them onto that square first.
  const form = document.ref({ Type: 'XObject', Subtype: 'Form', FormType: 1, BBox: [0, 0, 1, 1], Resources: resources });
  form.write(`${exact(1 / width)} 0 0 ${exact(-1 / height)} 0 1 cm\n${content}`);
  form.end();
  return form;
}

/**
 * Lets documents of `documentClass` (pdfmake's PDFDocument) draw figure programs given as images
 * (see the module comment). Idempotent. Throws when the class does not look like pdfmake 0.3's.
 */
export function installFigureDrawing(documentClass: { readonly prototype: object }): void {
  const prototype = documentClass.prototype as PdfMakeDocument & { [INSTALLED]?: true };
  if (prototype[INSTALLED]) return;
  const provideImage = prototype.provideImage;
  if (typeof provideImage !== 'function') throw new Error('This pdfmake has no PDFDocument.provideImage: the report cannot draw its charts (pdfmake 0.3 expected).');
  prototype.provideImage = function provideFigure(this: PdfMakeDocument, src: unknown): unknown {
    const program = typeof src === 'string' ? this.images?.[src] : undefined;
    if (typeof program !== 'string' || !program.startsWith(FIGURE_PROGRAM)) return provideImage.call(this, src);
    const forms = store(this).forms;
    let form = forms.get(program);
    if (!form) {
      const head = program.indexOf('\n');
      const [width, height] = program.slice(FIGURE_PROGRAM.length, head < 0 ? program.length : head).trim().split(' ').map(Number) as [number, number];
      form = {
        width, height, label: `HF${forms.size + 1}`, obj: null,
        embed(document) {
          this.obj ??= writeForm(document, program);
        },
      };
      forms.set(program, form);
    }
    // PDFKit's image() finds the image by the node's name here when it draws.
    this._imageRegistry[src as string] = form;
    return form;
  };
  prototype[INSTALLED] = true;
}
