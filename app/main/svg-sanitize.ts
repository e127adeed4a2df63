/**
 * Makes an SVG document safe to write where other programs open it. Node-only, no Electron.
 *
 * The default program for `.svg` is usually a web browser, which runs scripts in SVG: an export
 * that carried `<script>`, an `onload` attribute or a `javascript:` link would run with the
 * rights of a local file. The document is rebuilt from an allowlist instead of being patched:
 *
 * - elements: the drawing elements of SVG 1.1 (shapes, text, groups, gradients, clipping,
 *   markers, `use`); `script`, `foreignObject`, `style`, animation, `iframe`, `object`, … are
 *   dropped with everything inside them; `a` and `switch` are dropped but their content kept;
 * - attributes: only well-formed names, never event handlers (`on…`); `href` and `xlink:href`
 *   only to a fragment of the same document (`#clip-1`) or an embedded PNG, JPEG, GIF or WebP
 *   image; no value (entities decoded first) may name `javascript:`, `vbscript:` or `data:text`,
 *   and a `style` attribute may not load anything (`url(` other than `#…`, `@import`, `expression`);
 * - a document type declaration (entities) is refused outright; comments, processing
 *   instructions (other than the XML declaration) and CDATA sections are removed.
 *
 * What comes out is the same drawing as what went in when it held nothing active (tested with the
 * section drawing of core/charts).
 */

export class UnsafeSvgError extends Error {
  override readonly name = 'UnsafeSvgError';
}

const ELEMENTS = new Set([
  'svg', 'g', 'defs', 'title', 'desc', 'path', 'rect', 'circle', 'ellipse', 'line', 'polyline', 'polygon', 'text', 'tspan',
  'textPath', 'clipPath', 'mask', 'pattern', 'marker', 'symbol', 'use', 'image', 'linearGradient', 'radialGradient', 'stop',
  'filter', 'feGaussianBlur', 'feOffset', 'feBlend', 'feFlood', 'feComposite', 'feMerge', 'feMergeNode', 'feColorMatrix',
]);
/** Dropped, but their content kept. */
const UNWRAP = new Set(['a', 'switch']);

const NAME = /^[A-Za-z_][-A-Za-z0-9_.]*(?::[A-Za-z_][-A-Za-z0-9_.]*)?$/;
const SAFE_IMAGE = /^data:image\/(?:png|jpeg|gif|webp);base64,[A-Za-z0-9+/=\s]*$/i;
const ACTIVE_SCHEME = /(?:java|vb)script\s*:|data\s*:\s*text|data\s*:\s*image\/svg/i;

const NAMED_ENTITIES: Readonly<Record<string, string>> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", colon: ':', tab: '\t', newline: '\n' };

