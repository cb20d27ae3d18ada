import { Resvg } from '@resvg/resvg-js';
import { describe, expect, it } from 'vitest';
import { UnsupportedCharacterError } from '../../src/render/errors.ts';
import { escapeXml, renderSvg } from '../../src/render/svg.ts';
import { textNode } from '../../src/scene/text.ts';
import { everyNodeKindScene, sceneOf } from './scenes.ts';
import { xmlProblems } from './xmlCheck.ts';

const HOSTILE = `<script>alert("x")</script> & 'quoted' ]]> <![CDATA[ x ]]> \u0000\u0007\u001b bell`;

/** Well-formed by our checker and by resvg's strict XML parser (roxmltree). */
function expectWellFormed(svg: string): void {
  expect(xmlProblems(svg)).toEqual([]);
  expect(() => new Resvg(svg, { font: { loadSystemFonts: false } })).not.toThrow();
}

describe('xmlProblems() (test helper)', () => {
  it('catches the faults it is there to catch', () => {
    expect(xmlProblems('<a><b></a></b>')).not.toEqual([]);
    expect(xmlProblems('<a x="1" x="2"/>')).not.toEqual([]);
    expect(xmlProblems('<a>fish & chips</a>')).not.toEqual([]);
    expect(xmlProblems('<a>]]></a>')).not.toEqual([]);
    expect(xmlProblems('<a/><b/>')).not.toEqual([]);
    expect(xmlProblems('<a t="&lt;b&gt;">x &amp; y</a>')).toEqual([]);
  });
});

describe('renderSvg()', () => {
  it('writes a well-formed, mm-sized document with a mm viewBox, title and description', () => {
    const svg = renderSvg(everyNodeKindScene());
    expectWellFormed(svg);
    // A4 with 3 mm bleed and crop marks: 210 × 297 mm + 2 × (3 mm bleed + 5 mm marks + 2 mm clear).
    expect(svg).toContain('width="230mm" height="317mm" viewBox="0 0 230 317"');
    expect(svg).toContain('<title>Every node kind</title>');
    expect(svg).toContain('<desc>A sheet built by a test</desc>');
  });

  it("sets text in 'Source Sans 3' without kerning, sizes in mm (10 pt = 3.528 mm)", () => {
    const svg = renderSvg(sceneOf({ children: [textNode({ text: 'WOT', sizePt: 10, weight: 'bold', x: 1 / 3, y: 2 / 3 })] }));
    expect(svg).toContain(`font-family="'Source Sans 3'"`);
    expect(svg).toContain('font-kerning:none');
    // 10 pt × 25.4/72 mm/pt = 3.5278 mm, written to 3 decimals.
    expect(svg).toContain('<text x="0.333" y="0.667" font-size="3.528" font-weight="700" text-anchor="start" fill="#000000">WOT</text>');
  });

  it('escapes markup, quotes and "]]>" and strips control characters in text, title and tags', () => {
    const node = { ...textNode({ text: HOSTILE, sizePt: 10, weight: 'regular', x: 10, y: 10 }), role: HOSTILE };
    const svg = renderSvg({ ...sceneOf({ children: [node] }), title: HOSTILE, description: HOSTILE });
    expectWellFormed(svg);
    expect(svg).not.toContain('<script');
    expect(svg).not.toContain(']]>');
    expect(svg).not.toMatch(/[\u0000-\u0008\u001b]/);
    expect(svg).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &apos;quoted&apos; ]]&gt;');
  });

  it('keeps Greek, Cyrillic and accented Latin as characters, and drops bidi overrides', () => {
    const text = 'Ωμέγα · Двигатель · Crème brûlée \u202Eevil';
    const svg = renderSvg(sceneOf({ children: [textNode({ text, sizePt: 10, weight: 'regular', x: 10, y: 10 })] }));
    expectWellFormed(svg);
    expect(svg).toContain('>Ωμέγα · Двигатель · Crème brûlée evil</text>');
  });

  it('refuses a character the font lacks with an error naming it', () => {
    const scene = sceneOf({ children: [textNode({ text: 'Motor מנוע', sizePt: 10, weight: 'regular', x: 10, y: 10 })] });
    expect(() => renderSvg(scene)).toThrow(UnsupportedCharacterError);
    expect(() => renderSvg(scene)).toThrow(/"מ" \(U\+05DE\) in the text "Motor מנוע"/);
  });

  it('writes dashes, caps, joins, opacity, clip paths, rotation and tags', () => {
    const svg = renderSvg(everyNodeKindScene());
    expect(svg).toContain(
      '<rect x="20" y="20" width="100" height="50" fill="#ffcc00" fill-opacity="0.5" stroke="#003366" stroke-width="0.5" ' +
        'stroke-dasharray="2 1" stroke-linejoin="round" data-role="band" data-key="impeller:demo-a"/>',
    );
    expect(svg).toContain('<clipPath id="clip-1"><rect x="20" y="100" width="50" height="50"/></clipPath>');
    expect(svg).toContain('<g clip-path="url(#clip-1)">');
    expect(svg).toContain('d="M10 90C40 200 60 0 100 160" fill="none" stroke="#000000" stroke-width="0.7" stroke-linecap="round"');
    expect(svg).toContain('transform="rotate(-90 30 280)"');
    expect(svg).toContain('<circle cx="150" cy="50" r="10" fill="#cc0000" data-role="operating-point"/>');
  });

  it('numbers clip paths in document order, so two renders are identical', () => {
    const clipped = (n: number) => ({ type: 'group' as const, clip: { x: n, y: n, width: 5, height: 5 }, children: [] });
    const scene = sceneOf({ children: [clipped(1), { type: 'group', children: [clipped(2)] }, clipped(3)] });
    const svg = renderSvg(scene);
    expect([...svg.matchAll(/<clipPath id="([^"]+)"/g)].map((m) => m[1])).toEqual(['clip-1', 'clip-2', 'clip-3']);
    expect(renderSvg(scene)).toBe(svg);
  });

  it('escapeXml never lets a quote end an attribute early', () => {
    expect(escapeXml(`a"b'c`)).toBe('a&quot;b&apos;c');
  });

  it('matches the stored snapshot of the every-node-kind scene', async () => {
    await expect(renderSvg(everyNodeKindScene())).toMatchFileSnapshot('../output/render/every-node-kind.svg');
  });
});
