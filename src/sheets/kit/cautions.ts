/**
 * The cautions every sheet and page carries. The built-in safety points always print, first; a shop's
 * SiteConfig.extraCautions (site.yaml `cautions`) are added after them, never instead of them.
 */
import type { SiteConfig } from '../../data/types.ts';
import type { SceneNode } from '../../scene/types.ts';
import { type Block, linePitchMm, paragraph, label, ascentMm, wrapLines } from './block.ts';
import type { Flowable } from './flow.ts';
import { STROKE, WARN, INK, stroke } from './style.ts';

/** Built-in cautions, in the order printed: sea-trial confirmation, maximum rpm, who does the work. */
export const BUILT_IN_CAUTIONS: readonly string[] = [
  'These figures are predictions from published data and a physical model: estimates only. Confirm them by a sea trial before relying on them.',
  "Never run the engine past its maker's maximum rpm.",
  "Impeller changes and engine work belong to a qualified marine technician following the engine and jet makers' instructions and local regulations.",
];

/**
 * The built-in cautions in one line, for the foot of every page of a sheet that continues over pages
 * (its full Cautions block, the shop's own cautions too, is on one of them), so no page handed out alone
 * goes without them.
 */
export const CONTINUING_CAUTION =
  "Cautions: estimates only, confirm them by a sea trial. Never run the engine past its maker's maximum rpm. Impeller and engine work belong to a qualified marine technician following the makers' instructions and local regulations. Every caution, the shop's too, is under Cautions on the last page.";

/**
 * The built-in cautions in one short line, for the front of a two-sided console card: the full block,
 * the shop's cautions too, is on the back.
 */
export const CARD_CAUTION_LINE =
  "Estimates only: confirm by a sea trial. Never past the maker's maximum rpm. Impeller and engine work: a qualified marine technician, per the makers' instructions and local regulations. All cautions on the back.";

/**
 * The cautions a sheet or page prints: the built-in ones, then the shop's extra ones in their order
 * (an extra caution that repeats a built-in one word for word is printed once).
 */
export function cautionsFor(site: SiteConfig): readonly string[] {
  const builtIn = new Set(BUILT_IN_CAUTIONS.map(sameWords));
  const extra = (site.extraCautions ?? []).filter((c) => !builtIn.has(sameWords(c)));
  return [...BUILT_IN_CAUTIONS, ...extra];
}

/** The site as a book's sheets see it: the book's own cautions after the site's. */
export function withExtraCautions(site: SiteConfig, extra: readonly string[] | undefined): SiteConfig {
  return extra && extra.length > 0 ? { ...site, extraCautions: [...(site.extraCautions ?? []), ...extra] } : site;
}

/** Compares sentences by their words, ignoring case and spacing. */
function sameWords(sentence: string): string {
  return sentence.trim().replace(/\s+/g, ' ').toLowerCase();
}

const BAR_MM = 1.2;
/** Text indent from the block's left edge: the warning bar and a gap. */
const INDENT_MM = BAR_MM + 2;

/** Cautions block: a heading and one paragraph per caution, with a warning bar at the left edge. */
export function cautionsBlock(args: {
  site: SiteConfig;
  x: number;
  y: number;
  widthMm: number;
  sizePt: number;
  headingPt: number;
  where: string;
  /** The cautions to print instead of cautionsFor(site): a part of a block split over columns or pages. */
  list?: readonly string[];
  /** Headed "Cautions (continued)": the part after a split. */
  continued?: boolean;
}): Block {
  const barMm = BAR_MM;
  const indentMm = INDENT_MM;
  const innerX = args.x + indentMm;
  const innerW = args.widthMm - indentMm;
  const nodes: SceneNode[] = [];
  const heading = label({
    x: innerX,
    y: args.y + ascentMm(args.headingPt, 'bold'),
    text: args.continued === true ? 'Cautions (continued)' : 'Cautions',
    sizePt: args.headingPt,
    weight: 'bold',
    colour: INK,
    role: 'cautions-heading',
    where: `${args.where}: cautions`,
  });
  nodes.push(heading);
  let cursor = args.y + linePitchMm(args.headingPt, 'bold');
  const gap = linePitchMm(args.sizePt) * 0.25;
  for (const text of args.list ?? cautionsFor(args.site)) {
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

/**
 * The cautions block as a part that splits over a column or page break. The built-in cautions never
 * split: every piece of the block starts with all of them ("Cautions (continued)" repeats them), so each
 * page that shows the block shows them whole; what continues is the shop's and the book's cautions,
 * split between paragraphs or inside one where two lines at least stay and two go on.
 */
export function cautionsFlow(args: { site: SiteConfig; sizePt: number; headingPt: number; where: string }, rest?: readonly string[]): Flowable {
  const continued = rest !== undefined;
  const all = rest !== undefined ? [...BUILT_IN_CAUTIONS, ...rest] : cautionsFor(args.site);
  const fixed = BUILT_IN_CAUTIONS.length;
  const block = (at: { x: number; y: number; widthMm: number }, list: readonly string[]) => cautionsBlock({ ...args, ...at, list, continued });
  return {
    layout: (at) => block(at, all),
    split: (at, maxHeightMm) => {
      // Lines as the block sets them (same width and size); keep the most that fit.
      const lines = all.map((text) => wrapLines({ text, sizePt: args.sizePt, weight: 'regular', widthMm: at.widthMm - INDENT_MM, where: args.where }));
      let best: { head: string[]; tail: string[] } | undefined;
      search: for (let c = fixed; c < lines.length; c++) {
        // l lines of caution c stay; l = 0 only right after the built-in ones (else it repeats the split after c − 1).
        for (let l = c === fixed ? 0 : 1; l <= lines[c].length; l++) {
          if (c === lines.length - 1 && l === lines[c].length) break search;
          // No lone line of a caution on either side of the break (widows and orphans).
          if (l > 0 && l < lines[c].length && (l < 2 || lines[c].length - l < 2)) continue;
          const head = [...all.slice(0, c), ...(l > 0 ? [lines[c].slice(0, l).join(' ')] : [])];
          if (block(at, head).heightMm > maxHeightMm + 1e-6) break search;
          best = { head, tail: [...(l < lines[c].length ? [lines[c].slice(l).join(' ')] : []), ...all.slice(c + 1)] };
        }
      }
      return best && { head: block(at, best.head), rest: cautionsFlow(args, best.tail) };
    },
  };
}