/** Attribute text with character references decoded and controls and whitespace removed (as a URL parser would read it). */
function decoded(value: string): string {
  return value
    .replace(/&#x([0-9a-f]+);?/gi, (_, hex: string) => String.fromCodePoint(Number.parseInt(hex, 16) % 0x110000))
    .replace(/&#(\d+);?/g, (_, dec: string) => String.fromCodePoint(Number(dec) % 0x110000))
    .replace(/&([a-z]+);/gi, (whole, name: string) => NAMED_ENTITIES[name.toLowerCase()] ?? whole)
    .replace(/[\u0000-\u0020\u007f-\u009f]/g, '');
}

function attributeAllowed(name: string, value: string): boolean {
  if (!NAME.test(name) || /^on/i.test(name.replace(/^.*:/, ''))) return false;
  const plain = decoded(value);
  const local = name.replace(/^xlink:/, '');
  if (local === 'href' || name === 'src') return plain.startsWith('#') || SAFE_IMAGE.test(value.trim());
  if (ACTIVE_SCHEME.test(plain)) return false;
  if (name === 'style' && (/@import|expression\s*\(|behavior\s*:|-moz-binding/i.test(plain) || /url\((?!['"]?#)/i.test(plain))) return false;
  // Presentation attributes may point at fragments only (fill="url(#grad)").
  if (/url\((?!['"]?#)/i.test(plain)) return false;
  return true;
}

const escapeAttribute = (value: string) => value.replace(/&(?![a-zA-Z]+;|#\d+;|#x[0-9a-fA-F]+;)/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');

/**
 * The safe version of `svg`. Throws UnsafeSvgError when the text is not an SVG document this
 * function can read (no `<svg>` root, a document type declaration, unbalanced tags).
 */
export function sanitizeSvg(svg: string): string {
  if (/<!DOCTYPE|<!ENTITY/i.test(svg)) throw new UnsafeSvgError('the SVG declares a document type or entities');
  const text = svg
    .replace(/^\uFEFF/, '')
    .replace(/<!--[\s\S]*?-->/g, '')
    .replace(/<!\[CDATA\[[\s\S]*?\]\]>/g, '')
    .replace(/<\?(?!xml\s)[\s\S]*?\?>/g, '');
  const declaration = /^\s*<\?xml\s[^?]*\?>/.exec(text)?.[0]?.trim() ?? '';
  const body = declaration ? text.slice(text.indexOf(declaration) + declaration.length) : text;
  const out: string[] = declaration ? [declaration] : [];
  /** Open elements: name, and whether it was written (kept) or its content is being skipped. */
  const stack: { name: string; mode: 'keep' | 'unwrap' | 'skip' }[] = [];
  const skipping = () => stack.some((e) => e.mode === 'skip');
  const TAG = /<\/?([A-Za-z_][-A-Za-z0-9_.:]*)((?:\s+[^\s=/>]+(?:\s*=\s*(?:"[^"]*"|'[^']*'|[^\s"'>]+))?)*)\s*(\/?)>|<[^>]*>?/g;
  let last = 0;
  let sawRoot = false;
  for (let match = TAG.exec(body); match; match = TAG.exec(body)) {
    const before = body.slice(last, match.index);
    if (!skipping() && stack.length > 0) out.push(before.replace(/</g, '&lt;').replace(/>/g, '&gt;'));
    last = TAG.lastIndex;
    const [whole, name, attributes = '', selfClosing] = match;
    if (name === undefined) throw new UnsafeSvgError(`the SVG holds markup that is not a tag: ${whole.slice(0, 40)}`);
    const closing = whole.startsWith('</');
    if (closing) {
      const open = stack.pop();
      if (!open || open.name !== name) throw new UnsafeSvgError(`the SVG closes <${name}> where <${open?.name ?? 'nothing'}> is open`);
      if (open.mode === 'keep') out.push(`</${name}>`);
      continue;
    }
    if (!sawRoot) {
      if (name !== 'svg') throw new UnsafeSvgError(`the document is not an SVG drawing (its root is <${name}>)`);
      sawRoot = true;
    }
    const mode: 'keep' | 'unwrap' | 'skip' = skipping() ? 'skip' : ELEMENTS.has(name) ? 'keep' : UNWRAP.has(name) ? 'unwrap' : 'skip';
    if (mode === 'keep') {
      const kept: string[] = [];
      const ATTRIBUTE = /([^\s=/>]+)(?:\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'>]+)))?/g;
      for (let a = ATTRIBUTE.exec(attributes); a; a = ATTRIBUTE.exec(attributes)) {
        const attributeName = a[1]!;
        const value = a[2] ?? a[3] ?? a[4] ?? '';
        if (attributeAllowed(attributeName, value)) kept.push(` ${attributeName}="${escapeAttribute(value)}"`);
      }
      out.push(`<${name}${kept.join('')}${selfClosing ? '/' : ''}>`);
    }
    if (!selfClosing) stack.push({ name, mode });
  }
  if (!sawRoot) throw new UnsafeSvgError('the document is not an SVG drawing');
  if (stack.length > 0) throw new UnsafeSvgError(`the SVG ends with <${stack[stack.length - 1]!.name}> still open`);
  return out.join('');
}
