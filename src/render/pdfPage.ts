/**
 * Draws one scene onto one pdf-lib page with low-level path and text operators.
 * PDF user space has y up in points; the scene has y down in mm. `toPt` is the one place y flips.
 */
import {
  LineCapStyle, LineJoinStyle, PDFName, PDFNumber, PDFOperator, PDFOperatorNames, appendBezierCurve, beginText, clip, closePath, endPath, endText, fill,
  fillAndStroke, lineTo, moveTo, popGraphicsState, pushGraphicsState, rectangle, rotateAndSkewTextDegreesAndTranslate,
  setDashPattern, setFillingGrayscaleColor, setFillingRgbColor, setFontAndSize, setGraphicsState, setLineCap, setLineJoin, setLineWidth,
  setStrokingGrayscaleColor, setStrokingRgbColor, showText, stroke,
} from 'pdf-lib';
import type { PDFFont, PDFPage } from 'pdf-lib';
import { bleedBox } from '../scene/paper.ts';
import { printableText } from '../scene/text.ts';
import type { Box, CircleNode, Colour, FontWeight, PathSegment, Scene, SceneNode, Stroke, Fill, TextNode } from '../scene/types.ts';
import { assertDrawable } from './errors.ts';

const PT_PER_MM = 72 / 25.4;
// Cubic Bézier handle length for a quarter circle: 4/3·(√2 − 1) (the standard circle approximation).
const KAPPA = (4 / 3) * (Math.SQRT2 - 1);

/** Rounds to 1/1000 pt so content streams are short and stable. */
const pt = (valueMm: number): number => Math.round(valueMm * PT_PER_MM * 1000) / 1000;

interface PageContext {
  readonly page: PDFPage;
  readonly heightMm: number;
  readonly fonts: Readonly<Record<FontWeight, PDFFont | undefined>>;
}

/** Scene mm (y down) → PDF points (y up): the single y flip. */
function toPt(ctx: PageContext, xMm: number, yMm: number): [number, number] {
  return [pt(xMm), pt(ctx.heightMm - yMm)];
}

function rgb01(colour: Colour): [number, number, number] {
  const hex = /^#([0-9a-f]{6})$/i.exec(colour)?.[1];
  if (!hex) throw new TypeError(`colour must be "#rrggbb", found "${colour}"`);
  const channel = (i: number): number => parseInt(hex.slice(i, i + 2), 16) / 255;
  return [channel(0), channel(2), channel(4)];
}

/**
 * Fill and stroke colour operators. A neutral colour (black and the greys: r = g = b) is written in
 * DeviceGray, so black text and rules print in the black ink alone rather than as a four-ink mix.
 */
function fillColour(colour: Colour): PDFOperator {
  const [r, g, b] = rgb01(colour);
  return r === g && g === b ? setFillingGrayscaleColor(r) : setFillingRgbColor(r, g, b);
}

function strokeColour(colour: Colour): PDFOperator {
  const [r, g, b] = rgb01(colour);
  return r === g && g === b ? setStrokingGrayscaleColor(r) : setStrokingRgbColor(r, g, b);
}

function circleSegments(node: CircleNode): PathSegment[] {
  const { cx, cy, r } = node;
  const k = r * KAPPA;
  return [
    { op: 'M', x: cx + r, y: cy },
    { op: 'C', x1: cx + r, y1: cy + k, x2: cx + k, y2: cy + r, x: cx, y: cy + r },
    { op: 'C', x1: cx - k, y1: cy + r, x2: cx - r, y2: cy + k, x: cx - r, y: cy },
    { op: 'C', x1: cx - r, y1: cy - k, x2: cx - k, y2: cy - r, x: cx, y: cy - r },
    { op: 'C', x1: cx + k, y1: cy - r, x2: cx + r, y2: cy - k, x: cx + r, y: cy },
    { op: 'Z' },
  ];
}

function rectSegments(x: number, y: number, width: number, height: number): PathSegment[] {
  return [
    { op: 'M', x, y },
    { op: 'L', x: x + width, y },
    { op: 'L', x: x + width, y: y + height },
    { op: 'L', x, y: y + height },
    { op: 'Z' },
  ];
}

function segmentOps(ctx: PageContext, segments: readonly PathSegment[]): PDFOperator[] {
  return segments.map((s) => {
    if (s.op === 'Z') return closePath();
    if (s.op === 'C') return appendBezierCurve(...toPt(ctx, s.x1, s.y1), ...toPt(ctx, s.x2, s.y2), ...toPt(ctx, s.x, s.y));
    return s.op === 'M' ? moveTo(...toPt(ctx, s.x, s.y)) : lineTo(...toPt(ctx, s.x, s.y));
  });
}

// SVG's default miter limit is 4, PDF's is 10: use SVG's so sharp corners look the same in both.
const MITER_LIMIT = 4;
const CAPS = { butt: LineCapStyle.Butt, round: LineCapStyle.Round, square: LineCapStyle.Projecting } as const;
const JOINS = { miter: LineJoinStyle.Miter, round: LineJoinStyle.Round, bevel: LineJoinStyle.Bevel } as const;

