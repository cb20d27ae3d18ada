/** Test fixtures: small scenes named for what they show. */
import type { Paper } from '../../src/data/types.ts';
import { cropMarks, pageFrame } from '../../src/scene/paper.ts';
import { textNode } from '../../src/scene/text.ts';
import type { Scene, SceneNode } from '../../src/scene/types.ts';

const A4_PORTRAIT: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };

/** A scene on `paper` (default A4 portrait, no bleed) holding `children`. */
export function sceneOf(args: { children: readonly SceneNode[]; paper?: Paper; title?: string }): Scene {
  const frame = pageFrame({ paper: args.paper ?? A4_PORTRAIT });
  return {
    ...frame,
    title: args.title ?? 'Test sheet',
    description: 'A sheet built by a test',
    subject: 'Renderer test',
    keywords: ['test', 'waterjet'],
    dateIso: '2024-05-01',
    root: { type: 'group', children: args.children },
  };
}

/** Every node kind: crop marks, a dashed translucent rect, a circle, a clipped curve, three text runs. */
export function everyNodeKindScene(): Scene {
  const paper: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 3 };
  return sceneOf({
    paper,
    title: 'Every node kind',
    children: [
      ...cropMarks(pageFrame({ paper })),
      {
        type: 'rect', x: 20, y: 20, width: 100, height: 50, role: 'band', key: 'impeller:demo-a',
        stroke: { colour: '#003366', widthMm: 0.5, dashMm: [2, 1], join: 'round' },
        fill: { colour: '#ffcc00', opacity: 0.5 },
      },
      { type: 'circle', cx: 150, cy: 50, r: 10, fill: { colour: '#cc0000' }, role: 'operating-point' },
      {
        type: 'group',
        clip: { x: 20, y: 100, width: 50, height: 50 },
        children: [
          {
            type: 'path',
            segments: [{ op: 'M', x: 10, y: 90 }, { op: 'C', x1: 40, y1: 200, x2: 60, y2: 0, x: 100, y: 160 }],
            stroke: { colour: '#000000', widthMm: 0.7, cap: 'round', join: 'round' },
          },
        ],
      },
      textNode({ text: 'Wide-open throttle 5600 rpm', sizePt: 24, weight: 'regular', x: 20, y: 200 }),
      textNode({ text: 'Cruise line 40 kW', sizePt: 18, weight: 'bold', x: 105, y: 230, anchor: 'middle' }),
      textNode({ text: 'Engine speed (rpm)', sizePt: 12, weight: 'regular', x: 30, y: 280, rotateDeg: 90 }),
    ],
  });
}

/** Text runs of every kind: both weights, every anchor, upright and rotated, a ligature, accents, Greek, a colour. */
export function textRunsScene(): Scene {
  return sceneOf({
    title: 'Text page',
    children: [
      textNode({ text: 'Predicted WOT 5450–5700 rpm', sizePt: 20, weight: 'bold', x: 20, y: 40 }),
      textNode({ text: 'office fluff · Ωμέγα · Crème brûlée', sizePt: 16, weight: 'regular', x: 20, y: 70 }),
      textNode({ text: 'Engine speed (rpm)', sizePt: 12, weight: 'regular', x: 15, y: 200, rotateDeg: 90 }),
      textNode({ text: 'Right-aligned 5600 rpm', sizePt: 14, weight: 'regular', x: 190, y: 100, anchor: 'end', colour: '#003366' }),
      textNode({ text: 'Centred caution', sizePt: 14, weight: 'bold', x: 105, y: 130, anchor: 'middle' }),
      textNode({ text: 'Centred upright', sizePt: 14, weight: 'bold', x: 60, y: 250, anchor: 'middle', rotateDeg: 90 }),
    ],
  });
}
