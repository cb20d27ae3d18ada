/**
 * The wall chart's right-hand column: the key (every mark of the ladder and the power panel), the
 * conditions the chart was drawn for, notes for any callouts, and the cautions. Laid out at a given
 * fine-print size; the sheet picks the largest size (10 pt down to the 8 pt floor) whose column fits.
 */
import type { Boat, SiteConfig } from '../../data/types.ts';
import type { WallChartResult } from '../../analysis/index.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import { isWarning, type MatchStatus } from '../../analysis/index.ts';
import { measureTextMm } from '../../scene/text.ts';
import { linePitchMm, paragraph } from '../kit/block.ts';
import { cautionsBlock } from '../kit/cautions.ts';
import { INK, INK_SOFT, PAPER_WHITE, STROKE, WARN, WINDOW_EDGE, WINDOW_FILL, WINDOW_OPACITY, stroke } from '../kit/style.ts';
import { limitLine, statusShape, statusWords, statusWordsHeightMm } from '../kit/warningMarks.ts';
import { LADDER_WORDS } from './ladder.ts';

/** Gap (mm) between the side column's two columns. */
export const SIDE_COLUMN_GAP_MM = 6;

/** Width (mm) of the key's samples; the words start after them. */
const SAMPLE_MM = 22;

/** Most boats named in "(as fitted in …)"; a shop with a fleet on one pairing gets a count, not a wall of names. */
export const MAX_NAMED_BOATS = 3;

/**
 * "Reedshank, Floodmoth Two and Cloudpail Express": boat names without their bracketed descriptions; past
 * MAX_NAMED_BOATS the first ones (in the data's order) and "and N more", so the side column holds any fleet.
 */