function paintOps(ctx: PageContext, strokeSpec: Stroke | undefined, fillSpec: Fill | undefined): PDFOperator[] {
  const ops: PDFOperator[] = [];
  if (fillSpec) {
    ops.push(fillColour(fillSpec.colour));
    if (fillSpec.opacity !== undefined && fillSpec.opacity < 1) {
      const state = ctx.page.doc.context.obj({ Type: 'ExtGState', ca: fillSpec.opacity });
      ops.push(setGraphicsState(ctx.page.node.newExtGState('GS', state)));
    }
  }
  if (strokeSpec) {
    ops.push(strokeColour(strokeSpec.colour), setLineWidth(pt(strokeSpec.widthMm)));
    ops.push(setDashPattern((strokeSpec.dashMm ?? []).map(pt), 0));
    ops.push(setLineCap(CAPS[strokeSpec.cap ?? 'butt']), setLineJoin(JOINS[strokeSpec.join ?? 'miter']));
    ops.push(PDFOperator.of(PDFOperatorNames.SetLineMiterLimit, [PDFNumber.of(MITER_LIMIT)]));
  }
  return ops;
}

function shapeOps(ctx: PageContext, segments: readonly PathSegment[], strokeSpec?: Stroke, fillSpec?: Fill): PDFOperator[] {
  if (!strokeSpec && !fillSpec) return [];
  const paint = strokeSpec && fillSpec ? fillAndStroke() : strokeSpec ? stroke() : fill();
  return [pushGraphicsState(), ...paintOps(ctx, strokeSpec, fillSpec), ...segmentOps(ctx, segments), paint, popGraphicsState()];
}

function textOps(ctx: PageContext, node: TextNode): PDFOperator[] {
  assertDrawable(node);
  const font = ctx.fonts[node.weight];
  if (!font) throw new Error(`no ${node.weight} font embedded for "${node.text}"`);
  // Shift from the anchor back to the start of the run along the baseline (up the page when rotated).
  const shiftMm = node.anchor === 'start' ? 0 : node.anchor === 'middle' ? node.widthMm / 2 : node.widthMm;
  const [xPt, yPt] = node.rotateDeg === 90 ? toPt(ctx, node.x, node.y + shiftMm) : toPt(ctx, node.x - shiftMm, node.y);
  const fontKey = ctx.page.node.newFontDictionary(font.name, font.ref);
  return [
    pushGraphicsState(),
    fillColour(node.colour),
    beginText(),
    setFontAndSize(fontKey, node.sizePt),
    rotateAndSkewTextDegreesAndTranslate(node.rotateDeg ?? 0, 0, 0, xPt, yPt),
    showText(font.encodeText(printableText(node.text))),
    endText(),
    popGraphicsState(),
  ];
}

function nodeOps(ctx: PageContext, node: SceneNode): PDFOperator[] {
  switch (node.type) {
    case 'group': {
      const children = node.children.flatMap((child) => nodeOps(ctx, child));
      if (!node.clip) return children;
      const { x, y, width, height } = node.clip;
      const [left, bottom] = toPt(ctx, x, y + height);
      return [pushGraphicsState(), rectangle(left, bottom, pt(width), pt(height)), clip(), endPath(), ...children, popGraphicsState()];
    }
    case 'path':
      return shapeOps(ctx, node.segments, node.stroke, node.fill);
    case 'rect':
      return shapeOps(ctx, rectSegments(node.x, node.y, node.width, node.height), node.stroke, node.fill);
    case 'circle':
      return shapeOps(ctx, circleSegments(node), node.stroke, node.fill);
    case 'text':
      return textOps(ctx, node);
  }
}

/**
 * Sets the page boxes for the scene (TrimBox and BleedBox on every page: the bleed box is the trim grown
 * by the bleed, the trim itself without bleed) and writes its content stream, all of it one marked-content sequence (tag /Figure, MCID 0) for
 * the page's structure element.
 */
export function drawScene(args: { page: PDFPage; scene: Scene; fonts: PageContext['fonts'] }): void {
  const { page, scene } = args;
  const ctx: PageContext = { page, heightMm: scene.heightMm, fonts: args.fonts };
  // MediaBox (the page size) holds trim, bleed and the crop marks' slug; TrimBox and BleedBox sit inside it.
  const inPt = (box: Box): [number, number, number, number] => [...toPt(ctx, box.x, box.y + box.height), pt(box.width), pt(box.height)];
  page.setTrimBox(...inPt(scene.trimBox));
  page.setBleedBox(...inPt(bleedBox(scene)));
  page.pushOperators(
    PDFOperator.of(PDFOperatorNames.BeginMarkedContentSequence, [PDFName.of('Figure'), '<</MCID 0>>']),
    ...nodeOps(ctx, scene.root),
    PDFOperator.of(PDFOperatorNames.EndMarkedContent),
  );
}
