/** Sheet kinds → scenes. */
import type { SheetRequest, SiteConfig, UnitsOverride } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { consoleCardScene } from './consoleCard.ts';
import type { SheetContext } from './context.ts';
import { specSheetScene } from './specSheet.ts';
import { repowerSheetScene } from './repowerSheet.ts';
import { upgradeSheetScene } from './upgradeSheet.ts';
import { wallChartScene } from './wallChart.ts';
import { withExtraCautions } from './kit/cautions.ts';

export { sheetSlug } from './slug.ts';
export { LayoutError } from './kit/errors.ts';
export { BOAT_SHEET_PAPERS, WALL_CHART_PAPERS } from './papers.ts';
export { BUILT_IN_CAUTIONS, cautionsFor, withExtraCautions } from './kit/cautions.ts';
export type { SheetContext } from './context.ts';

/** The site as a sheet with its own units sees it. */
export function withUnits(site: SiteConfig, units: UnitsOverride): SiteConfig {
  const { speedAlso: _also, ...rest } = site;
  const speedUnit = units.speedUnit ?? site.speedUnit;
  const also = units.speedAlso === null ? undefined : (units.speedAlso ?? site.speedAlso);
  return {
    ...rest,
    powerUnitFirst: units.powerUnitFirst ?? site.powerUnitFirst,
    speedUnit,
    fuelUnit: units.fuelUnit ?? site.fuelUnit,
    ...(also !== undefined && also !== speedUnit ? { speedAlso: also } : {}),
  };
}

/** The scene (mm) of one requested sheet; dates come from ctx.dateIso. Throws LayoutError when it cannot be laid out. */
export function sheetScene(request: SheetRequest, given: SheetContext): Scene {
  // A book's own cautions print after the built-in ones and the site's, on every sheet of the book.
  const book = request.bookCautions;
  const withCautions = book ? withExtraCautions(given.project.site, book.texts) : given.project.site;
  // A book or sheet that prints in other units: each unit it gives replaces the site's.
  const site = request.units ? withUnits(withCautions, request.units) : withCautions;
  const ctx: SheetContext = site !== given.project.site ? { ...given, project: { ...given.project, site } } : given;
  switch (request.kind) {
    case 'wallChart':
      return wallChartScene(request, ctx);
    case 'specSheet':
      return specSheetScene(request, ctx);
    case 'consoleCard':
      return consoleCardScene(request, ctx);
    case 'upgradeSheet':
      return upgradeSheetScene(request, ctx);
    case 'repowerSheet':
      return repowerSheetScene(request, ctx);
  }
}
