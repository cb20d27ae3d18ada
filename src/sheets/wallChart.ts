/**
 * Engine-family wall chart (A3 landscape by default), made to be read across a workshop: one panel per
 * engine variant (small multiples, up to three a row, on the same scales), each with every impeller of
 * one jet, that variant's own window and limit, and its WOT points labelled by rpm; under them a compact
 * results table (impeller rows, variant column groups); on the right the key, conditions and cautions.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Box, Scene, SceneNode } from '../scene/types.ts';
import { analyseWallChart, isWarning } from '../analysis/index.ts';
import { pairingBoats } from '../analysis/defaults.ts';
import { engineSeries, impellerSeries, variantShortLabels } from './chart/series.ts';
import { assembleScene } from './kit/assemble.ts';
import { powerAxisWidthMm } from './kit/axes.ts';
import { LayoutError } from './kit/errors.ts';
import { powerText } from './kit/format.ts';
import { STROKE, typeScale } from './kit/style.ts';
import type { SheetContext } from './context.ts';
import { conditionsText } from './words.ts';
import { panelDomains } from './wallChart/domains.ts';
import { wallChartPanel } from './wallChart/panel.ts';
import { wallChartTable } from './wallChart/resultsTable.ts';
import { wallChartSide } from './wallChart/sideColumn.ts';
import { sheetFrame } from './kit/frame.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

/** At most this many panels side by side; more variants wrap to a new row. */
const PANELS_PER_ROW = 3;
const PANEL_GAP_MM = 5;
const MARKER_MM = 3.4;

/** Panel boxes (mm) in rows inside `area`, every plot the same width so the shared scales line up. */
function panelBoxes(area: Box, count: number, sizePt: number): { box: Box; sides: { left: boolean; right: boolean } }[] {
  const perRow = Math.min(PANELS_PER_ROW, count);
  const rows = Math.ceil(count / perRow);
  const labelled = powerAxisWidthMm(sizePt, true);
  const bare = powerAxisWidthMm(sizePt, false);
  // Width = two labelled outer axes + bare inner axes + gaps + perRow equal plots.
  const plotW = (area.width - 2 * labelled - 2 * bare * (perRow - 1) - PANEL_GAP_MM * (perRow - 1)) / perRow;
  const height = (area.height - PANEL_GAP_MM * (rows - 1)) / rows;
  return Array.from({ length: count }, (_, i) => {
    const row = Math.floor(i / perRow);
    const col = i % perRow;
    const inRow = Math.min(perRow, count - row * perRow);
    const sides = { left: col === 0, right: col === inRow - 1 };
    const x = area.x + (col === 0 ? 0 : labelled + plotW + bare + PANEL_GAP_MM + (col - 1) * (2 * bare + plotW + PANEL_GAP_MM));
    const width = (sides.left ? labelled : bare) + plotW + (sides.right ? labelled : bare);
    return { box: { x, y: area.y + row * (height + PANEL_GAP_MM), width, height }, sides };
  });
}

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
  const frame = sheetFrame({
    paper: request.paper,
    site,
    title: `${family.label} with ${jet.label}`,
    subtitle: `Wall chart, one panel per engine variant · drawn for ${conditionsText(result.conditions)}`,
    dateIso: ctx.dateIso,
    type,
    where,
  });
  const box = frame.contentBox;
  const sideW = Math.min(104, box.width * 0.27);
  const mainW = box.width - sideW - 8;
  const headings = variantShortLabels(family.variants);

  // The table's height sets the room left for the panels, so lay it out once to measure it.
  const tableAt = (y: number) => wallChartTable({ result, variantLabels: headings, x: box.x, y, maxWidthMm: mainW, sizePt: type.small, minSizePt: type.min, where });
  const tableH = tableAt(box.y).heightMm;
  const panelArea = { x: box.x, y: box.y, width: mainW, height: box.height - tableH - 6 };
  const impellers = impellerSeries({ jet, driveLine: conditions.driveLine, waterDensityKgM3: conditions.water.densityKgM3 });
  // One engine per panel: every variant drawn solid and heavy; the panel heading names it.
  const engines = engineSeries({ family, ambient: conditions.site.ambient }).map((e) => ({ ...e, widthMm: STROKE.emphasis, dashMm: [] }));
  const domains = panelDomains(result, engines);
  const cruise = result.cruise.filter((c) => domains.cruisePowersKw.includes(c.powerKw));
  const impLabel = (id: string) => jet.impellers.find((i) => i.id === id)?.label ?? id;

  const content: SceneNode[] = [];
  const notes: string[] = [];
  panelBoxes(panelArea, family.variants.length, type.small).forEach(({ box: panelBox, sides }, i) => {
    const variant = result.variants[i];
    const panel = wallChartPanel({
      box: panelBox,
      sides,
      sizePt: type.small,
      headingPt: type.heading,
      powerUnitFirst: unit,
      domains,
      impellers,
      engine: engines[i],
      heading: headings[i],
      limits: variant.limits,
      points: result.pairings
        .filter((p) => p.variantId === variant.variantId)
        .map((p) => ({ key: `impeller:${p.impellerId}|engine:${p.variantId}`, impellerId: p.impellerId, speedRpm: p.band.nominal.speedRpm, powerKw: p.band.nominal.powerKw, warn: isWarning(p.band.nominal.status) })),
      cruise,
      markerMm: MARKER_MM,
      variantId: variant.variantId,
      where: `${where}, ${headings[i]}`,
    });
    content.push(panel.node);
    for (const n of panel.notes) {
      const impellerId = /^impeller:([^|]+)\|/.exec(n.key)?.[1];
      notes.push(`${headings[i]} (${n.number}): ${impellerId ? `${impLabel(impellerId)} at ${n.text} rpm` : n.text}`);
    }
  });
  content.push(...tableAt(box.y + box.height - tableH).nodes);

  const dropped = result.cruise.filter((c) => !domains.cruisePowersKw.includes(c.powerKw)).map((c) => powerText(c.powerKw, unit));
  const paired = pairingBoats(ctx.project, family.id, jet.id);
  content.push(
    ...wallChartSide({
      box: { x: box.x + mainW + 8, y: box.y, width: sideW, height: box.height },
      result,
      impellers,
      anyPublishedCurve: engines.some((e) => e.reference),
      driveLineBoats: paired.filter((b) => b.driveLine.ratio === conditions.driveLine.ratio && b.driveLine.efficiency === conditions.driveLine.efficiency),
      droppedCruiseText: dropped.length > 0 ? `Cruise line${dropped.length > 1 ? 's' : ''} at ${dropped.join(', ')} left out: no impeller needs ${dropped.length > 1 ? 'those powers' : 'that power'} in the rpm range shown.` : '',
      notes,
      markerMm: MARKER_MM,
      site,
      type,
      where,
    }),
  );
  return assembleScene({
    frame,
    content,
    title: `${family.label} with ${jet.label}: wall chart`,
    description: `One match-chart panel per engine variant of ${family.label} (${family.variants.length}) against ${jet.impellers.length} impellers of ${jet.label}, on shared scales, with WOT operating points, each variant's recommended window and maximum engine speed, constant-power cruise lines, and a results table.`,
    subject: 'Impeller to engine match: wall chart',
    keywords: ['wall chart', family.id, jet.id],
    dateIso: ctx.dateIso,
    role: 'wall-chart',
  });
}
