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
import { analyseWallChart } from '../analysis/index.ts';
import { conditionsDifferences, defaultChartConditions, pairingBoats } from '../analysis/defaults.ts';
import { engineSeries, impellerSeries, variantShortLabels } from './chart/series.ts';
import { assembleScene } from './kit/assemble.ts';
import { LayoutError } from './kit/errors.ts';
import { STROKE, typeScale } from './kit/style.ts';
import type { SheetContext } from './context.ts';
import { conditionsText } from './words.ts';
import { panelDomains } from './wallChart/domains.ts';
import { planLadder, type LadderPlan } from './wallChart/ladder.ts';
import { PANEL_MIN_HEIGHT_MM, powerPanel } from './wallChart/panel.ts';
import { wallChartSide } from './wallChart/sideColumn.ts';
import { sheetFrame } from './kit/frame.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

const GAP_MM = 7;
/** The power panel never takes more height than this (mm); the rest stays white. */
const PANEL_MAX_HEIGHT_MM = 125;
/** Fine-print sizes tried for the side column, largest first; 8 pt is the floor on every paper. */
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
  const frame = sheetFrame({
    paper: request.paper,
    site,
    title: `${family.label} with ${jet.label}${differsText}`,
    subtitle: `Impeller ladder: which impeller puts each engine variant in its WOT window · drawn for ${conditionsText(result.conditions)}`,
    dateIso: ctx.dateIso,
    type,
    where,
  });
  const box = frame.contentBox;
  const headings = variantShortLabels(family.variants);
  const preferredSide = Math.min(112, box.width * 0.28);
  const sideWidths = [preferredSide, preferredSide + 16, preferredSide + 32, preferredSide - 14, preferredSide - 28];
  const impellers = impellerSeries({ jet, driveLine: conditions.driveLine, waterDensityKgM3: conditions.water.densityKgM3 });
  // The panel draws each variant's curve in the chart's air, heavy, told apart by dash and direct label.
  const engines = engineSeries({ family, ambient: conditions.site.ambient }).map(({ reference: _r, referenceLabel: _l, ...e }) => ({ ...e, widthMm: STROKE.engine }));
  const domains = panelDomains(result, engines);
  const paired = pairingBoats(ctx.project, family.id, jet.id);
  const driveLineBoats = paired.filter((b) => b.driveLine.ratio === conditions.driveLine.ratio && b.driveLine.efficiency === conditions.driveLine.efficiency);
  const impLabel = (id: string) => jet.impellers.find((i) => i.id === id)?.label ?? id;

  // The ladder depends on its width only, so each side width's plan is made once, not once per fine-print size.
  const plans = sideWidths.map((sideW) => {
    const args = { x: box.x, y: box.y, widthMm: box.width - sideW - GAP_MM, result, headings, smallPt: type.small, where };
    const plan: LadderPlan | undefined = [planLadder(args, 'tall'), planLadder(args, 'compact')].find((p) => p.fitsWidth && p.minHeightMm <= box.height + 1e-6);
    return { sideW, ladderW: args.widthMm, plan };
  });

  for (const sizePt of FINE_PRINT_PT) {
    for (const { sideW, ladderW, plan } of plans) {
      if (!plan) continue;
      const room = box.height - plan.heightMm - GAP_MM;
      const content: SceneNode[] = [];
      const notes: string[] = [];
      if (room >= PANEL_MIN_HEIGHT_MM) {
        const ladder = plan.draw();
        content.push(...ladder.nodes);
        const panelH = Math.min(room, PANEL_MAX_HEIGHT_MM);
        const panel = powerPanel({
          box: { x: box.x, y: box.y + box.height - panelH, width: ladderW, height: panelH },
          sizePt: type.small,
          headingPt: type.heading,
          powerUnit: unit,
          domains,
          result,
          impellers,
          engines,
          engineLabels: headings,
          where: `${where}, power panel`,
        });
        content.push(panel.node);
        for (const n of panel.notes) {
          const impellerId = /^impeller(?:-label)?:([^|]+)/.exec(n.key)?.[1];
          notes.push(`Power panel (${n.number}): ${impellerId ? impLabel(impellerId) : n.text}`);
        }
      } else {
        content.push(...plan.draw(box.height).nodes);
        notes.push(`The power-against-rpm panel is left out: the ladder of ${jet.impellers.length} impellers needs the room. The site's family page has the figures.`);
      }
      const side = wallChartSide({ box: { x: box.x + ladderW + GAP_MM, y: box.y, width: sideW, height: box.height }, result, driveLineBoats, notes, site, sizePt, headingPt: type.heading, where });
      if (side.heightMm > box.height + 1e-6) continue;
      content.push(...side.nodes);
      return assembleScene({
        frame,
        content,
        title: `${family.label} with ${jet.label}: wall chart${differsText}`,
        description: `Impeller ladder for ${family.label} (${family.variants.length} variant${family.variants.length > 1 ? 's' : ''}) with ${jet.impellers.length} impellers of ${jet.label}: for each impeller and variant the predicted WOT rpm with its tolerance bar against the variant's recommended window and maximum rpm, and the status in words${room >= PANEL_MIN_HEIGHT_MM ? '; a power-against-rpm panel with every full-throttle and absorption curve' : ''}.`,
        subject: 'Impeller to engine match: wall chart',
        keywords: ['wall chart', family.id, jet.id],
        dateIso: ctx.dateIso,
        role: 'wall-chart',
      });
    }
  }
  throw new LayoutError(where, `${jet.impellers.length} impellers × ${family.variants.length} engine variants with these labels and cautions do not fit on ${request.paper.size} ${request.paper.orientation} even with 8 pt fine print; use fewer impellers per jet (at most 24), fewer variants (at most 6) or shorter cautions`);
}
