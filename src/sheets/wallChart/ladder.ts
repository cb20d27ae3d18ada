/**
 * The rpm ladder, the wall chart's answer to "which impeller puts this engine in its window?": one row
 * per impeller from the lightest to the heaviest, one column per engine variant. Each cell holds a short
 * horizontal rpm scale (the same range in every cell) with the variant's WOT window shaded, its maximum
 * rpm as a stop line with the forbidden side hatched, the predicted WOT rpm as a status-shaped mark on
 * its tolerance bar, and, in large type, the predicted rpm and the status in words.
 *
 * Two cell forms, both with tick labels under each column heading: `tall` (figures and words on a line
 * above the scale) and `compact` (scale, figure and words on one line, for long impeller lists).
 */
import { isWarning, type MatchStatus, type WallChartResult } from '../../analysis/index.ts';
import type { Box, FontWeight, SceneNode } from '../../scene/types.ts';
import { fitText, fontExtentMm, measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm, paragraph } from '../kit/block.ts';
import { rpmText } from '../kit/format.ts';
import { GRID, INK, INK_SOFT, STROKE, WINDOW_EDGE, WINDOW_FILL, WINDOW_OPACITY, stroke } from '../kit/style.ts';
import { limitLine, statusShape, statusShapeBox, statusWords, statusWordsHeightMm, statusWordsWidthMm } from '../kit/warningMarks.ts';

/** The ladder's status words: short, our own, read at a glance (the results table on the site has the long form). */
export const LADDER_WORDS: Readonly<Record<MatchStatus, string>> = Object.freeze({
  matched: 'in window',
  aboveWindow: 'runs high',
  belowWindow: 'lugs',
  revLimited: 'over-revs',
  noCrossing: 'no point',
});

export type LadderForm = 'tall' | 'compact';

/** Type sizes (pt) of each form: the predicted rpm, the status words, the row labels. */
export const LADDER_TYPE: Readonly<Record<LadderForm, { figurePt: number; wordPt: number }>> = Object.freeze({
  tall: { figurePt: 18, wordPt: 14 },
  compact: { figurePt: 14, wordPt: 12 },
});
const ROW_LABEL_PT = 12;
const HEADING_PT = 12;
/** Row labels shrink to fit this width, never under the 8 pt floor. */
const ROW_LABEL_MAX_MM = 40;
const FLOOR_PT = 8;
const PAD_MM = 2.2;
const STRIP_MM: Readonly<Record<LadderForm, number>> = { tall: 5.6, compact: 4.4 };
const MARK_MM: Readonly<Record<LadderForm, number>> = { tall: 3.6, compact: 3.2 };
/** Least length (mm) of a cell's rpm scale. */
export const MIN_STRIP_MM = 12;
/** Compact rows: preferred and least pitch (mm). */
const COMPACT_PITCH_MM = 9;

export interface LadderArgs {
  readonly x: number;
  readonly y: number;
  readonly widthMm: number;
  readonly result: WallChartResult;
  /** Column headings (variant names without the words they share). */
  readonly headings: readonly string[];
  /** Type size of the limits line and tick labels. */
  readonly smallPt: number;
  /** The cells' rpm range; the result's own (ladderRpmRange) when absent. A chart over several pages passes its whole family's. */
  readonly range?: readonly [number, number];
  readonly where: string;
}

export interface LadderPlan {
  readonly form: LadderForm;
  readonly heightMm: number;
  /** Least height (mm) this form can take (compact rows at their least pitch). */
  readonly minHeightMm: number;
  /** False when the columns are too narrow for this form. */
  readonly fitsWidth: boolean;
  /** Draws the ladder; `heightMm` (at least minHeightMm) spreads compact rows, tall rows keep their pitch. */
  draw(heightMm?: number): { nodes: SceneNode[]; heightMm: number };
}

const bold = (text: string, sizePt: number) => measureTextMm({ text, sizePt, weight: 'bold' });
const boxHeight = (sizePt: number, weight: FontWeight) => {
  const e = fontExtentMm({ sizePt, weight });
  return e.ascentMm + e.descentMm;
};

/** The shared rpm range of every cell: below the heaviest corner and every window, past the highest limit. */
export function ladderRpmRange(result: WallChartResult): [number, number] {
  const low = Math.min(...result.pairings.map((p) => p.band.low.speedRpm), ...result.variants.map((v) => v.limits.windowLowRpm));
  const high = Math.max(...result.variants.map((v) => v.limits.maxRpm), ...result.pairings.map((p) => p.band.high.speedRpm));
  return [Math.floor((low * 0.98) / 100) * 100, Math.ceil((high * 1.04) / 100) * 100];
}

