/** The print rules every sheet keeps, as one list of problems (empty when the scene passes). */
import type { Paper } from '../../src/data/types.ts';
import type { Box, ClipRect, Scene, SceneNode } from '../../src/scene/types.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { FINE_PRINT_CARD_PT, FINE_PRINT_ROLES, MIN_STROKE_MM } from '../../src/sheets/kit/style.ts';
import { markBox, texts } from './sceneWalk.ts';

/** Marks outside the safe area, overlapping text boxes, type or strokes under the minimum, NaN-like text. */
export function sceneProblems(scene: Scene, paper: Paper): string[] {
  const problems: string[] = [];
  for (const { n, clip } of clippedLeaves(scene)) {
    if (n.role === 'crop-mark') continue;
    const box = clipped(markBox(n), clip);
    if (box && !boxInside(box, scene.safeBox, 0.01)) problems.push(`outside the safe area: ${n.role} ${n.type === 'text' ? n.text : ''}`);
    if (n.type !== 'text' && n.type !== 'group' && n.stroke && n.stroke.widthMm < MIN_STROKE_MM) problems.push(`stroke under 0.5 pt: ${n.role}`);
  }
  const minPt = paper.size === 'A3' || paper.size === 'Tabloid' ? 10 : 8;
  // Fine print (the cautions) may go to 7 pt on a hand-held card: A6 and 4 × 6 in.
  const card = paper.size === 'A6' || paper.size === 'Card4x6';
  const boxes = texts(scene).map((t) => ({ t, box: markBox(t)! }));
  for (const { t } of boxes) {
    const floor = card && FINE_PRINT_ROLES.has(t.role ?? '') ? FINE_PRINT_CARD_PT : minPt;
    if (t.sizePt < floor) problems.push(`type under ${floor} pt: "${t.text}"`);
    if (/NaN|Infinity|undefined|null/.test(t.text)) problems.push(`bad value in "${t.text}"`);
  }
  for (let i = 0; i < boxes.length; i++) {
    for (let j = i + 1; j < boxes.length; j++) {
      if (boxesOverlap(boxes[i].box, boxes[j].box, -0.01)) problems.push(`text overlaps: "${boxes[i].t.text}" / "${boxes[j].t.text}"`);
    }
  }
  return problems;
}

/** Every leaf with the clip rectangle of its nearest clipping group (what a renderer shows of it). */
function clippedLeaves(scene: Scene): { n: SceneNode; clip?: ClipRect }[] {
  const out: { n: SceneNode; clip?: ClipRect }[] = [];
  const walk = (n: SceneNode, clip?: ClipRect): void => {
    if (n.type === 'group') n.children.forEach((c) => walk(c, n.clip ?? clip));
    else out.push({ n, clip });
  };
  walk(scene.root);
  return out;
}

/** The part of a box inside a clip rectangle (null when none of it shows). */
function clipped(box: Box | null, clip?: ClipRect): Box | null {
  if (!box || !clip) return box;
  const x = Math.max(box.x, clip.x);
  const y = Math.max(box.y, clip.y);
  const x1 = Math.min(box.x + box.width, clip.x + clip.width);
  const y1 = Math.min(box.y + box.height, clip.y + clip.height);
  return x1 < x || y1 < y ? null : { x, y, width: x1 - x, height: y1 - y };
}
