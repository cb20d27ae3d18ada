/**
 * The cautions every sheet and page carries. The built-in safety points always print, first; a shop's
 * SiteConfig.extraCautions (site.yaml `cautions`) are added after them, never instead of them.
 */
import type { SiteConfig } from '../../data/types.ts';
import type { SceneNode } from '../../scene/types.ts';
import { type Block, linePitchMm, paragraph, label, ascentMm } from './block.ts';
import { splittable, type Flowable } from './flow.ts';
import { STROKE, WARN, INK, stroke } from './style.ts';

/** Built-in cautions, in the order printed: sea-trial confirmation, maximum rpm, who does the work. */
export const BUILT_IN_CAUTIONS: readonly string[] = [
  'These figures are predictions from published data and a physical model: estimates only. Confirm them by a sea trial before relying on them.',
  "Never run the engine past its maker's maximum rpm.",
  "Impeller changes and engine work belong to a qualified marine technician following the engine and jet makers' instructions and local regulations.",
];

/**
 * The cautions a sheet or page prints: the built-in ones, then the shop's extra ones in their order
 * (an extra caution that repeats a built-in one word for word is printed once).
 */
export function cautionsFor(site: SiteConfig): readonly string[] {
  const builtIn = new Set(BUILT_IN_CAUTIONS.map(sameWords));
  const extra = (site.extraCautions ?? []).filter((c) => !builtIn.has(sameWords(c)));
  return [...BUILT_IN_CAUTIONS, ...extra];
}

/** Compares sentences by their words, ignoring case and spacing. */
function sameWords(sentence: string): string {
  return sentence.trim().replace(/\s+/g, ' ').toLowerCase();
}

/** Cautions block: a heading and one paragraph per caution, with a warning bar at the left edge. */
export function cautionsBlock(args: {
  site: SiteConfig;
  x: number;
  y: number;
  widthMm: number;
  sizePt: number;
  headingPt: number;
  where: string;
  /** Print only cautions [from, to) of cautionsFor(site); a block that does not start at the first is headed "Cautions (continued)". */
  from?: number;
  to?: number;
}): Block {
  const barMm = 1.2;
  const indentMm = barMm + 2;
  const innerX = args.x + indentMm;
  const innerW = args.widthMm - indentMm;
  const nodes: SceneNode[] = [];
  const heading = label({
    x: innerX,
    y: args.y + ascentMm(args.headingPt, 'bold'),
    text: (args.from ?? 0) > 0 ? 'Cautions (continued)' : 'Cautions',
    sizePt: args.headingPt,
    weight: 'bold',
    colour: INK,
    role: 'cautions-heading',
    where: `${args.where}: cautions`,
  });
  nodes.push(heading);
  let cursor = args.y + linePitchMm(args.headingPt, 'bold');
  const gap = linePitchMm(args.sizePt) * 0.25;
  for (const text of cautionsFor(args.site).slice(args.from ?? 0, args.to)) {
    const p = paragraph({
      x: innerX,
      y: cursor,
      widthMm: innerW,
      text,
      sizePt: args.sizePt,
      role: 'caution',
      where: `${args.where}: cautions`,
    });
    nodes.push(...p.nodes);
    cursor += p.heightMm + gap;
  }
  const heightMm = cursor - gap - args.y;
  nodes.unshift({
    type: 'rect',
    role: 'cautions-bar',
    x: args.x,
    y: args.y,
    width: barMm,
    height: heightMm,
    fill: { colour: WARN },
    stroke: stroke(WARN, STROKE.hairline),
  });
  return { nodes: [{ type: 'group', role: 'cautions', children: nodes }], heightMm };
}

/** The cautions block as a part that splits between cautions (over a column or page break). */
export function cautionsFlow(args: { site: SiteConfig; sizePt: number; headingPt: number; where: string }): Flowable {
  return splittable(cautionsFor(args.site).length, (from, to, at) => cautionsBlock({ ...args, ...at, from, to }));
}