/** The ladder's row order: lightest (lowest rating) first, ties by id. */
export function ladderOrder<T extends { readonly ratingKw: number; readonly impellerId: string }>(impellers: readonly T[]): T[] {
  return [...impellers].sort((a, b) => a.ratingKw - b.ratingKw || a.impellerId.localeCompare(b.impellerId));
}

/** Round tick values inside the range, spaced so labels of `sizePt` do not touch across `lengthMm`. */
function ticks(range: readonly [number, number], lengthMm: number, sizePt: number): number[] {
  const labelMm = measureTextMm({ text: '8888', sizePt, weight: 'regular' }) + 2;
  for (const step of [250, 500, 1000, 2000]) {
    if ((step / (range[1] - range[0])) * lengthMm < labelMm) continue;
    const out: number[] = [];
    for (let v = Math.ceil(range[0] / step) * step; v <= range[1]; v += step) out.push(v);
    // Keep the end labels inside the strip.
    return out.filter((v) => ((v - range[0]) / (range[1] - range[0])) * lengthMm >= labelMm / 2 && ((range[1] - v) / (range[1] - range[0])) * lengthMm >= labelMm / 2);
  }
  return [];
}

/** Lays out the ladder in a form; measure first (`heightMm`, `fitsWidth`), then draw. */
export function planLadder(args: LadderArgs, form: LadderForm): LadderPlan {
  const { result, where } = args;
  const { figurePt, wordPt } = LADDER_TYPE[form];
  const impellers = ladderOrder(result.impellers);
  const variants = result.variants;

  // Row labels: bold 12 pt, shrunk (never under 8 pt) to the column's cap.
  const labelW = Math.min(ROW_LABEL_MAX_MM, Math.max(bold('Impeller', HEADING_PT), ...impellers.map((i) => bold(i.label, ROW_LABEL_PT))) + PAD_MM);
  const rowLabels = impellers.map((i) => fitText({ text: i.label, sizePt: ROW_LABEL_PT, weight: 'bold', maxWidthMm: labelW - PAD_MM, minSizePt: FLOOR_PT }));
  const colW = (args.widthMm - labelW) / variants.length;
  const colX = (c: number) => args.x + labelW + c * colW;

  // What a cell's words take: the figure slot ("8888") and the widest status present.
  const statuses = [...new Set(result.pairings.map((p) => p.band.nominal.status))];
  const figureW = bold('8888', figurePt);
  const wordW = Math.max(...statuses.map((s) => statusWordsWidthMm(LADDER_WORDS[s], wordPt, isWarning(s))));
  const gap = 1.6;
  const textW = figureW + gap + wordW;
  const stripLen = form === 'tall' ? colW - 2 * PAD_MM : colW - 2 * PAD_MM - gap - textW;
  const fitsWidth = form === 'tall' ? textW <= colW - 2 * PAD_MM && stripLen >= MIN_STRIP_MM : stripLen >= MIN_STRIP_MM;

  // Column headings: the variant's name, then its window and limit, then (tall form) the tick labels.
  const headParas = variants.map((v, c) => {
    const w = Math.max(colW - 2 * PAD_MM, 5);
    const name = wrapOrFit({ x: colX(c) + PAD_MM, y: args.y, widthMm: w, text: args.headings[c], sizePt: HEADING_PT, weight: 'bold', role: 'ladder-heading', where });
    const lim = v.limits;
    const limits = wrapOrFit({ x: colX(c) + PAD_MM, y: args.y + name.heightMm, widthMm: w, text: `window ${rpmText(lim.windowLowRpm)}–${rpmText(lim.windowHighRpm)} · max ${rpmText(lim.maxRpm)}`, sizePt: args.smallPt, weight: 'regular', role: 'ladder-limits', where });
    return { nodes: [...name.nodes, ...limits.nodes], heightMm: name.heightMm + limits.heightMm };
  });
  const impHead = paragraph({ x: args.x, y: args.y, widthMm: labelW - 1, text: 'Impeller', sizePt: HEADING_PT, weight: 'bold', role: 'ladder-heading', where });
  const lightest = paragraph({ x: args.x, y: args.y + impHead.heightMm, widthMm: labelW - 1, text: 'lightest first', sizePt: args.smallPt, colour: INK_SOFT, role: 'ladder-limits', where });
  const range = args.range ?? ladderRpmRange(result);
  const tickValues = ticks(range, stripLen, args.smallPt);
  const tickRowMm = tickValues.length > 0 ? linePitchMm(args.smallPt) + 0.6 : 0;
  const headH = Math.max(impHead.heightMm + lightest.heightMm, ...headParas.map((h) => h.heightMm)) + tickRowMm + 1.2;

  const figureBox = boxHeight(figurePt, 'bold');
  const tallPitch = 1.4 + figureBox + 1.0 + STRIP_MM.tall + 2.0;
  const compactMin = Math.max(figureBox, statusWordsHeightMm(wordPt, true), rowLabels[0] ? boxHeight(ROW_LABEL_PT, 'bold') : 0) + 0.9;
  const rows = impellers.length;
  const pitchFor = (heightMm: number | undefined): number => {
    if (form === 'tall') return tallPitch;
    const room = heightMm === undefined ? COMPACT_PITCH_MM : (heightMm - headH) / rows;
    return Math.max(compactMin, Math.min(COMPACT_PITCH_MM, room));
  };

  const draw = (heightMm?: number): { nodes: SceneNode[]; heightMm: number } => {
    const pitch = pitchFor(heightMm);
    const nodes: SceneNode[] = [];
    const texts: SceneNode[] = [impHead.nodes, lightest.nodes, ...headParas.map((h) => h.nodes)].flat();
    const top = args.y + headH;
    const right = args.x + args.widthMm;
    const bottom = top + rows * pitch;
    const x = (c: number, rpm: number) => colX(c) + PAD_MM + ((rpm - range[0]) / (range[1] - range[0])) * stripLen;
    // Tick labels under each heading, and faint tick lines down through every strip.
    variants.forEach((_, c) => {
      for (const t of tickValues) {
        texts.push(label({ x: x(c, t), y: top - 1.2 - 0.6 - linePitchMm(args.smallPt) + ascentMm(args.smallPt), text: String(t), sizePt: args.smallPt, anchor: 'middle', colour: INK_SOFT, role: 'ladder-tick-label', key: `tick:${t}`, where }));
      }
    });
    // Rules: under the headings (heavy), between rows (light), between columns.
    nodes.push({ type: 'path', role: 'ladder-rule', segments: [{ op: 'M', x: args.x, y: top }, { op: 'L', x: right, y: top }], stroke: stroke(INK, STROKE.axis) });
    for (let r = 1; r <= rows; r++) nodes.push({ type: 'path', role: 'ladder-row-rule', segments: [{ op: 'M', x: args.x, y: top + r * pitch }, { op: 'L', x: right, y: top + r * pitch }], stroke: stroke(r === rows ? INK : GRID, r === rows ? STROKE.axis : STROKE.grid) });
    for (let c = 0; c < variants.length; c++) nodes.push({ type: 'path', role: 'ladder-column-rule', segments: [{ op: 'M', x: colX(c), y: args.y }, { op: 'L', x: colX(c), y: bottom }], stroke: stroke(GRID, STROKE.rule) });

    impellers.forEach((imp, r) => {
      const rowTop = top + r * pitch;
      const textTop = form === 'tall' ? rowTop + 1.4 : rowTop + (pitch - figureBox) / 2;
      const fitted = rowLabels[r];
      const labelBox = boxHeight(fitted.sizePt, 'bold');
      texts.push(label({ x: args.x, y: textTop + (figureBox - labelBox) / 2 + ascentMm(fitted.sizePt, 'bold'), text: fitted.text, sizePt: fitted.sizePt, weight: 'bold', role: 'ladder-impeller', key: `impeller:${imp.impellerId}`, where }));
      variants.forEach((v, c) => {
        const p = result.pairings.find((q) => q.variantId === v.variantId && q.impellerId === imp.impellerId);
        if (!p) return;
        const key = `impeller:${imp.impellerId}|engine:${v.variantId}`;
        const status = p.band.nominal.status;
        const warn = isWarning(status);
        const stripTop = form === 'tall' ? textTop + figureBox + 1.0 : rowTop + (pitch - STRIP_MM.compact) / 2;
        const stripH = STRIP_MM[form];
        const s0 = colX(c) + PAD_MM;
        const textX = form === 'tall' ? s0 : s0 + stripLen + gap;
        // Words: the predicted rpm right-aligned in its slot, then the status.
        texts.push(label({ x: textX + figureW, y: textTop + ascentMm(figurePt, 'bold'), text: rpmText(p.band.nominal.speedRpm), sizePt: figurePt, weight: 'bold', anchor: 'end', role: 'ladder-rpm', key, where }));
        const wordsH = statusWordsHeightMm(wordPt, warn);
        texts.push(...statusWords({ x: textX + figureW + gap, top: textTop + (figureBox - wordsH) / 2, text: LADDER_WORDS[status], sizePt: wordPt, warn, role: 'ladder-status', key, where }).nodes);
        nodes.push(...strip({ x0: s0, lengthMm: stripLen, top: stripTop, heightMm: stripH, x: (rpm) => x(c, rpm), limits: v.limits, band: p.band, status, markMm: MARK_MM[form], ticks: tickValues, key }));
      });
    });
    return { nodes: [{ type: 'group', role: 'rpm-ladder', children: [...nodes, ...texts] }], heightMm: bottom - args.y };
  };

  return { form, heightMm: headH + rows * pitchFor(undefined), minHeightMm: headH + rows * (form === 'tall' ? tallPitch : compactMin), fitsWidth, draw };
}

