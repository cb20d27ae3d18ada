/**
 * Engine-family wall chart (A3 landscape by default): the match chart of every variant against every
 * impeller of one jet, a key, the conditions, a results table (impeller × variant) and the cautions.
 */
import type { ChartConditions, SheetRequest } from '../data/types.ts';
import type { Scene, SceneNode } from '../scene/types.ts';
import { analyseWallChart, isWarning, toleranceNote, type WallChartResult } from '../analysis/index.ts';
import { matchChart, type ChartPoint } from './chart/matchChart.ts';
import { engineSeries, impellerSeries, variantShortLabels } from './chart/series.ts';
import { assembleScene, assertFits } from './kit/assemble.ts';
import { linePitchMm, paragraph } from './kit/block.ts';
import { cautionsBlock } from './kit/cautions.ts';
import { LayoutError } from './kit/errors.ts';
import { powerText, rpmBandText, rpmText } from './kit/format.ts';
import { sheetFrame } from './kit/frame.ts';
import { legend, type LegendRow } from './kit/legend.ts';
import { INK, INK_SOFT, STROKE, WARN, typeScale } from './kit/style.ts';
import { table } from './kit/table.ts';
import type { SheetContext } from './context.ts';
import { conditionsText, pointSuffix } from './words.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

/** Rpm and power ranges that show every crossing, cruise line and the rev limit with some air. */
function domains(r: WallChartResult, conditions: ChartConditions): { rpm: [number, number]; powerKw: [number, number] } {
  const maxRpm = Math.max(...r.variants.map((v) => v.limits.maxRpm));
  const windowLow = Math.min(...r.variants.map((v) => v.limits.windowLowRpm));
  const crossings = r.cruise.flatMap((c) => c.crossings.map((x) => x.speedRpm));
  const lo = Math.min(windowLow * 0.8, ...crossings) * 0.95;
  const peak = Math.max(...r.variants.flatMap((v) => [v.reference.peakPowerKw, v.site.peakPowerKw]));
  // Below ~45 % of peak power nothing is read at WOT; the lowest cruise line still fits.
  const powerLo = Math.min(0.45 * peak, ...conditions.cruisePowersKw) * 0.85;
  return { rpm: [Math.floor(lo / 100) * 100, maxRpm * 1.04], powerKw: [powerLo, peak * 1.06] };
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
    subtitle: `Wall chart: every impeller against every variant · ${conditionsText(result.conditions)}`,
    dateIso: ctx.dateIso,
    type,
    where,
  });
  const box = frame.contentBox;
  const sideW = Math.min(130, box.width * 0.33);
  const mainW = box.width - sideW - 8;
  const sideX = box.x + mainW + 8;

  // Results table under the chart.
  const shorts = variantShortLabels(family.variants);
  const variantLabel = (id: string) => shorts[family.variants.findIndex((v) => v.variantId === id)];
  const impLabel = (id: string) => jet.impellers.find((i) => i.id === id)?.label ?? id;
  const rows = result.pairings.map((p) => {
    const b = p.band;
    const warn = isWarning(b.nominal.status);
    return [
      impLabel(p.impellerId),
      variantLabel(p.variantId),
      rpmBandText(b.low.speedRpm, b.high.speedRpm),
      rpmText(b.nominal.speedRpm),
      powerText(b.nominal.powerKw, unit),
      { text: b.nominal.statusText, weight: warn ? ('bold' as const) : ('regular' as const), colour: warn ? WARN : INK },
      toleranceNote({ nominal: b.nominal.status, low: b.low.status, high: b.high.status }) || '–',
    ];
  });
  const columns = [
    { header: 'Impeller', align: 'left' as const },
    { header: 'Engine', align: 'left' as const },
    { header: 'WOT band', align: 'right' as const },
    { header: 'Nominal rpm', align: 'right' as const },
    { header: `Power (${unit})`, align: 'right' as const },
    { header: 'Status', align: 'left' as const },
    { header: 'Within tolerance', align: 'left' as const },
  ];
  const tableHeight = (rows.length + 1) * (linePitchMm(type.small, 'bold') + 0.6);
  const chartBox = { x: box.x, y: box.y, width: mainW, height: box.height - tableHeight - 6 };
  const impellers = impellerSeries({ jet, driveLine: conditions.driveLine, waterDensityKgM3: conditions.water.densityKgM3 });
  const engines = engineSeries({ family, ambient: conditions.site.ambient });
  const d = domains(result, conditions);
  const points: ChartPoint[] = result.pairings.map((p) => ({
    key: `impeller:${p.impellerId}|engine:${p.variantId}`,
    impellerId: p.impellerId,
    filled: p.variantId === family.variants[0].variantId,
    speedRpm: p.band.nominal.speedRpm,
    powerKw: p.band.nominal.powerKw,
    text: `${family.variants.length > 1 ? `${variantLabel(p.variantId)} ` : ''}${rpmText(p.band.nominal.speedRpm)} rpm, ${powerText(p.band.nominal.powerKw, unit)}${pointSuffix(p.band.nominal.status)}`,
    warn: isWarning(p.band.nominal.status),
  }));
  const firstLimits = family.variants[0].limits;
  const chart = matchChart({
    box: chartBox,
    sizePt: type.small,
    powerUnitFirst: unit,
    rpmDomain: d.rpm,
    powerKwDomain: d.powerKw,
    impellers,
    engines,
    points,
    window: { lowRpm: firstLimits.windowLowRpm, highRpm: firstLimits.windowHighRpm },
    maxRpm: Math.min(...family.variants.map((v) => v.limits.maxRpm)),
    cruise: result.cruise.map((c) => ({ powerKw: c.powerKw, text: `${powerText(c.powerKw, unit)} cruise`, crossings: c.crossings })),
    markerMm: 2.8,
    where,
  });
  const resultsTable = table({ x: box.x, y: chartBox.y + chartBox.height + 6, maxWidthMm: mainW, columns, rows, sizePt: type.small, minSizePt: type.min, fullWidth: true, role: 'results-table', where: `${where}: results table` });

  // Side column: key, conditions, callout notes, cautions.
  const content: SceneNode[] = [chart.node, ...resultsTable.nodes];
  let cursor = box.y;
  const heading = (text: string) => {
    const p = paragraph({ x: sideX, y: cursor, widthMm: sideW, text, sizePt: type.heading, weight: 'bold', role: 'heading', where });
    content.push(...p.nodes);
    cursor += p.heightMm + 1;
  };
  heading('Key');
  const keyRows: LegendRow[] = [
    ...impellers.map((imp) => ({ text: `Impeller ${imp.label} ± ${jet.family.tolerancePct} %`, colour: imp.style.colour, widthMm: STROKE.series, dashMm: imp.style.dashMm, marker: { shape: imp.style.marker, fill: imp.style.colour }, bandColour: imp.style.colour })),
    ...engines.flatMap((e) => [
      { text: `${e.label} full throttle`, colour: INK, widthMm: e.widthMm, dashMm: e.dashMm },
      ...(e.reference ? [{ text: e.referenceLabel ?? '', colour: INK_SOFT, widthMm: STROKE.rule, dashMm: [3, 1.2] }] : []),
    ]),
    { text: 'Maximum engine speed', colour: WARN, widthMm: STROKE.engine, dashMm: [4, 1.5] },
    { text: 'Constant-power cruise line', colour: INK_SOFT, widthMm: STROKE.rule, dashMm: [0.8, 1.2] },
  ];
  const key = legend({ x: sideX, y: cursor, widthMm: sideW, rows: keyRows, sizePt: type.small, where });
  content.push(...key.nodes);
  cursor += key.heightMm + 2;
  const fillNote = family.variants.length > 1 ? ` Filled markers: ${shorts[0]}; open markers: other variants.` : '';
  for (const text of [
    `Markers show the WOT operating point (engine full-throttle power equals the power the impeller takes). Shaded bands: impeller rating ± ${jet.family.tolerancePct} %.${fillNote} Green band: recommended WOT window.`,
    `Conditions: ${conditionsText(result.conditions)}. Absorption exponent ${result.exponent}.`,
    ...chart.notes.map((n) => `(${n.number}) ${n.text}`),
  ]) {
    const p = paragraph({ x: sideX, y: cursor, widthMm: sideW, text, sizePt: type.small, where });
    content.push(...p.nodes);
    cursor += p.heightMm + 2;
  }
  cursor += 2;
  const cautions = cautionsBlock({ site, x: sideX, y: cursor, widthMm: sideW, sizePt: type.small, headingPt: type.heading, where });
  content.push(...cautions.nodes);
  cursor += cautions.heightMm;
  assertFits(box, cursor, where);
  assertFits(box, resultsTable.heightMm + chartBox.y + chartBox.height + 6, where);
  return assembleScene({
    frame,
    content,
    title: `${family.label} with ${jet.label}: wall chart`,
    description: `Match chart of ${family.variants.length} engine variant(s) of ${family.label} against ${jet.impellers.length} impellers of ${jet.label}, with WOT operating points, the recommended window, the maximum engine speed and constant-power cruise lines, and a results table.`,
    subject: 'Impeller to engine match: wall chart',
    keywords: ['wall chart', family.id, jet.id],
    dateIso: ctx.dateIso,
    role: 'wall-chart',
  });
}
