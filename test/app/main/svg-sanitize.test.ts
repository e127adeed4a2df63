import { describe, expect, it } from 'vitest';
import { sanitizeSvg, UnsafeSvgError } from '../../../app/main/svg-sanitize.ts';
import { sectionDrawingSvg } from '../../../core/charts/section-drawing.ts';
import { demoProject } from '../../../core/project/demo.ts';

const count = (text: string, tag: string) => (text.match(new RegExp(`<${tag}[\\s/>]`, 'g')) ?? []).length;

describe('SVG written for other programs', () => {
  it('keeps a plain drawing as it is (the section drawing of core/charts)', () => {
    const section = demoProject().sections.find((s) => s.id === 'T24')!;
    const { svg } = sectionDrawingSvg(section, 'us');
    const clean = sanitizeSvg(svg);
    for (const tag of ['svg', 'path', 'rect', 'circle', 'text']) expect(count(clean, tag), tag).toBe(count(svg, tag));
    expect(clean).toContain('24.0 in');
    // Idempotent: a clean drawing passes through unchanged.
    expect(sanitizeSvg(clean)).toBe(clean);
  });

  it('drops scripts, foreign content and styles with everything inside them', () => {
    const clean = sanitizeSvg('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script><foreignObject><iframe src="https://x"></iframe><p>hi</p></foreignObject><style>@import url(https://x/a.css)</style><rect width="2" height="3"/><set attributeName="onmouseover" to="alert(1)"/><animate attributeName="href" to="javascript:alert(1)"/></svg>');
    expect(clean).toBe('<svg xmlns="http://www.w3.org/2000/svg"><rect width="2" height="3"/></svg>');
  });

  it('drops event handlers and links that run code, however they are spelled', () => {
    const clean = sanitizeSvg([
      '<svg onload="alert(1)" ONLOAD="x" xmlns:xlink="http://www.w3.org/1999/xlink">',
      '<a href="javascript:alert(1)"><text x="1" onclick="evil()">label</text></a>',
      '<a xlink:href="java&#x73;cript:alert(2)"><rect fill="url(#g)" style="fill: red"/></a>',
      '<use href="https://evil.example/sprite.svg#x"/><use href="#local"/>',
      '<image href="data:image/svg+xml;base64,PHN2Zz4="/><image href="data:image/png;base64,iVBORw0KGgo="/>',
      '<rect style="background: url(https://track.example/p.gif)" filter="url(https://x/f#a)"/>',
      '<path d="M0 0" xlink:href="&#106;avascript:alert(3)"/>',
      '</svg>',
    ].join(''));
    expect(clean).not.toMatch(/onload|onclick|javascript|evil|https:\/\/evil|track\.example|svg\+xml|x\/f#a/i);
    expect(clean).toContain('<text x="1">label</text>');
    expect(clean).toContain('<rect fill="url(#g)" style="fill: red"/>');
    expect(clean).toContain('<use href="#local"/>');
    expect(clean).toContain('<image href="data:image/png;base64,iVBORw0KGgo="/>');
  });

  it('removes comments, CDATA and processing instructions, keeping the XML declaration', () => {
    const clean = sanitizeSvg('<?xml version="1.0" encoding="UTF-8"?><?xml-stylesheet href="https://x/s.css"?><svg><!-- <script>x</script> --><text><![CDATA[<script>alert(1)</script>]]>ok</text></svg>');
    expect(clean).toBe('<?xml version="1.0" encoding="UTF-8"?><svg><text>ok</text></svg>');
  });

  it('refuses documents it cannot vouch for', () => {
    expect(() => sanitizeSvg('<!DOCTYPE svg [<!ENTITY x "y">]><svg>&x;</svg>')).toThrow(UnsafeSvgError);
    expect(() => sanitizeSvg('<html><script>x</script></html>')).toThrow(/not an SVG drawing/);
    expect(() => sanitizeSvg('<svg><g></svg>')).toThrow(UnsafeSvgError);
    expect(() => sanitizeSvg('plain text')).toThrow(/not an SVG drawing/);
  });
});
