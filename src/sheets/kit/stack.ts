/** Vertical stacking of blocks in a column (mm): each part is laid out at the cursor, then the cursor moves down. */
import type { SceneNode } from '../../scene/types.ts';
import type { Block } from './block.ts';

export type Part = (at: { x: number; y: number; widthMm: number }) => Block;

/** Lays parts top to bottom with a gap after each; returns their nodes and the bottom edge (mm). */
export function stack(args: { x: number; y: number; widthMm: number; gapMm: number; parts: readonly Part[] }): { nodes: SceneNode[]; bottomMm: number } {
  const nodes: SceneNode[] = [];
  let y = args.y;
  args.parts.forEach((part, i) => {
    const block = part({ x: args.x, y, widthMm: args.widthMm });
    nodes.push(...block.nodes);
    y += block.heightMm + (i < args.parts.length - 1 ? args.gapMm : 0);
  });
  return { nodes, bottomMm: y };
}