export function boatList(boats: readonly Boat[]): string {
  const names = boats.map((b) => b.name.replace(/\s*\(.*\)\s*$/, ''));
  if (names.length > MAX_NAMED_BOATS) {
    return `${names.slice(0, MAX_NAMED_BOATS).join(', ')} and ${names.length - MAX_NAMED_BOATS} more`;
  }
  return names.length < 2 ? names.join('') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** What each status means, completing the ladder's word in the key. */
const STATUS_MEANING: Readonly<Record<MatchStatus, string>> = Object.freeze({
  matched: 'WOT rpm inside the window: the impeller to fit',
  aboveWindow: 'usable, but WOT rpm above the window: a heavier impeller fits better',
  belowWindow: 'too heavy: the engine cannot reach its window',
  revLimited: 'too light: the engine reaches its maximum rpm',
  noCrossing: 'the engine data does not reach an operating point',
});

type Part = { nodes: readonly SceneNode[]; heightMm: number };

/** One key row: a sample drawn at the left (centred on the first line), words wrapped beside it. */
function keyRow(args: { x: number; y: number; widthMm: number; sizePt: number; text: string; sample: (cx: number, mid: number) => SceneNode[]; minHeightMm: number; sampleMm: number; where: string }): Part {
  const SAMPLE_MM = args.sampleMm;
  const words = paragraph({ x: args.x + SAMPLE_MM + 2, y: args.y, widthMm: args.widthMm - SAMPLE_MM - 2, text: args.text, sizePt: args.sizePt, role: 'legend-text', where: args.where });
  const firstMid = args.y + linePitchMm(args.sizePt) / 2;
  const mid = Math.max(firstMid, args.y + args.minHeightMm / 2);
  const shift = mid - firstMid;
  const nodes = shift > 0 ? paragraph({ x: args.x + SAMPLE_MM + 2, y: args.y + shift, widthMm: args.widthMm - SAMPLE_MM - 2, text: args.text, sizePt: args.sizePt, role: 'legend-text', where: args.where }).nodes : words.nodes;
  return { nodes: [...args.sample(args.x, mid), ...nodes], heightMm: Math.max(words.heightMm + shift, args.minHeightMm) };
}

/** The key of the ladder's marks, statuses in the order a shop reads them. */
function ladderKey(args: { x: number; y: number; widthMm: number; sizePt: number; tolerancePct: number; statuses: readonly MatchStatus[]; panel: boolean; where: string }): Part {
  const { x, widthMm, sizePt, where } = args;
  const nodes: SceneNode[] = [];
  let cursor = args.y;
  const wordPt = 12;
  // Samples as wide as the widest status word in its box, so the words beside them line up.
  const sampleMm = Math.max(SAMPLE_MM, 5 + Math.max(...args.statuses.map((s) => measureTextMm({ text: LADDER_WORDS[s], sizePt: wordPt, weight: isWarning(s) ? 'bold' : 'regular' }) + 2)));
  const add = (text: string, sample: (x0: number, mid: number) => SceneNode[], minHeightMm = 4.6) => {
    const row = keyRow({ x, y: cursor, widthMm, sizePt, text, sample, minHeightMm, sampleMm, where });
    nodes.push(...row.nodes);
    cursor += row.heightMm + 0.8;
  };
  const h = 4.4;
  add('recommended WOT window of the engine variant (shaded, solid edges)', (x0, mid) => [
    { type: 'rect', role: 'legend-band', x: x0 + 3, y: mid - h / 2, width: sampleMm - 8, height: h, fill: { colour: WINDOW_FILL, opacity: WINDOW_OPACITY } },
    ...[x0 + 3, x0 + sampleMm - 5].map((wx): SceneNode => ({ type: 'path', role: 'legend-sample', segments: [{ op: 'M', x: wx, y: mid - h / 2 }, { op: 'L', x: wx, y: mid + h / 2 }], stroke: stroke(WINDOW_EDGE, STROKE.rule) })),
  ]);
  add("maximum rpm: never run past it (hatched side)", (x0, mid) => limitLine({ x: x0 + sampleMm / 2, y0: mid - h / 2, y1: mid + h / 2, depthMm: sampleMm / 2 - 3, role: 'legend-sample' }));
  add(`predicted WOT rpm, bar: from the heaviest to the lightest tolerance corner (impeller ± ${args.tolerancePct} %, engine power and water)`, (x0, mid) => [
    { type: 'path', role: 'legend-sample', segments: [{ op: 'M', x: x0 + 4, y: mid }, { op: 'L', x: x0 + sampleMm - 4, y: mid }], stroke: stroke(INK, STROKE.series) },
    { type: 'path', role: 'legend-sample', segments: [{ op: 'M', x: x0 + 4, y: mid - 1.4 }, { op: 'L', x: x0 + 4, y: mid + 1.4 }, { op: 'M', x: x0 + sampleMm - 4, y: mid - 1.4 }, { op: 'L', x: x0 + sampleMm - 4, y: mid + 1.4 }], stroke: stroke(INK, STROKE.rule) },
    statusShape({ status: 'matched', cx: x0 + sampleMm / 2, cy: mid, sizeMm: 3.4, role: 'legend-marker' }),
  ]);
  for (const status of args.statuses) {
    const warn = isWarning(status);
    const wordsH = statusWordsHeightMm(wordPt, warn);
    add(STATUS_MEANING[status], (x0, mid) => [
      statusShape({ status, cx: x0 + 2, cy: mid, sizeMm: 3.4, role: 'legend-marker' }),
      ...statusWords({ x: x0 + 5, top: mid - wordsH / 2, text: LADDER_WORDS[status], sizePt: wordPt, warn, role: 'legend-status', where }).nodes,
    ], wordsH + 0.4);
  }
  if (args.panel) add('power panel: open circle a WOT point, warning square one that lugs or over-revs; dotted lines constant-power cruise', (x0, mid) => [
    { type: 'circle', role: 'legend-marker', cx: x0 + 6, cy: mid, r: 1, fill: { colour: PAPER_WHITE }, stroke: stroke(INK, STROKE.rule) },
    { type: 'rect', role: 'legend-marker', x: x0 + 11, y: mid - 1.1, width: 2.2, height: 2.2, fill: { colour: WARN }, stroke: stroke(INK, STROKE.rule) },
  ]);
  return { nodes, heightMm: cursor - args.y };
}

/** Lays out the side column in its box at a fine-print size; returns the height used (may exceed the box). */
export function wallChartSide(args: {
  box: Box;
  result: WallChartResult;
  /** Boats pairing this engine family with this jet whose drive line is the chart's. */
  driveLineBoats: readonly Boat[];
  notes: readonly string[];
  /** The power panel is on the page (its marks get a key row). */
  panel?: boolean;
  site: SiteConfig;
  sizePt: number;
  headingPt: number;
  /** Two columns put the cautions in a column of their own beside the key and conditions (long shop cautions). */
  columns?: 1 | 2;
  where: string;
}): Part {
  const { box, result, where, sizePt } = args;
  const columns = args.columns ?? 1;
  const widthMm = columns === 2 ? (box.width - SIDE_COLUMN_GAP_MM) / 2 : box.width;
  let x = box.x;
  const content: SceneNode[] = [];
  let cursor = box.y;
  const push = (block: Part, after: number) => {
    content.push(...block.nodes);
    cursor += block.heightMm + after;
  };
  const text = (t: string, opts: { sizePt?: number; weight?: 'bold'; role?: string } = {}) =>
    paragraph({ x, y: cursor, widthMm, text: t, sizePt: opts.sizePt ?? sizePt, weight: opts.weight, role: opts.role, where });

  push(text('Key', { sizePt: args.headingPt, weight: 'bold', role: 'heading' }), 1);
  const order: readonly MatchStatus[] = ['matched', 'aboveWindow', 'belowWindow', 'revLimited', 'noCrossing'];
  const present = new Set(result.pairings.map((p) => p.band.nominal.status));
  push(ladderKey({ x, y: cursor, widthMm, sizePt, tolerancePct: result.tolerancePct, statuses: order.filter((s) => s !== 'noCrossing' || present.has(s)), panel: args.panel ?? true, where }), 3);

  push(text('Drawn for', { sizePt: args.headingPt, weight: 'bold', role: 'heading' }), 1);
  const c = result.conditions;
  const fitted = args.driveLineBoats.length > 0 ? ` (as fitted in ${boatList(args.driveLineBoats)})` : '';
  // The site's own name, then whatever of pressure, temperature and humidity the name does not already say.
  const air = `${c.siteLabel} (${[`${c.pressureKpa.toFixed(1)} kPa`, ...(c.siteLabel.includes('°C') ? [] : [`${Math.round(c.airTempC)} °C`]), ...(c.siteLabel.includes('RH') ? [] : [`${Math.round(c.relativeHumidityPct)} % RH`])].join(', ')})`;
  for (const line of [
    `Drive line: ${c.driveRatio === 1 ? 'direct drive' : `reduction ${c.driveRatio.toFixed(2)}:1`}, ${Math.round(c.driveEfficiency * 100)} % efficient${fitted}.`,
    `Water: ${c.waterKind}, ${Math.round(c.waterDensityKgM3)} kg/m³. Air: ${air}.`,
    `Absorption exponent ${result.exponent}; impeller ratings ± ${result.tolerancePct} %.`,
    ...args.notes,
  ]) {
    push(text(line, { role: 'conditions' }), 1.2);
  }
  let height = cursor - box.y;
  if (columns === 2) {
    x = box.x + widthMm + SIDE_COLUMN_GAP_MM;
    cursor = box.y;
  } else {
    cursor += 2.5;
  }
  push(cautionsBlock({ site: args.site, x, y: cursor, widthMm, sizePt, headingPt: args.headingPt, where }), 0);
  height = Math.max(height, cursor - box.y);
  return { nodes: content, heightMm: height };
}


