/** Sheet kinds → scenes. */
import type { SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { consoleCardScene } from './consoleCard.ts';
import type { SheetContext } from './context.ts';
import { specSheetScene } from './specSheet.ts';
import { upgradeSheetScene } from './upgradeSheet.ts';
import { wallChartScene } from './wallChart.ts';

export { sheetSlug } from './slug.ts';
export { LayoutError } from './kit/errors.ts';
export { BOAT_SHEET_PAPERS, WALL_CHART_PAPERS } from './papers.ts';
export { BUILT_IN_CAUTIONS, cautionsFor } from './kit/cautions.ts';
export type { SheetContext } from './context.ts';

/** The scene (mm) of one requested sheet; dates come from ctx.dateIso. Throws LayoutError when it cannot be laid out. */
export function sheetScene(request: SheetRequest, ctx: SheetContext): Scene {
  switch (request.kind) {
    case 'wallChart':
      return wallChartScene(request, ctx);
    case 'specSheet':
      return specSheetScene(request, ctx);
    case 'consoleCard':
      return consoleCardScene(request, ctx);
    case 'upgradeSheet':
      return upgradeSheetScene(request, ctx);
  }
}
