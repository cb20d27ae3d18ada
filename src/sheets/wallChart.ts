/**
 * Engine-family wall chart (A3 landscape by default), made to be read across a workshop. Its primary
 * graphic is the rpm ladder (wallChart/ladder.ts): one row per impeller of one jet, lightest first, one
 * column per engine variant, each cell an rpm scale with the window, the limit and the predicted WOT rpm
 * with its tolerance bar, the rpm and the status in large type. Under it, where there is room, a
 * secondary engineering panel of power against rpm; on the right the key, conditions and cautions.
 *
 * The layout flows: tall ladder cells when the rows fit, else compact one-line cells; the power panel
 * only where at least PANEL_MIN_HEIGHT_MM is left (else a note says it was left out); the side column's
 * fine print from 10 pt down to the 8 pt floor, and the side column wider or narrower, until both fit.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene, SceneNode } from '../scene/types.ts';
import { analyseWallChart, type WallChartResult } from '../analysis/index.ts';
import { conditionsDifferences, defaultChartConditions, pairingBoats } from '../analysis/defaults.ts';
import { engineSeries, impellerSeries, variantShortLabels } from './chart/series.ts';
import { assembleScene } from './kit/assemble.ts';
import { LayoutError } from './kit/errors.ts';
import { minTypePt, STROKE, typeScale } from './kit/style.ts';
import type { SheetContext } from './context.ts';
import { conditionsText } from './words.ts';
import { powerText } from './kit/format.ts';
import { panelDomains } from './wallChart/domains.ts';
import { ladderOrder, ladderRpmRange, planLadder, type LadderPlan } from './wallChart/ladder.ts';
import { PANEL_MAX_IMPELLERS, PANEL_MIN_HEIGHT_MM, powerPanel } from './wallChart/panel.ts';
import { SIDE_COLUMN_GAP_MM, wallChartSide } from './wallChart/sideColumn.ts';
import { sheetFrame, type SheetFrame } from './kit/frame.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

const GAP_MM = 7;
/** The power panel never takes more height than this (mm); the rest stays white. */
const PANEL_MAX_HEIGHT_MM = 125;
/** Fine-print sizes tried for the side column, largest first, none under the paper's floor (minTypePt). */
const FINE_PRINT_PT = [10, 9, 8] as const;

