/**
 * WOT operating-point markers on the wall chart. Status is told by the marker's style, not by words at
 * the point: filled in the impeller's colour = a usable match (in or above the window); open with a heavy
 * warning ring = the engine lugs or over-revs. Open against filled survives a grey photocopy.
 */
import type { Box, Colour, SceneNode } from '../../scene/types.ts';
import { marker, markerBox } from '../kit/markers.ts';
import type { MarkerShape } from '../kit/style.ts';
import { INK, PAPER_WHITE, STROKE, WARN, stroke } from '../kit/style.ts';

/** Width (mm) of the warning ring: heavier than any curve so it reads from across a workshop. */
const RING_MM = STROKE.engine;

/** Radius (mm) of the warning ring around a marker about sizeMm across. */
function ringRadiusMm(sizeMm: number): number {
  return sizeMm * 0.5 * 1.15 + 0.35 + RING_MM / 2;
}

/** Marker nodes of one operating point; the shape node carries `role` and `key` and is centred on it. */
export function pointMarker(args: { shape: MarkerShape; cx: number; cy: number; sizeMm: number; colour: Colour; warn: boolean; role?: string; key?: string }): SceneNode[] {
  const tags = { ...(args.role ? { role: args.role } : {}), ...(args.key ? { key: args.key } : {}) };
  const shape = marker({ shape: args.shape, cx: args.cx, cy: args.cy, sizeMm: args.sizeMm, colour: INK, fill: args.warn ? PAPER_WHITE : args.colour, ...tags });
  if (!args.warn) return [shape];
  const ring: SceneNode = { type: 'circle', role: 'warning-ring', ...(args.key ? { key: args.key } : {}), cx: args.cx, cy: args.cy, r: ringRadiusMm(args.sizeMm), fill: { colour: PAPER_WHITE }, stroke: stroke(WARN, RING_MM) };
  return [ring, shape];
}

/** The box a point marker covers, ring included (mm), for the label placer. */
export function pointMarkerBox(args: { cx: number; cy: number; sizeMm: number; warn: boolean }): Box {
  if (!args.warn) return markerBox(args.cx, args.cy, args.sizeMm);
  const r = ringRadiusMm(args.sizeMm) + RING_MM / 2;
  return { x: args.cx - r, y: args.cy - r, width: 2 * r, height: 2 * r };
}
