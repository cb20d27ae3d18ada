/** Helpers for scene-level tests: flatten a scene, the box of any mark, and scales rebuilt from tick keys. */
import type { Box, Scene, SceneNode, TextNode } from '../../src/scene/types.ts';
import { textBox } from '../../src/scene/text.ts';

/** Every leaf node of a scene, depth first. */
export function leaves(scene: Scene): SceneNode[] {
  const out: SceneNode[] = [];
  const walk = (n: SceneNode): void => {
    if (n.type === 'group') n.children.forEach(walk);
    else out.push(n);
  };
  walk(scene.root);
  return out;
}

export function texts(scene: Scene): TextNode[] {
  return leaves(scene).filter((n): n is TextNode => n.type === 'text');
}

/** Box of a mark (path: its points and control points, which bound a Bézier). */
export function markBox(n: SceneNode): Box | null {
  if (n.type === 'text') return textBox(n);
  if (n.type === 'rect') return { x: n.x, y: n.y, width: n.width, height: n.height };
  if (n.type === 'circle') return { x: n.cx - n.r, y: n.cy - n.r, width: 2 * n.r, height: 2 * n.r };
  if (n.type === 'path') {
    const xs: number[] = [];
    const ys: number[] = [];
    for (const s of n.segments) {
      if (s.op === 'Z') continue;
      xs.push(s.x);
      ys.push(s.y);
      if (s.op === 'C') xs.push(s.x1, s.x2), ys.push(s.y1, s.y2);
    }
    if (xs.length === 0) return null;
    return { x: Math.min(...xs), y: Math.min(...ys), width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) };
  }
  return null;
}

/** Linear map value → mm fitted through two tick marks whose key starts with `axis:`. */
export function scaleFromTicks(scene: Scene, axis: 'x' | 'left' | 'right'): (value: number) => number {
  const ticks = leaves(scene).filter((n) => n.type === 'path' && n.role === 'tick' && n.key?.startsWith(`${axis}:`));
  const pts = ticks.map((t) => {
    const m = (t as Extract<SceneNode, { type: 'path' }>).segments[0] as { x: number; y: number };
    return { value: Number(t.key!.slice(axis.length + 1)), mm: axis === 'x' ? m.x : m.y };
  });
  const a = pts[0];
  const b = pts[pts.length - 1];
  return (v: number) => a.mm + ((v - a.value) * (b.mm - a.mm)) / (b.value - a.value);
}
