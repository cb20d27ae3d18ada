import { describe, expect, it, vi } from 'vitest';
import { rasteriseSvg, renderPng } from '../../src/render/png.ts';
import { renderSvg } from '../../src/render/svg.ts';
import { textBox } from '../../src/scene/text.ts';
import type { Scene, TextNode } from '../../src/scene/types.ts';
import { darkPixels, decodePng, differingPixels } from './pngPixels.ts';
import { everyNodeKindScene, sceneOf, textRunsScene } from './scenes.ts';
import { xmlProblems } from './xmlCheck.ts';

const DPI = 150;
const PX_PER_MM = DPI / 25.4;
const widthPx = (scene: Scene) => Math.round((scene.widthMm / 25.4) * DPI);
const textNodes = (scene: Scene) => scene.root.children.filter((node): node is TextNode => node.type === 'text');
/** The same scene drawn by resvg from real <text> (resvg shapes with rustybuzz, not fontkit). */
const fromText = (scene: Scene) => decodePng(rasteriseSvg(renderSvg(scene), { widthPx: widthPx(scene) }));
const fromOutlines = (scene: Scene) => decodePng(renderPng(scene, { dpi: DPI }));
const moved = (scene: Scene, dxMm: number): Scene => ({
  ...scene,
  root: { ...scene.root, children: textNodes(scene).map((node) => ({ ...node, x: node.x + dxMm })) },
});

describe("renderSvg(scene, { text: 'outlines' })", () => {
  it('writes each text node as one filled path in its colour, with no <text> left, and keeps real text by default', () => {
    const scene = textRunsScene();
    const svg = renderSvg(scene, { text: 'outlines' });
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).not.toContain('<text');
    expect(svg.match(/<path d="M[^"]*" transform="translate\([^"]*\) (rotate\(-90\) )?scale\(0\.0\d+\)"/g)).toHaveLength(6);
    expect(svg).toContain('fill="#003366"');
    expect(renderSvg(scene).match(/<text /g)).toHaveLength(6);
  });

  it('stays well-formed with markup in the text, tags and colour, and still refuses a character the font lacks', () => {
    const hostile = `<b a="1">'x' & ]]>`;
    const [node] = textNodes(textRunsScene());
    const svg = renderSvg(sceneOf({ children: [{ ...node, text: hostile, role: hostile, key: hostile, colour: `#000" onload="x` }] }), { text: 'outlines' });
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).not.toContain('<b ');
    expect(svg).toContain('fill="#000&quot; onload=&quot;x"');
    expect(() => renderSvg(sceneOf({ children: [{ ...node, text: 'Motor מנוע' }] }), { text: 'outlines' })).toThrow(/U\+05DE/);
  });

  it('places a rotated, middle-anchored run as the <text> element does: baseline up the page from its centre', () => {
    const [node] = textNodes(textRunsScene()).filter((n) => n.rotateDeg === 90 && n.anchor === 'middle');
    const svg = renderSvg(sceneOf({ children: [node] }), { text: 'outlines' });
    // Start of the run: half the measured width down the page from the anchor (y grows downwards).
    expect(svg).toContain(`transform="translate(60 ${Number((250 + node.widthMm / 2).toFixed(3))}) rotate(-90) scale(`);
  });
});

describe('renderPng() draws text from glyph outlines', () => {
  it('differs from resvg drawing the real <text> only in anti-aliasing at glyph edges', () => {
    const scene = textRunsScene();
    const text = fromText(scene);
    const ink = darkPixels(text, { x0: 0, y0: 0, x1: text.width, y1: text.height });
    expect(ink).toBeGreaterThan(5000);
    // Coverage steps of a quarter (64 levels) are anti-aliasing; a misplaced glyph differs by up to 255.
    expect(differingPixels(text, fromOutlines(scene), { toleranceLevels: 80 })).toBe(0);
    expect(differingPixels(text, fromOutlines(scene), { toleranceLevels: 16 })).toBeLessThan(ink * 0.05);
    // The same check sees text moved by 0.2 mm (1.2 px): thousands of pixels differ.
    expect(differingPixels(text, fromOutlines(moved(scene, 0.2)), { toleranceLevels: 80 })).toBeGreaterThan(ink * 0.2);
  });

  it.each(textNodes(textRunsScene()).map((node) => [node.text, node] as const))(
    'draws "%s" inside its textBox and nowhere else',
    (_, node) => {
      const pixels = fromOutlines(sceneOf({ children: [node] }));
      const b = textBox(node);
      const box = (padPx: number) => ({
        x0: Math.floor(b.x * PX_PER_MM) - padPx,
        y0: Math.floor(b.y * PX_PER_MM) - padPx,
        x1: Math.ceil((b.x + b.width) * PX_PER_MM) + padPx,
        y1: Math.ceil((b.y + b.height) * PX_PER_MM) + padPx,
      });
      const everywhere = darkPixels(pixels, { x0: 0, y0: 0, x1: pixels.width, y1: pixels.height });
      expect(everywhere).toBeGreaterThan(300);
      expect(darkPixels(pixels, box(1))).toBe(everywhere);
    },
  );

  it('writes the same bytes with the glyph caches cold and warm', async () => {
    const scene = everyNodeKindScene();
    const warmSvg = renderSvg(scene, { text: 'outlines' });
    const warmPng = renderPng(scene, { dpi: 100 });
    vi.resetModules();
    const cold = await import('../../src/render/png.ts');
    const coldSvg = await import('../../src/render/svg.ts');
    expect(coldSvg.renderSvg(scene, { text: 'outlines' })).toBe(warmSvg);
    expect(Buffer.from(cold.renderPng(scene, { dpi: 100 })).equals(Buffer.from(warmPng))).toBe(true);
  });
});
