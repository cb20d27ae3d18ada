/**
 * Which sheets a build draws: every default wall chart (engine family × jet unit), the sheets of every
 * boat, and every sheet a book asks for. A sheet asked for twice (a boat's spec sheet in a book) is
 * drawn once.
 */
import { bookSheetRequest, conditionsDifferences, defaultWallCharts } from '../analysis/index.ts';
import type { Boat, Project, SheetRequest } from '../data/types.ts';
import { sheetSlug } from '../sheets/index.ts';
import { printedPaper, withCropMarks, type Paper, type PrintOverride } from '../standards/paper.ts';

export interface PlannedSheet {
  readonly slug: string;
  readonly request: SheetRequest;
}

export interface SheetPlan {
  /** Every distinct sheet, in a fixed order: wall charts, then boats, then books' extras. */
  readonly sheets: readonly PlannedSheet[];
  readonly byFamily: ReadonlyMap<string, readonly string[]>;
  readonly byBoat: ReadonlyMap<string, readonly string[]>;
  /** The repower comparison of each boat that lists repower options (its own page on the site). */
  readonly byRepower: ReadonlyMap<string, readonly string[]>;
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

/** A boat's repower comparison on the site, A4 portrait: only for a boat that lists repower options. */
export function repowerSheetRequests(boat: Boat): SheetRequest[] {
  return boat.repowerOptions ? [{ kind: 'repowerSheet', boatId: boat.id, paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } }] : [];
}

/** File names are built from slugs, so a slug must be a plain file-name word. */
function checkedSlug(slug: string): string {
  if (!/^[a-z0-9][a-z0-9._-]*$/.test(slug) || slug.includes('..')) {
    throw new Error(`sheet slug "${slug}" is not a plain lower-case file name`);
  }
  return slug;
}

/**
 * Words naming how a wall chart's conditions differ from those of the first sheet with its base slug:
 * "ratio-1p55", "salt", "1500m", "cruise-80-120-160kw". Empty when the conditions are the same.
 */
export function conditionsDifference(a: SheetRequest, b: SheetRequest): string[] {
  if (a.kind !== 'wallChart' || b.kind !== 'wallChart') return [];
  return conditionsDifferences(a.conditions, b.conditions).map((d) => d.slug);
}

const samePaper = (a: SheetRequest, b: SheetRequest): boolean =>
  a.paper.size === b.paper.size && a.paper.orientation === b.paper.orientation && a.paper.bleedMm === b.paper.bleedMm && withCropMarks(a.paper) === withCropMarks(b.paper);

/** "a4-portrait", "card4x6-landscape-bleed", "a5-portrait-marks": a paper in a slug (marks said only when not the default). */
function paperWord(p: Paper): string {
  const marks = p.cropMarks === undefined || p.cropMarks === p.bleedMm > 0 ? '' : p.cropMarks ? '-marks' : '-no-marks';
  return `${p.size}-${p.orientation}${p.bleedMm > 0 ? '-bleed' : ''}${marks}`.toLowerCase();
}

/**
 * The same sheet kind for the same boat or pairing can be asked for on other paper (a book for an
 * overseas office) or, for wall charts, under other conditions. The first keeps its base slug; a later
 * one says what differs from it: the conditions that differ, then the paper only if that differs too,
 * then a counter. Plan order is fixed, so names are stable.
 */
function uniqueSlug(request: SheetRequest, first: ReadonlyMap<string, SheetRequest>, taken: ReadonlySet<string>): string {
  const base = sheetSlug(request);
  const earlier = first.get(base);
  const paper = paperWord(request.paper);
  const words = earlier ? conditionsDifference(request, earlier) : [];
  // A book's own cautions make its sheet its own file: named after the book when nothing else tells it apart.
  const book = request.bookCautions && earlier && JSON.stringify(request.bookCautions) !== JSON.stringify(earlier.bookCautions) ? [request.bookCautions.bookId] : [];
  // Other units make a sheet of their own: "mph", "hp", "usgal".
  const unitWords = earlier && JSON.stringify(request.units ?? {}) !== JSON.stringify(earlier.units ?? {}) ? unitsWords(request) : [];
  const withPaper = [...(earlier && !samePaper(request, earlier) ? [...words, paper] : words), ...unitWords];
  const candidates = [[base, ...withPaper].join('-'), ...(book.length > 0 ? [[base, ...withPaper, ...book].join('-')] : []), [base, ...words, paper].join('-')];
  for (let n = 2; ; n += 1) {
    const slug = candidates.shift() ?? `${[base, ...withPaper].join('-')}-${n}`;
    if (!taken.has(slug)) return checkedSlug(slug);
  }
}

/** File-name words for the units a request gives: "mph-kn" (mph with knots in brackets), "hp", "usgal", "impgal". */
function unitsWords(request: SheetRequest): string[] {
  const u = request.units ?? {};
  const speed = (s: string) => s.replace('/', '');
  return [
    ...(u.speedUnit ? [u.speedAlso ? `${speed(u.speedUnit)}-${speed(u.speedAlso)}` : speed(u.speedUnit)] : u.speedAlso ? [`also-${speed(u.speedAlso)}`] : []),
    ...(u.powerUnitFirst ? [u.powerUnitFirst.toLowerCase()] : []),
    ...(u.fuelUnit ? [u.fuelUnit === 'L/h' ? 'litres' : u.fuelUnit === 'US gal/h' ? 'usgal' : 'impgal'] : []),
    ...(Object.keys(u).length === 0 ? ['site-units'] : []),
  ];
}

/**
 * Plans every sheet of the project, de-duplicated by slug. `print` (the command line's --bleed and
 * --crop-marks) overrides the paper of every sheet: wall charts, boat sheets and books' sheets alike.
 */
export function planSheets(project: Project, print: PrintOverride = {}): SheetPlan {
  // Keyed by the request itself: equal requests are one sheet, different ones never share a file.
  const sheets = new Map<string, PlannedSheet>();
  const slugs = new Set<string>();
  const firstByBase = new Map<string, SheetRequest>();
  const add = (asked: SheetRequest): string => {
    const request: SheetRequest = { ...asked, paper: printedPaper(asked.paper, print) };
    const key = JSON.stringify(request);
    const known = sheets.get(key);
    if (known) return known.slug;
    const slug = uniqueSlug(request, firstByBase, slugs);
    slugs.add(slug);
    if (!firstByBase.has(sheetSlug(request))) firstByBase.set(sheetSlug(request), request);
    sheets.set(key, { slug, request });
    return slug;
  };
  const byFamily = new Map<string, string[]>(project.engines.map((f) => [f.id, []]));
  for (const request of defaultWallCharts(project)) {
    if (request.kind === 'wallChart') byFamily.get(request.engineFamilyId)?.push(add(request));
  }
  const byBoat = new Map(project.boats.map((b) => [b.id, boatSheetRequests(b).map(add)]));
  const byRepower = new Map(project.boats.flatMap((b) => (b.repowerOptions ? [[b.id, repowerSheetRequests(b).map(add)] as const] : [])));
  const byBook = new Map(project.books.map((b) => [b.id, b.sheets.map((s) => add(bookSheetRequest(project, s)))]));
  return { sheets: [...sheets.values()], byFamily, byBoat, byRepower, byBook };
}
