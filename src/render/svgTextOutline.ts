/**
 * A text node drawn as its glyph outlines (one path) for rasterising: same font, same shaping and
 * the same anchor, rotation and colour as the <text> element, but nothing left for the rasteriser
 * to lay out. The SVG downloads keep real <text> so their text stays selectable.
 */
import { textOutline } from '../scene/glyphOutlines.ts';
import { MM_PER_PT } from '../scene/text.ts';
import type { TextNode } from '../scene/types.ts';
import { num } from './svgNumbers.ts';

// mm per font unit is about 0.004 at 10 pt, so num()'s 3 decimals would be far too coarse for the
// scale: 9 decimals keep a 400 mm run within 1 µm.
const scaleText = (mmPerUnit: number): string => String(Number(mmPerUnit.toFixed(9)));

/** Path data (font units) and the transform that places it on the page (mm), or undefined for no ink. */
export function outlinedText(node: TextNode): { d: string; transform: string } | undefined {
  const outline = textOutline(node);
  if (outline.d === '') return undefined;
  const mmPerUnit = (node.sizePt * MM_PER_PT) / outline.unitsPerEm;
  // Distance along the baseline from the anchor to the start of the run, from the scene's measured
  // width (the same width textBox() and the PDF use).
  const startOffsetMm = node.anchor === 'start' ? 0 : node.anchor === 'middle' ? -node.widthMm / 2 : -node.widthMm;
  // Rotated 90° counter-clockwise on paper: the baseline runs up the page (−y), as SVG's rotate(-90).
  const place = node.rotateDeg === 90 ? `translate(${num(node.x)} ${num(node.y - startOffsetMm)}) rotate(-90)` : `translate(${num(node.x + startOffsetMm)} ${num(node.y)})`;
  return { d: outline.d, transform: `${place} scale(${scaleText(mmPerUnit)})` };
}
