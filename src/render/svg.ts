/**
 * Scene → SVG text. Translation only: every position and width comes from the scene.
 * The font is NOT embedded (a base64 @font-face would add ~300 kB per file); text is set in
 * 'Source Sans 3' with kerning off, so a viewer with the font draws runs exactly as wide as the
 * widths measured in src/scene/text.ts. For rasterising, text can instead be written as glyph
 * outlines (`text: 'outlines'`), which a rasteriser draws without laying out any text.
 */
import { FONT_FAMILY } from '../scene/fonts.ts';
import { MM_PER_PT, printableText } from '../scene/text.ts';
import type { ClipRect, Fill, PathSegment, Scene, SceneNode, Stroke, Tagged, TextNode } from '../scene/types.ts';
import { assertDrawable } from './errors.ts';
import { num } from './svgNumbers.ts';
import { outlinedText } from './svgTextOutline.ts';

export { num };

/** How text is written: real <text> elements (selectable, needs the font) or glyph outlines as paths. */
export type SvgTextMode = 'text' | 'outlines';

export interface SvgOptions {
  /** Default 'text'. 'outlines' is for rasterising: no font needed, nothing to lay out. */
  readonly text?: SvgTextMode;
}

// Beyond control characters, XML 1.0 forbids lone surrogates and U+FFFE/U+FFFF.
const XML_FORBIDDEN = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]|[\uFFFE\uFFFF]/g;
const XML_ENTITIES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/** Text safe inside XML content and double-quoted attributes ("]]>" cannot survive: > is escaped). */
export function escapeXml(text: string): string {
  return printableText(text).replace(XML_FORBIDDEN, '').replace(/[&<>"']/g, (ch) => XML_ENTITIES[ch] ?? ch);
}

/** Per-render state: clip ids count up in document order, so ids are stable between runs. */
interface Context {
  readonly defs: string[];
  readonly textMode: SvgTextMode;
  clipCount: number;
}

function attrs(pairs: ReadonlyArray<readonly [string, string | undefined]>): string {
  return pairs
    .filter((pair): pair is readonly [string, string] => pair[1] !== undefined)
    .map(([name, value]) => ` ${name}="${value}"`)
    .join('');
}

function tagAttrs(node: Tagged): Array<readonly [string, string | undefined]> {
  return [
    ['data-role', node.role === undefined ? undefined : escapeXml(node.role)],
    ['data-key', node.key === undefined ? undefined : escapeXml(node.key)],
  ];
}

function paintAttrs(stroke: Stroke | undefined, fill: Fill | undefined): Array<readonly [string, string | undefined]> {
  const dash = stroke?.dashMm && stroke.dashMm.length > 0 ? stroke.dashMm.map(num).join(' ') : undefined;
  return [
    ['fill', fill ? escapeXml(fill.colour) : 'none'],
    ['fill-opacity', fill?.opacity !== undefined && fill.opacity !== 1 ? num(fill.opacity) : undefined],
    ['stroke', stroke ? escapeXml(stroke.colour) : undefined],
    ['stroke-width', stroke ? num(stroke.widthMm) : undefined],
    ['stroke-dasharray', dash],
    ['stroke-linecap', stroke?.cap],
    ['stroke-linejoin', stroke?.join],
  ];
}

/** SVG path data for segments (mm). */
export function pathData(segments: readonly PathSegment[]): string {
  return segments
    .map((s) => {
      switch (s.op) {
        case 'M':
        case 'L':
          return `${s.op}${num(s.x)} ${num(s.y)}`;
        case 'C':
          return `C${num(s.x1)} ${num(s.y1)} ${num(s.x2)} ${num(s.y2)} ${num(s.x)} ${num(s.y)}`;
        case 'Z':
          return 'Z';
      }
    })
    .join('');
}

const ANCHOR: Readonly<Record<TextNode['anchor'], string>> = { start: 'start', middle: 'middle', end: 'end' };

function textElement(node: TextNode): string {
  assertDrawable(node);
  // Rotation is counter-clockwise on paper; SVG's y-down rotate() is clockwise, hence the minus.
  const rotate = node.rotateDeg === 90 ? `rotate(-90 ${num(node.x)} ${num(node.y)})` : undefined;
  const a = attrs([
    ['x', num(node.x)],
    ['y', num(node.y)],
    ['font-size', num(node.sizePt * MM_PER_PT)],
    ['font-weight', node.weight === 'bold' ? '700' : '400'],
    ['text-anchor', ANCHOR[node.anchor]],
    ['fill', escapeXml(node.colour)],
    ['transform', rotate],
    ...tagAttrs(node),
  ]);
  return `<text${a}>${escapeXml(node.text)}</text>`;
}

/** The text node as one filled path of its glyph outlines (an empty group when it has no ink). */
function outlinedTextElement(node: TextNode): string {
  assertDrawable(node);
  const outline = outlinedText(node);
  if (!outline) return `<g${attrs(tagAttrs(node))}/>`;
  return `<path${attrs([['d', outline.d], ['transform', outline.transform], ['fill', escapeXml(node.colour)], ...tagAttrs(node)])}/>`;
}

function clipAttr(clip: ClipRect | undefined, ctx: Context): string | undefined {
  if (!clip) return undefined;
  ctx.clipCount += 1;
  const id = `clip-${ctx.clipCount}`;
  const rect = attrs([['x', num(clip.x)], ['y', num(clip.y)], ['width', num(clip.width)], ['height', num(clip.height)]]);
  ctx.defs.push(`<clipPath id="${id}"><rect${rect}/></clipPath>`);
  return `url(#${id})`;
}

function element(node: SceneNode, ctx: Context): string {
  switch (node.type) {
    case 'group': {
      const a = attrs([['clip-path', clipAttr(node.clip, ctx)], ...tagAttrs(node)]);
      return `<g${a}>\n${node.children.map((child) => element(child, ctx)).join('\n')}\n</g>`;
    }
    case 'path':
      return `<path${attrs([['d', pathData(node.segments)], ...paintAttrs(node.stroke, node.fill), ...tagAttrs(node)])}/>`;
    case 'rect': {
      const box = [['x', num(node.x)], ['y', num(node.y)], ['width', num(node.width)], ['height', num(node.height)]] as const;
      return `<rect${attrs([...box, ...paintAttrs(node.stroke, node.fill), ...tagAttrs(node)])}/>`;
    }
    case 'circle': {
      const geometry = [['cx', num(node.cx)], ['cy', num(node.cy)], ['r', num(node.r)]] as const;
      return `<circle${attrs([...geometry, ...paintAttrs(node.stroke, node.fill), ...tagAttrs(node)])}/>`;
    }
    case 'text':
      return ctx.textMode === 'outlines' ? outlinedTextElement(node) : textElement(node);
  }
}

/** A self-contained SVG document of the scene, sized in mm with a mm viewBox. */
export function renderSvg(scene: Scene, opts: SvgOptions = {}): string {
  const ctx: Context = { defs: [], textMode: opts.text ?? 'text', clipCount: 0 };
  const body = element(scene.root, ctx);
  const w = num(scene.widthMm);
  const h = num(scene.heightMm);
  const rootAttrs = attrs([
    ['xmlns', 'http://www.w3.org/2000/svg'],
    ['width', `${w}mm`],
    ['height', `${h}mm`],
    ['viewBox', `0 0 ${w} ${h}`],
    ['font-family', `'${FONT_FAMILY}'`],
    ['style', 'font-kerning:none'],
    ['role', 'img'],
  ]);
  const head = ['<?xml version="1.0" encoding="UTF-8"?>', `<svg${rootAttrs}>`, `<title>${escapeXml(scene.title)}</title>`];
  head.push(`<desc>${escapeXml(scene.description)}</desc>`);
  if (ctx.defs.length > 0) head.push(`<defs>\n${ctx.defs.join('\n')}\n</defs>`);
  return `${[...head, body, '</svg>'].join('\n')}\n`;
}
