/**
 * Roboto for the interface and the charts: the TTF files that ship with pdfmake (SIL Open Font
 * License 1.1), which the PDF report embeds too, so that screen and paper use the same face.
 * Loaded with the FontFace API (no inline styles, allowed by the `font-src 'self'` policy).
 */
import regular from 'pdfmake/fonts/Roboto/Roboto-Regular.ttf?url';
import medium from 'pdfmake/fonts/Roboto/Roboto-Medium.ttf?url';
import italic from 'pdfmake/fonts/Roboto/Roboto-Italic.ttf?url';

/** Family name used by the stylesheet and the charts. */
export const UI_FONT = 'Roboto';

let loading: Promise<void> | null = null;

/** Registers and loads the faces once; resolves when they are usable (or failed: the fallback fonts remain). */
export function loadFonts(): Promise<void> {
  if (loading) return loading;
  if (typeof FontFace === 'undefined' || typeof document === 'undefined' || !document.fonts) {
    loading = Promise.resolve();
    return loading;
  }
  const faces = [
    new FontFace(UI_FONT, `url(${regular})`, { weight: '400', style: 'normal' }),
    new FontFace(UI_FONT, `url(${medium})`, { weight: '500 700', style: 'normal' }),
    new FontFace(UI_FONT, `url(${italic})`, { weight: '400', style: 'italic' }),
  ];
  for (const face of faces) document.fonts.add(face);
  loading = Promise.all(faces.map((face) => face.load())).then(() => undefined, () => undefined);
  return loading;
}