/** Builds the wall-chart scene. */
export function wallChartScene(request: WallChartRequest, ctx: SheetContext): Scene {
  const where = `wall chart ${request.engineFamilyId} × ${request.jetId}`;
  const family = ctx.project.engines.find((e) => e.id === request.engineFamilyId);
  const jet = ctx.project.jets.find((j) => j.id === request.jetId);
  if (!family || !jet) throw new LayoutError(where, `engine family "${request.engineFamilyId}" or jet "${request.jetId}" is not in the project`);
  const { conditions } = request;
  const site = ctx.project.site;
  const unit = site.powerUnitFirst;
  const result = analyseWallChart({ family, jet, conditions });
  const type = typeScale(request.paper);
  // A chart drawn under other conditions than the pairing's default chart says so in its title, so the
  // two never pass for the same sheet on a wall or in a book.
  const differs = conditionsDifferences(conditions, defaultChartConditions(family, unit, pairingBoats(ctx.project, family.id, jet.id)), unit).map((d) => d.words);
  const differsText = differs.length > 0 ? ` (${differs.join(', ')})` : '';
  const headings = variantShortLabels(family.variants);
  const impellers = impellerSeries({ jet, driveLine: conditions.driveLine, waterDensityKgM3: conditions.water.densityKgM3 });
  // The panel draws each variant's curve in the chart's air, heavy, told apart by dash and direct label.
  const engines = engineSeries({ family, ambient: conditions.site.ambient }).map(({ reference: _r, referenceLabel: _l, ...e }) => ({ ...e, widthMm: STROKE.engine }));
  // Scales come from the whole family, so the pages of a chart that continues read against the same rpm and power.
  const domains = panelDomains(result, engines);
  const rpmRange = ladderRpmRange(result);
  const paired = pairingBoats(ctx.project, family.id, jet.id);
  const driveLineBoats = paired.filter((b) => b.driveLine.ratio === conditions.driveLine.ratio && b.driveLine.efficiency === conditions.driveLine.efficiency);
  const impLabel = (id: string) => jet.impellers.find((i) => i.id === id)?.label ?? id;
  const title = `${family.label} with ${jet.label}${differsText}`;
  const subtitleEnd = `drawn for ${conditionsText(result.conditions)}`;

  /** One page: the ladder of some variants (all impellers), their power panel where it fits, and the full side column. */
  const layoutPage = (pageFrame: SheetFrame, variantIds: ReadonlySet<string>, impellerIds: ReadonlySet<string>): { content: SceneNode[]; panel: boolean } | undefined => {
    const box = pageFrame.contentBox;
    const pageResult: WallChartResult = {
      ...result,
      variants: result.variants.filter((v) => variantIds.has(v.variantId)),
      impellers: result.impellers.filter((i) => impellerIds.has(i.impellerId)),
      pairings: result.pairings.filter((p) => variantIds.has(p.variantId) && impellerIds.has(p.impellerId)),
    };
    const pageHeadings = headings.filter((_, i) => variantIds.has(family.variants[i].variantId));
    const pageEngines = engines.filter((e) => variantIds.has(e.id));
    const preferredSide = Math.min(112, box.width * 0.28);
    // Wider side columns come after the narrower ones fail, for long shop cautions (the ladder gives way);
    // last the side in two columns, the cautions beside the key (a page of few variants has the width).
    const sides: { sideW: number; columns: 1 | 2 }[] = [
      ...[0, 16, 32, -14, -28, 48, 64, 80].map((d) => ({ sideW: preferredSide + d, columns: 1 as const })),
      ...[0, 16, 32].map((d) => ({ sideW: 2 * (preferredSide + d) + SIDE_COLUMN_GAP_MM, columns: 2 as const })),
    ].filter((c) => c.sideW < box.width * 0.8);
    // The ladder depends on its width only, so each side width's plan is made once, not once per fine-print size.
    const plans = sides.map(({ sideW, columns }) => {
      const args = { x: box.x, y: box.y, widthMm: box.width - sideW - GAP_MM, result: pageResult, headings: pageHeadings, smallPt: type.small, range: rpmRange, where };
      const plan: LadderPlan | undefined = [planLadder(args, 'tall'), planLadder(args, 'compact')].find((p) => p.fitsWidth && p.minHeightMm <= box.height + 1e-6);
      return { sideW, columns, ladderW: args.widthMm, plan };
    });
    for (const sizePt of FINE_PRINT_PT.filter((pt) => pt >= minTypePt(request.paper))) {
      for (const { sideW, columns, ladderW, plan } of plans) {
        if (!plan) continue;
        const room = box.height - plan.heightMm - GAP_MM;
        const content: SceneNode[] = [];
        const notes: string[] = [];
        const panelShown = room >= PANEL_MIN_HEIGHT_MM && impellerIds.size <= PANEL_MAX_IMPELLERS;
        if (panelShown) {
          content.push(...plan.draw().nodes);
          const panelH = Math.min(room, PANEL_MAX_HEIGHT_MM);
          const panel = powerPanel({
            box: { x: box.x, y: box.y + box.height - panelH, width: ladderW, height: panelH },
            sizePt: type.small,
            headingPt: type.heading,
            powerUnit: unit,
            domains,
            result: pageResult,
            impellers: impellers.filter((i) => impellerIds.has(i.id)),
            engines: pageEngines,
            engineLabels: pageHeadings,
            where: `${where}, power panel`,
          });
          content.push(panel.node);
          // A cruise line the chart was asked for that no impeller reaches inside the plotted rpm range is said, not silently dropped.
          const missing = conditions.cruisePowersKw.filter((kw) => !domains.cruisePowersKw.includes(kw));
          if (missing.length > 0) notes.push(`Cruise line${missing.length > 1 ? 's' : ''} at ${missing.map((kw) => powerText(kw, unit)).join(', ')} left out of the power panel: outside its rpm range or above the engines' peak power.`);
          for (const n of panel.notes) {
            const impellerId = /^impeller(?:-label)?:([^|]+)/.exec(n.key)?.[1];
            notes.push(`Power panel (${n.number}): ${impellerId ? impLabel(impellerId) : n.text}`);
          }
        } else {
          content.push(...plan.draw(box.height).nodes);
          notes.push(
            impellerIds.size > PANEL_MAX_IMPELLERS
              ? `The power-against-rpm panel is left out: ${impellerIds.size} absorption curves are too many to read on one plot (it draws at most ${PANEL_MAX_IMPELLERS}). The site's family page has the figures.`
              : `The power-against-rpm panel is left out: the ladder of ${impellerIds.size} impellers needs the room. The site's family page has the figures.`,
          );
        }
        const side = wallChartSide({ box: { x: box.x + ladderW + GAP_MM, y: box.y, width: sideW, height: box.height }, result: pageResult, driveLineBoats, notes, panel: panelShown, site, sizePt, headingPt: type.heading, columns, where });
        if (side.heightMm > box.height + 1e-6) continue;
        content.push(...side.nodes);
        return { content, panel: panelShown };
      }
    }
    return undefined;
  };

  // One page with every variant and impeller where it fits; else the fewest pages of the same paper, each
  // a whole chart for its part (key, conditions and cautions on every page, as each hangs on its own):
  // first the variants split into even groups (a page answers for its engines over every impeller), then,
  // for paper too short for the impeller list, the rows split too (lightest impellers first).
  const n = family.variants.length;
  const rowsInOrder = ladderOrder(result.impellers).map((i) => i.impellerId);
  const maxRowPages = Math.min(4, rowsInOrder.length);
  const splits = Array.from({ length: n }, (_, v) => Array.from({ length: maxRowPages }, (_, r) => ({ variantPages: v + 1, rowPages: r + 1 })))
    .flat()
    .sort((a, b) => a.variantPages * a.rowPages - b.variantPages * b.rowPages || a.rowPages - b.rowPages);
  for (const { variantPages, rowPages } of splits) {
    const pagesOf = evenGroups(family.variants.map((v) => v.variantId), variantPages).flatMap((variantIds) => evenGroups(rowsInOrder, rowPages).map((impellerIds) => ({ variantIds, impellerIds })));
    const pages = pagesOf.length;
    const frames = pagesOf.map(({ variantIds, impellerIds }, i) => {
      const names = family.variants.filter((v) => variantIds.includes(v.variantId)).map((v) => v.label).join(', ');
      const rows = rowPages > 1 ? `, impellers ${impLabel(impellerIds[0])} to ${impLabel(impellerIds[impellerIds.length - 1])}` : '';
      return sheetFrame({
        paper: request.paper,
        site,
        kind: 'wallChart',
        title,
        ...(pages > 1 ? { pageNote: `page ${i + 1} of ${pages}` } : {}),
        subtitle: pages > 1 ? `Impeller ladder for ${names}${rows} · ${subtitleEnd}` : `Impeller ladder: which impeller puts each engine variant in its WOT window · ${subtitleEnd}`,
        dateIso: ctx.dateIso,
        type,
        where,
      });
    });
    const laid: { content: SceneNode[]; panel: boolean }[] = [];
    for (const [i, page] of pagesOf.entries()) {
      const one = layoutPage(frames[i], new Set(page.variantIds), new Set(page.impellerIds));
      if (!one) break;
      laid.push(one);
    }
    if (laid.length < pages) continue;
    return assembleScene({
      frame: frames[0],
      content: laid[0].content,
      more: laid.slice(1).map((d, i) => ({ frame: frames[i + 1], content: d.content })),
      title: `${family.label} with ${jet.label}: wall chart${differsText}`,
      description: `Impeller ladder for ${family.label} (${n} variant${n > 1 ? 's' : ''}${pages > 1 ? `, over ${pages} pages` : ''}) with ${jet.impellers.length} impellers of ${jet.label}: for each impeller and variant the predicted WOT rpm with its tolerance bar against the variant's recommended window and maximum rpm, and the status in words${laid.every((d) => d.panel) ? '; a power-against-rpm panel with every full-throttle and absorption curve' : ''}.`,
      subject: 'Impeller to engine match: wall chart',
      keywords: ['wall chart', family.id, jet.id],
      dateIso: ctx.dateIso,
      role: 'wall-chart',
    });
  }
  throw new LayoutError(where, `${jet.impellers.length} impellers × ${n} engine variants with these labels and cautions do not fit on ${request.paper.size} ${request.paper.orientation} even one variant and a quarter of the impellers to a page; use larger paper, fewer impellers per jet (at most 24) or shorter cautions`);
}

/** The items in `count` contiguous groups whose sizes differ by at most one, the larger first. */
export function evenGroups<T>(items: readonly T[], count: number): T[][] {
  const out: T[][] = [];
  let from = 0;
  for (let i = 0; i < count; i++) {
    const size = Math.ceil((items.length - from) / (count - i));
    out.push(items.slice(from, from + size));
    from += size;
  }
  return out;
}
