/**
 * Which sheets a build draws: every default wall chart (engine family × jet unit), the sheets of every
 * boat, and every sheet a book asks for. A sheet asked for twice (a boat's spec sheet in a book) is
 * drawn once.
 */
import { defaultWallCharts } from '../analysis/index.ts';
import type { Boat, Project, SheetRequest } from '../data/types.ts';
import { sheetSlug } from '../sheets/index.ts';

export interface PlannedSheet {
  readonly slug: string;
  readonly request: SheetRequest;
}

export interface SheetPlan {
  /** Every distinct sheet, in a fixed order: wall charts, then boats, then books' extras. */
  readonly sheets: readonly PlannedSheet[];
  readonly byFamily: ReadonlyMap<string, readonly string[]>;
  readonly byBoat: ReadonlyMap<string, readonly string[]>;
  readonly byBook: ReadonlyMap<string, readonly string[]>;
}

/** The sheets each boat gets on the site: a spec sheet for the dealer, a console card, an upgrade sheet. */
export function boatSheetRequests(boat: Boat): SheetRequest[] {
  return [
    { kind: 'specSheet', boatId: boat.id, paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } },
    { kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'landscape', bleedMm: 0 } },
    { kind: 'upgradeSheet', boatId: boat.id, paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } },
  ];
}

/** File names are built from slugs, so a slug must be a plain file-name word. */
function checkedSlug(slug: string): string {
  if (!/^[a-z0-9][a-z0-9._-]*$/.test(slug) || slug.includes('..')) {
    throw new Error(`sheet slug "${slug}" is not a plain lower-case file name`);
  }
  return slug;
}

/**
 * The same sheet kind for the same boat can be asked for on other paper (a book for an overseas office)
 * or, for wall charts, under other conditions. Such a sheet keeps its base slug the first time and gets
 * the paper, then a counter, appended after that; plan order is fixed, so names are stable.
 */
function uniqueSlug(request: SheetRequest, taken: ReadonlySet<string>): string {
  const base = sheetSlug(request);
  const p = request.paper;
  const candidates = [base, `${base}-${p.size}-${p.orientation}${p.bleedMm > 0 ? '-bleed' : ''}`.toLowerCase()];
  for (let n = 2; ; n += 1) {
    const slug = candidates.shift() ?? `${base}-${n}`;
    if (!taken.has(slug)) return checkedSlug(slug);
  }
}

/** Plans every sheet of the project, de-duplicated by slug. */
export function planSheets(project: Project): SheetPlan {
  // Keyed by the request itself: equal requests are one sheet, different ones never share a file.
  const sheets = new Map<string, PlannedSheet>();
  const slugs = new Set<string>();
  const add = (request: SheetRequest): string => {
    const key = JSON.stringify(request);
    const known = sheets.get(key);
    if (known) return known.slug;
    const slug = uniqueSlug(request, slugs);
    slugs.add(slug);
    sheets.set(key, { slug, request });
    return slug;
  };
  const byFamily = new Map<string, string[]>(project.engines.map((f) => [f.id, []]));
  for (const request of defaultWallCharts(project)) {
    if (request.kind === 'wallChart') byFamily.get(request.engineFamilyId)?.push(add(request));
  }
  const byBoat = new Map(project.boats.map((b) => [b.id, boatSheetRequests(b).map(add)]));
  const byBook = new Map(project.books.map((b) => [b.id, b.sheets.map(add)]));
  return { sheets: [...sheets.values()], byFamily, byBoat, byBook };
}
