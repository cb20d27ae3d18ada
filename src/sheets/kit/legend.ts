/**
 * A key: one row per series with a line sample drawn exactly as on the chart (colour, dash, width),
 * its marker when it has one, and its name. Rows are measured; a name too wide for the column is an error.
 */
import type { Colour, SceneNode } from '../../scene/types.ts';
import { ascentMm, label, linePitchMm, type Block } from './block.ts';
import { LayoutError } from './errors.ts';
import { marker } from './markers.ts';
import { stroke, type MarkerShape } from './style.ts';

export interface LegendRow {
  readonly text: string;
  readonly colour: Colour;
  readonly widthMm: number;
  readonly dashMm: readonly number[];
  readonly marker?: { readonly shape: MarkerShape; readonly fill: Colour };
  /** Shaded band behind the sample (tolerance band). */
  readonly bandColour?: Colour;
}

const SAMPLE_MM = 14;

/** A key whose top-left is (x, y). */
export function legend(args: { x: number; y: number; widthMm: number; rows: readonly LegendRow[]; sizePt: number; where: string }): Block {
  const pitch = Math.max(linePitchMm(args.sizePt), 4.2);
  const nodes: SceneNode[] = [];
  args.rows.forEach((row, i) => {
    const top = args.y + i * pitch;
    const mid = top + pitch / 2;
    if (row.bandColour) nodes.push({ type: 'rect', role: 'legend-band', x: args.x, y: mid - 1.5, width: SAMPLE_MM, height: 3, fill: { colour: row.bandColour, opacity: 0.13 } });
    nodes.push({ type: 'path', role: 'legend-sample', segments: [{ op: 'M', x: args.x, y: mid }, { op: 'L', x: args.x + SAMPLE_MM, y: mid }], stroke: stroke(row.colour, row.widthMm, row.dashMm) });
    if (row.marker) nodes.push(marker({ shape: row.marker.shape, cx: args.x + SAMPLE_MM / 2, cy: mid, sizeMm: 2.4, colour: '#000000', fill: row.marker.fill, role: 'legend-marker' }));
    const text = label({ x: args.x + SAMPLE_MM + 2, y: top + (pitch - linePitchMm(args.sizePt)) / 2 + ascentMm(args.sizePt), text: row.text, sizePt: args.sizePt, role: 'legend-text', where: args.where });
    if (text.widthMm > args.widthMm - SAMPLE_MM - 2) throw new LayoutError(args.where, `the key entry "${row.text}" is wider than the ${args.widthMm.toFixed(0)} mm column; shorten the label`);
    nodes.push(text);
  });
  return { nodes: [{ type: 'group', role: 'legend', children: nodes }], heightMm: pitch * args.rows.length };
}
