/**
 * The wall chart's right-hand column: the key (every line, band and marker style used in the panels),
 * the conditions the chart was drawn for, notes for any callouts, and the cautions.
 */
import type { Boat, SiteConfig } from '../../data/types.ts';
import type { WallChartResult } from '../../analysis/index.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import type { ImpellerSeries } from '../chart/seriesTypes.ts';
import { ascentMm, label, linePitchMm, paragraph } from '../kit/block.ts';
import { cautionsBlock } from '../kit/cautions.ts';
import { LayoutError } from '../kit/errors.ts';
import { legend, type LegendRow } from '../kit/legend.ts';
import { INK, INK_SOFT, STROKE, WARN, WINDOW_FILL, type TypeScale } from '../kit/style.ts';
import { pointMarker } from './pointMarker.ts';

/** Where the key's line samples end and its words start (mm), as in kit/legend.ts. */
const SAMPLE_MM = 14;

/** Most boats named in "(as fitted in …)"; a shop with a fleet on one pairing gets a count, not a wall of names. */
export const MAX_NAMED_BOATS = 3;

/**
 * "Ember Reach, Swiftwater Two and Tarn Hollow": boat names without their bracketed descriptions; past
 * MAX_NAMED_BOATS the first ones (in the data's order) and "and N more", so the side column holds any fleet.
 */
