/** The print rules every sheet keeps, as one list of problems (empty when the scene passes). */
import type { Paper } from '../../src/data/types.ts';
import { bleedBox } from '../../src/scene/paper.ts';
import type { Box, ClipRect, Scene, SceneNode } from '../../src/scene/types.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { FINE_PRINT_CARD_PT, FINE_PRINT_ROLES, MIN_STROKE_MM } from '../../src/sheets/kit/style.ts';
import { markBox, texts } from './sceneWalk.ts';

const EDGE_MM = 0.01;

/**
 * Artwork at the edge of the sheet: whatever touches a trim edge must run on to the bleed edge (a cut a
 * little off the line would otherwise leave a white sliver; common practice, no source), and nothing but
 * crop marks reaches past the bleed edge. Returns the sides a box runs to the bleed edge on.
 */
export function edgeProblems(scene: Scene, box: Box, what: string): { problems: string[]; fullBleed: boolean } {
  const trim = scene.trimBox;
  const bleed = bleedBox(scene);
  const sides = [
    { side: 'left', at: box.x, trim: trim.x, bleed: bleed.x, out: -1 },
    { side: 'top', at: box.y, trim: trim.y, bleed: bleed.y, out: -1 },
    { side: 'right', at: box.x + box.width, trim: trim.x + trim.width, bleed: bleed.x + bleed.width, out: 1 },
    { side: 'bottom', at: box.y + box.height, trim: trim.y + trim.height, bleed: bleed.y + bleed.height, out: 1 },
  ];
  const problems: string[] = [];
  let fullBleed = false;
  for (const s of sides) {
    const beyond = (edge: number) => (s.at - edge) * s.out;
    if (beyond(s.bleed) > EDGE_MM) problems.push(`past the bleed edge (${s.side}): ${what}`);
    else if (scene.bleedMm > 0 && beyond(s.trim) > -EDGE_MM && beyond(s.bleed) < -EDGE_MM) problems.push(`stops short of the bleed edge (${s.side}): ${what}`);
    else if (scene.bleedMm > 0 && beyond(s.bleed) > -EDGE_MM) fullBleed = true;
  }
  return { problems, fullBleed };
}

/** Marks outside the safe area, overlapping text boxes, type or strokes under the minimum, NaN-like text. */
export function sceneProblems(scene: Scene, paper: Paper): string[] {
  const problems: string[] = [];
  for (const { n, clip } of clippedLeaves(scene)) {
    if (n.role === 'crop-mark') continue;
    const box = clipped(markBox(n), clip);
    const what = `${n.role} ${n.type === 'text' ? n.text : ''}`;
    const edge = box ? edgeProblems(scene, box, what) : { problems: [], fullBleed: false };
    problems.push(...edge.problems);
    // Artwork that runs into the bleed leaves the safe area by design; text never does.
    const bleeds = edge.fullBleed && n.type !== 'text';
    if (box && !bleeds && !boxInside(box, scene.safeBox, 0.01)) problems.push(`outside the safe area: ${what}`);
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
