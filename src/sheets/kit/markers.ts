/** Marker shapes (one per series) as scene nodes whose bounding box is centred on the point; sizes in mm. */
import type { Box, Colour, PathSegment, SceneNode } from '../../scene/types.ts';
import type { MarkerShape } from './style.ts';
import { STROKE, stroke } from './style.ts';

function polygon(points: readonly [number, number][]): PathSegment[] {
  return [...points.map(([x, y], i) => ({ op: i === 0 ? 'M' : 'L', x, y }) as PathSegment), { op: 'Z' }];
}

/** A marker of a shape, about sizeMm across, at (cx, cy). */
export function marker(args: { shape: MarkerShape; cx: number; cy: number; sizeMm: number; colour: Colour; fill: Colour; role?: string; key?: string }): SceneNode {
  const { cx, cy, shape } = args;
  const r = args.sizeMm / 2;
  const tags = { ...(args.role ? { role: args.role } : {}), ...(args.key ? { key: args.key } : {}) };
  const paint = { stroke: stroke(args.colour, STROKE.rule), fill: { colour: args.fill } };
  if (shape === 'circle') return { type: 'circle', cx, cy, r, ...paint, ...tags };
  const s = r * 0.88;
  const shapes: Record<Exclude<MarkerShape, 'circle'>, () => PathSegment[]> = {
    square: () => polygon([[cx - s, cy - s], [cx + s, cy - s], [cx + s, cy + s], [cx - s, cy + s]]),
    triangle: () => polygon([[cx, cy - r], [cx + r, cy + r], [cx - r, cy + r]]),
    triangleDown: () => polygon([[cx, cy + r], [cx + r, cy - r], [cx - r, cy - r]]),
    diamond: () => polygon([[cx, cy - r * 1.15], [cx + r, cy], [cx, cy + r * 1.15], [cx - r, cy]]),
    cross: () => {
      const t = r * 0.38;
      return polygon([[cx - t, cy - r], [cx + t, cy - r], [cx + t, cy - t], [cx + r, cy - t], [cx + r, cy + t], [cx + t, cy + t], [cx + t, cy + r], [cx - t, cy + r], [cx - t, cy + t], [cx - r, cy + t], [cx - r, cy - t], [cx - t, cy - t]]);
    },
    hexagon: () => polygon(Array.from({ length: 6 }, (_, i): [number, number] => [cx + r * Math.cos((i * Math.PI) / 3), cy + r * Math.sin((i * Math.PI) / 3)])),
  };
  return { type: 'path', segments: shapes[shape](), ...paint, ...tags };
}

/** The box a marker covers (mm), for the label placer. */
export function markerBox(cx: number, cy: number, sizeMm: number): Box {
  const r = (sizeMm / 2) * 1.15 + STROKE.rule / 2;
  return { x: cx - r, y: cy - r, width: 2 * r, height: 2 * r };
}