export function boatList(boats: readonly Boat[]): string {
  const names = boats.map((b) => b.name.replace(/\s*\(.*\)\s*$/, ''));
  if (names.length > MAX_NAMED_BOATS) {
    return `${names.slice(0, MAX_NAMED_BOATS).join(', ')} and ${names.length - MAX_NAMED_BOATS} more`;
  }
  return names.length < 2 ? names.join('') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** Two key rows for the marker styles: filled (usable) and open with a warning ring (lugs, over-revs). */
function markerKey(args: { x: number; y: number; widthMm: number; sizePt: number; markerMm: number; colour: string; where: string }): { nodes: SceneNode[]; heightMm: number } {
  const pitch = Math.max(linePitchMm(args.sizePt), args.markerMm + 2.2);
  const rows = [
    { warn: false, text: 'WOT point: good match or above window' },
    { warn: true, text: 'WOT point: lugs or over-revs' },
  ];
  const nodes: SceneNode[] = [];
  rows.forEach((row, i) => {
    const mid = args.y + i * pitch + pitch / 2;
    nodes.push(...pointMarker({ shape: 'circle', cx: args.x + SAMPLE_MM / 2, cy: mid, sizeMm: args.markerMm, colour: args.colour, warn: row.warn, role: 'legend-marker' }));
    const text = label({ x: args.x + SAMPLE_MM + 2, y: mid - linePitchMm(args.sizePt) / 2 + ascentMm(args.sizePt), text: row.text, sizePt: args.sizePt, weight: row.warn ? 'bold' : 'regular', colour: row.warn ? WARN : INK, role: 'legend-text', where: args.where });
    if (text.widthMm > args.widthMm - SAMPLE_MM - 2) throw new LayoutError(args.where, `the key entry "${row.text}" is wider than the ${args.widthMm.toFixed(0)} mm column`);
    nodes.push(text);
  });
  return { nodes, heightMm: pitch * rows.length };
}

/** Lays out the side column in its box; throws a LayoutError when it does not fit. */
export function wallChartSide(args: {
  box: Box;
  result: WallChartResult;
  impellers: readonly ImpellerSeries[];
  anyPublishedCurve: boolean;
  /** Boats pairing this engine family with this jet whose drive line is the chart's. */
  driveLineBoats: readonly Boat[];
  droppedCruiseText: string;
  notes: readonly string[];
  markerMm: number;
  site: SiteConfig;
  type: TypeScale;
  where: string;
}): SceneNode[] {
  const { box, result, type, where } = args;
  const x = box.x;
  const widthMm = box.width;
  const content: SceneNode[] = [];
  let cursor = box.y;
  const push = (block: { nodes: readonly SceneNode[]; heightMm: number }, after: number) => {
    content.push(...block.nodes);
    cursor += block.heightMm + after;
  };
  const text = (t: string, opts: { sizePt?: number; weight?: 'bold'; role?: string } = {}) =>
    paragraph({ x, y: cursor, widthMm, text: t, sizePt: opts.sizePt ?? type.small, weight: opts.weight, role: opts.role, where });

  push(text('Key', { sizePt: type.heading, weight: 'bold', role: 'heading' }), 1);
  const rows: LegendRow[] = [
    ...args.impellers.map((imp) => ({ text: `Impeller ${imp.label} ± ${result.tolerancePct} %`, colour: imp.style.colour, widthMm: STROKE.series, dashMm: imp.style.dashMm, marker: { shape: imp.style.marker, fill: imp.style.colour }, bandColour: imp.style.colour })),
    { text: 'Full throttle in the air stated below', colour: INK, widthMm: STROKE.emphasis, dashMm: [] },
    ...(args.anyPublishedCurve ? [{ text: 'Full throttle as published', colour: INK_SOFT, widthMm: STROKE.rule, dashMm: [3, 1.2] }] : []),
    { text: 'Recommended WOT window', colour: WINDOW_FILL, widthMm: STROKE.rule, dashMm: [2, 1], bandColour: WINDOW_FILL },
    { text: 'Maximum engine speed', colour: WARN, widthMm: STROKE.engine, dashMm: [4, 1.5] },
    { text: 'Constant-power cruise line', colour: INK_SOFT, widthMm: STROKE.rule, dashMm: [0.8, 1.2] },
  ];
  push(legend({ x, y: cursor, widthMm, rows, sizePt: type.small, where }), 0.5);
  push(markerKey({ x, y: cursor, widthMm, sizePt: type.small, markerMm: args.markerMm, colour: args.impellers[0]?.style.colour ?? INK, where }), 2);
  push(text('Numbers at the points: nominal WOT rpm. Table: WOT rpm from the heaviest to the lightest tolerance corner.'), 4);

  push(text('Drawn for', { sizePt: type.heading, weight: 'bold', role: 'heading' }), 1);
  const c = result.conditions;
  const fitted = args.driveLineBoats.length > 0 ? ` (as fitted in ${boatList(args.driveLineBoats)})` : '';
  // The site's own name, then whatever of pressure, temperature and humidity the name does not already say.
  const air = `${c.siteLabel} (${[`${c.pressureKpa.toFixed(1)} kPa`, ...(c.siteLabel.includes('°C') ? [] : [`${Math.round(c.airTempC)} °C`]), ...(c.siteLabel.includes('RH') ? [] : [`${Math.round(c.relativeHumidityPct)} % RH`])].join(', ')})`;
  for (const line of [
    `Drive line: ${c.driveRatio === 1 ? 'direct drive' : `reduction ${c.driveRatio.toFixed(2)}:1`}, ${Math.round(c.driveEfficiency * 100)} % efficient${fitted}.`,
    `Water: ${c.waterKind}, ${Math.round(c.waterDensityKgM3)} kg/m³. Air: ${air}.`,
    `Absorption exponent ${result.exponent}; impeller ratings ± ${result.tolerancePct} %.`,
    ...(args.droppedCruiseText ? [args.droppedCruiseText] : []),
    ...args.notes,
  ]) {
    push(text(line, { role: 'conditions' }), 1.2);
  }
  cursor += 3;
  push(cautionsBlock({ site: args.site, x, y: cursor, widthMm, sizePt: type.small, headingPt: type.heading, where }), 0);
  if (cursor > box.y + box.height + 1e-6) {
    throw new LayoutError(where, `the key, conditions and cautions are ${(cursor - box.y - box.height).toFixed(1)} mm too tall for the side column; shorten impeller labels or the shop's cautions`);
  }
  return content;
}
