/** The analyses behind a site: one result per boat, and per engine family the wall charts on its page. */
import { analyseBoat, analyseRepower, analyseWallChart, type BoatResult, type RepowerResult, type WallChartResult } from '../analysis/index.ts';
import type { Project } from '../data/types.ts';
import type { SheetPlan } from './planSheets.ts';

export interface SiteResults {
  readonly boatResults: ReadonlyMap<string, BoatResult>;
  /** The repower comparison of each boat that lists repower options. */
  readonly repowerResults: ReadonlyMap<string, RepowerResult>;
  /** A family's results are those of the wall charts on its page, in the same order. */
  readonly familyResults: ReadonlyMap<string, readonly WallChartResult[]>;
}

/** Analyses every boat and every planned wall chart of the project once. */
export function siteResults(project: Project, plan: SheetPlan): SiteResults {
  const boatResults = new Map(project.boats.map((boat) => [boat.id, analyseBoat({ boat, project })]));
  const repowerResults = new Map(project.boats.flatMap((boat) => {
    const r = analyseRepower({ boat, project });
    return r ? [[boat.id, r] as const] : [];
  }));
  const requests = new Map(plan.sheets.map((p) => [p.slug, p.request]));
  const familyResults = new Map(
    project.engines.map((family) => [
      family.id,
      (plan.byFamily.get(family.id) ?? []).flatMap((slug) => {
        const r = requests.get(slug);
        const jet = project.jets.find((j) => r?.kind === 'wallChart' && j.id === r.jetId);
        return r?.kind === 'wallChart' && jet ? [analyseWallChart({ family, jet, conditions: r.conditions })] : [];
      }),
    ]),
  );
  return { boatResults, repowerResults, familyResults };
}