/** A wrapped paragraph, or when one word is wider than the column, that text shrunk (to 8 pt) or shortened. */
function wrapOrFit(args: { x: number; y: number; widthMm: number; text: string; sizePt: number; weight: FontWeight; role: string; where: string }): { nodes: SceneNode[]; heightMm: number } {
  const longest = Math.max(...args.text.split(/\s+/).map((w) => measureTextMm({ text: w, sizePt: args.sizePt, weight: args.weight })));
  if (longest <= args.widthMm) {
    const p = paragraph({ ...args, colour: args.weight === 'bold' ? INK : INK_SOFT });
    return { nodes: [...p.nodes], heightMm: p.heightMm };
  }
  const fit = fitText({ text: args.text, sizePt: args.sizePt, weight: args.weight, maxWidthMm: args.widthMm, minSizePt: FLOOR_PT });
  const node = label({ x: args.x, y: args.y + ascentMm(fit.sizePt, args.weight), text: fit.text, sizePt: fit.sizePt, weight: args.weight, colour: args.weight === 'bold' ? INK : INK_SOFT, role: args.role, where: args.where });
  return { nodes: [node], heightMm: linePitchMm(fit.sizePt, args.weight) };
}

/** One cell's rpm scale: frame, window, limit with hatch, tolerance bar and the status-shaped WOT mark. */
function strip(args: {
  x0: number;
  lengthMm: number;
  top: number;
  heightMm: number;
  x: (rpm: number) => number;
  limits: WallChartResult['variants'][number]['limits'];
  band: WallChartResult['pairings'][number]['band'];
  status: MatchStatus;
  markMm: number;
  ticks: readonly number[];
  key: string;
}): SceneNode[] {
  const { top, heightMm: h, x, limits, band, key } = args;
  const bottom = top + h;
  const mid = top + h / 2;
  const x1 = args.x0 + args.lengthMm;
  const nodes: SceneNode[] = [];
  const wx0 = x(limits.windowLowRpm);
  const wx1 = x(limits.windowHighRpm);
  nodes.push({ type: 'rect', role: 'wot-window', key, x: wx0, y: top, width: wx1 - wx0, height: h, fill: { colour: WINDOW_FILL, opacity: WINDOW_OPACITY } });
  for (const wx of [wx0, wx1]) nodes.push({ type: 'path', role: 'wot-window-edge', key, segments: [{ op: 'M', x: wx, y: top }, { op: 'L', x: wx, y: bottom }], stroke: stroke(WINDOW_EDGE, STROKE.rule) });
  for (const t of args.ticks) nodes.push({ type: 'path', role: 'ladder-tick', key: `tick:${t}`, segments: [{ op: 'M', x: x(t), y: top }, { op: 'L', x: x(t), y: bottom }], stroke: stroke(GRID, STROKE.grid) });
  nodes.push({ type: 'rect', role: 'ladder-strip', key, x: args.x0, y: top, width: args.lengthMm, height: h, stroke: stroke(INK_SOFT, STROKE.grid) });
  const lx = x(limits.maxRpm);
  nodes.push(...limitLine({ x: lx, y0: top, y1: bottom, depthMm: x1 - lx, widthMm: STROKE.engine, role: 'rev-limit', key }));
  // Tolerance bar: heavy ink from the heavy corner to the light corner, with end ticks.
  const b0 = x(band.low.speedRpm);
  const b1 = x(band.high.speedRpm);
  const cap = h * 0.32;
  nodes.push({ type: 'path', role: 'tolerance-bar', key, segments: [{ op: 'M', x: b0, y: mid }, { op: 'L', x: b1, y: mid }], stroke: stroke(INK, STROKE.series) });
  nodes.push({ type: 'path', role: 'tolerance-bar-end', key, segments: [{ op: 'M', x: b0, y: mid - cap }, { op: 'L', x: b0, y: mid + cap }, { op: 'M', x: b1, y: mid - cap }, { op: 'L', x: b1, y: mid + cap }], stroke: stroke(INK, STROKE.rule) });
  nodes.push(statusShape({ status: args.status, cx: x(band.nominal.speedRpm), cy: mid, sizeMm: args.markMm, role: 'operating-point', key }));
  return nodes;
}

/** The box (mm) a WOT mark covers in a cell, for tests. */
export function ladderMarkBox(cx: number, cy: number, form: LadderForm): Box {
  return statusShapeBox(cx, cy, MARK_MM[form]);
}
