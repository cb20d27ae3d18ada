/**
 * The layout half of `check`, and the words of a sheet that cannot be drawn. `check` lays out every
 * sheet the build would draw (the same plan, the same scene code, no rendering), so a catalogue that
 * passes `check` builds. A sheet that cannot be laid out is reported at the definition that asked for
 * it — the book's sheets[i] entry, the boat file, or for a default wall chart the jet's impellers — with
 * file:line:column, never only a sheet slug.
 */
import { readFileSync } from 'node:fs';
import { lfLineBreaks } from '../data/lineBreaks.ts';
import { dataError, fieldName } from '../data/errors.ts';
import type { DataError, Project, SheetRequest } from '../data/types.ts';
import { parseYaml, type PathSegment, type YamlSource } from '../data/yamlSource.ts';
import type { Scene } from '../scene/types.ts';
import { sheetScene } from '../sheets/index.ts';
import { bookPages } from './bookPages.ts';
import type { PrintOverride } from '../standards/paper.ts';
import { isUserFixable, type SheetDrawError } from './errors.ts';
import { planSheets, type SheetPlan } from './planSheets.ts';

const KIND_WORDS: Readonly<Record<SheetRequest['kind'], string>> = {
  wallChart: 'a wall chart',
  specSheet: 'a spec sheet',
  consoleCard: 'a console card',
  upgradeSheet: 'an upgrade sheet',
  repowerSheet: 'a repower comparison',
};

export interface SheetProblemOptions {
  /** Reads a definition file to find the line; defaults to the disk. Undefined when it cannot be read. */
  readonly readText?: (file: string) => string | undefined;
  /** --bleed and --crop-marks of the run, as planSheets takes them. */
  readonly print?: PrintOverride;
}

/** Every sheet of the build laid out; a located error for each one that cannot be. */
export function layoutProblems(project: Project, opts: SheetProblemOptions & { dateIso: string; plan?: SheetPlan }): DataError[] {
  const plan = opts.plan ?? planSheets(project, opts.print);
  const place = placeFinder(opts.readText);
  const problems: DataError[] = [];
  const scenes = new Map<string, Scene>();
  for (const { slug, request } of plan.sheets) {
    try {
      scenes.set(slug, sheetScene(request, { project, dateIso: opts.dateIso }));
    } catch (error) {
      if (!isUserFixable(error)) throw error;
      problems.push(sheetProblem({ project, plan, slug, request, cause: error, place }));
    }
  }
  // Each book's contents page and numbered pages, laid out as the build lays them (when its sheets could be).
  for (const book of project.books) {
    const slugs = plan.byBook.get(book.id) ?? [];
    if (slugs.length === 0 || !slugs.every((s) => scenes.has(s))) continue;
    const firstPaper = plan.sheets.find((p) => p.slug === slugs[0])!.request.paper;
    try {
      bookPages({ book, project, scenes: slugs.map((s) => scenes.get(s)!), firstPaper, dateIso: opts.dateIso });
    } catch (error) {
      if (!isUserFixable(error)) throw error;
      const at = place(book.source.file, ['title']);
      problems.push(dataError({ file: book.source.file, ...at }, { field: fieldName(['title']), expected: "must give a book whose contents page fits its first sheet's paper", found: (error as Error).message }));
    }
  }
  return problems;
}

/** A SheetDrawError from the build, said at the definition that asked for the sheet. */
export function sheetDrawProblem(project: Project, error: SheetDrawError, opts: SheetProblemOptions = {}): DataError {
  const plan = planSheets(project, opts.print);
  const planned = plan.sheets.find((s) => s.slug === error.slug);
  const cause = error.cause instanceof Error ? error.cause : error;
  if (!planned) return dataError({ file: 'site.yaml', line: 1, column: 1 }, { field: '', expected: `must give a sheet ${error.slug} that can be drawn`, found: cause.message });
  return sheetProblem({ project, plan, slug: error.slug, request: planned.request, cause, place: placeFinder(opts.readText) });
}

interface Origin {
  readonly file: string;
  readonly path: PathSegment[];
}

/** Which definition asked for the sheet: a book entry first (its paper is part of the problem), then the boat, then the pairing. */
function originOf(project: Project, plan: SheetPlan, slug: string, request: SheetRequest): Origin {
  for (const book of project.books) {
    const i = (plan.byBook.get(book.id) ?? []).indexOf(slug);
    if (i >= 0) return { file: book.source.file, path: ['sheets', i] };
  }
  if (request.kind !== 'wallChart') {
    const boat = project.boats.find((b) => b.id === request.boatId);
    if (boat) return { file: boat.source.file, path: ['name'] };
  } else {
    const jet = project.jets.find((j) => j.id === request.jetId);
    if (jet) return { file: jet.source.file, path: ['impellers'] };
  }
  return { file: 'site.yaml', path: [] };
}

type PlaceFinder = (file: string, path: readonly PathSegment[]) => { line: number; column: number };

/** Where a field's key is in its file; each file is read and parsed once however many sheets it fails. */
function placeFinder(read: SheetProblemOptions['readText'] = readText): PlaceFinder {
  const sources = new Map<string, YamlSource | undefined>();
  return (file, path) => {
    if (!sources.has(file)) {
      const text = read(file);
      const parsed = text === undefined ? undefined : parseYaml({ file, text });
      sources.set(file, parsed?.ok ? parsed.source : undefined);
    }
    return sources.get(file)?.locate(path, { at: 'key' }) ?? { line: 1, column: 1 };
  };
}

function sheetProblem(args: { project: Project; plan: SheetPlan; slug: string; request: SheetRequest; cause: Error; place: PlaceFinder }): DataError {
  const { request } = args;
  const origin = originOf(args.project, args.plan, args.slug, request);
  const where = args.place(origin.file, origin.path);
  const p = request.paper;
  const paper = `${p.size === 'Card4x6' ? '4x6' : p.size} ${p.orientation}${p.bleedMm > 0 ? ' with bleed' : ''}`;
  const about = request.kind === 'wallChart' ? `engine family ${request.engineFamilyId} with jet ${request.jetId}` : `boat ${request.boatId}`;
  // The cause reads "<part of the sheet>: <what> ; <fix>"; keep the what, offer its fix.
  const part = (args.cause as { where?: unknown }).where;
  const message = typeof part === 'string' && args.cause.message.startsWith(`${part}: `) ? args.cause.message.slice(part.length + 2) : args.cause.message;
  const split = message.lastIndexOf('; ');
  const found = split > 0 ? message.slice(0, split) : message;
  const fix = split > 0 ? message.slice(split + 2) : 'shorten the text or use larger paper';
  return dataError(
    { file: origin.file, line: where.line, column: where.column },
    {
      field: fieldName(origin.path),
      expected: `asks for ${KIND_WORDS[request.kind]} (${about}, ${paper}; file ${args.slug}) that must fit its paper`,
      found,
      fix,
    },
  );
}

function readText(file: string): string | undefined {
  try {
    return lfLineBreaks(readFileSync(file, 'utf8'));
  } catch {
    return undefined;
  }
}
