/**
 * The loader: YAML files → a validated, unit-normalised Project, or every located error at once.
 * Nothing half-built ever leaves: one error anywhere and the result is the error list.
 */
import { lstat, readdir, readFile, realpath, stat } from 'node:fs/promises';
import { posix, resolve, sep } from 'node:path';
import { compareText, dataError, sortErrors } from './errors.ts';
import { classify, KIND_DIRS, type FileKind, type SourceFile } from './files.ts';
import { looseBoatReferences, looseBookReferences, memberIds } from './looseReferences.ts';
import { normaliseBoat } from './normalise/boat.ts';
import { normaliseBook } from './normalise/book.ts';
import { normaliseEngine } from './normalise/engine.ts';
import { normaliseJet } from './normalise/jet.ts';
import type { Normalised } from './normalise/shared.ts';
import { normaliseSite } from './normalise/site.ts';
import { isTrialLog, strayLogs } from './normalise/boatLog.ts';
import { trialLogPath } from './trialLog.ts';
import { boatFile, bookFile, engineFile, jetFile, siteFile } from './schema/index.ts';
import { SLUG_PATTERN } from './schema/common.ts';
import type { Boat, Book, DataError, EngineFamily, JetUnit, LoadResult, SiteConfig } from './types.ts';
import { at, validate } from './validate.ts';
import { decodeUtf8 } from './utf8.ts';
import { lfLineBreaks } from './lineBreaks.ts';
import { MAX_FILE_BYTES, parseYaml, type YamlSource } from './yamlSource.ts';

export type { SourceFile } from './files.ts';

const SCHEMAS = { engine: engineFile(), jet: jetFile(), boat: boatFile(), book: bookFile(), site: siteFile() } as const;

/** A file that parsed and passed its schema (raw still in file units). */
interface Checked {
  readonly kind: FileKind;
  readonly stem: string;
  readonly source?: YamlSource;
  readonly raw: unknown;
}

/**
 * Load every definition under dataDir (engines/, jets/, boats/, books/, site.yaml). Never throws.
 * opts.replace gives one file's text as it would be (add-trial checks a log before writing it).
 */
export async function loadProject(dataDir: string, opts: { replace?: SourceFile } = {}): Promise<LoadResult> {
  const root = dataDir.replace(/\\/g, '/').replace(/\/+$/, '') || '.';
  try {
    if (!(await stat(root)).isDirectory()) return folderError(root, 'a file');
  } catch {
    return folderError(root, 'nothing there');
  }
  const paths = [posix.join(root, 'site.yaml')];
  for (const dir of Object.keys(KIND_DIRS)) {
    const names = await readdir(posix.join(root, dir)).catch(() => [] as string[]);
    paths.push(...names.sort().map((n) => posix.join(root, dir, n)));
  }
  const rootNames = await readdir(root).catch(() => [] as string[]);
  paths.push(...rootNames.filter((n) => /\.ya?ml$/.test(n) && n !== 'site.yaml').sort().map((n) => posix.join(root, n)));
  const realRoot = await realpath(root).catch(() => resolve(root));
  const read = (await Promise.all(paths.map((path) => readSource(path, realRoot)))).filter((f): f is SourceFile => f !== null);
  const files = opts.replace ? [...read.filter((f) => f.path !== opts.replace!.path), opts.replace] : read;
  return loadProjectFromFiles(files, { dataDir: root });
}

function folderError(root: string, found: string): LoadResult {
  const e = dataError({ file: root, line: 1, column: 1 }, { field: '', expected: 'must be the data folder (holding site.yaml, engines/, jets/, boats/, books/)', found, fix: 'pass --data with the right folder' });
  return { ok: false, errors: [{ ...e, message: e.message.replace(' the file ', ' the folder ') }], warnings: [] };
}

/**
 * Reads one file of the data folder. A file that is, or lies in, a link leading outside the data
 * folder is refused unread (its target and contents never reach a message): a data folder is what
 * its owner put there, not a door to the rest of the machine.
 */
async function readSource(path: string, realRoot: string): Promise<SourceFile | null> {
  try {
    const link = await lstat(path).catch((err: { code?: string }) => (err.code === 'ENOENT' ? null : Promise.reject(err)));
    if (link === null) return null;
    const real = await realpath(path).catch(() => null);
    if (real === null) {
      return { path, text: '', unreadable: { expected: 'must be a file', found: 'a link to something that does not exist', fix: 'copy the file into the data folder, or remove the link' } };
    }
    if (real !== realRoot && !real.startsWith(`${realRoot}${sep}`)) {
      const found = link.isSymbolicLink() ? 'a symbolic link that leads outside the data folder' : 'a file in a folder that is a link leading outside the data folder';
      return { path, text: '', unreadable: { expected: 'must be a file inside the data folder', found, fix: 'copy the file into the data folder instead of linking to it' } };
    }
    const info = await stat(path);
    if (!info.isFile()) return null;
    if (info.size > MAX_FILE_BYTES) {
      return { path, text: '', unreadable: { expected: `must be at most ${MAX_FILE_BYTES / 1024 / 1024} MB`, found: `${(info.size / 1024 / 1024).toFixed(1)} MB`, fix: 'definitions are small; split or trim the file' } };
    }
    const decoded = decodeUtf8(await readFile(path));
    if (decoded.ok) return { path, text: decoded.text };
    const byte = `0x${decoded.byte.toString(16).toUpperCase().padStart(2, '0')}`;
    return {
      path,
      text: '',
      unreadable: { line: decoded.line, column: decoded.column, expected: 'must be UTF-8 text', found: `the byte ${byte}, which is not UTF-8`, fix: 'save the file as UTF-8 in your editor (it may have been saved as Latin-1 or Windows-1252)' },
    };
  } catch (err) {
    const code = (err as { code?: string }).code;
    if (code === 'ENOENT') return null;
    return { path, text: '', unreadable: { expected: 'must be readable', found: code ?? 'an error', fix: 'check the file permissions' } };
  }
}

/** Pure core of the loader: the same answer for the same files, in any order. Never throws. */
export function loadProjectFromFiles(files: readonly SourceFile[], opts: { dataDir?: string } = {}): LoadResult {
  try {
    return loadFiles(files, opts);
  } catch (err) {
    // A bug of ours must still reach the technician as one located sentence, not a stack trace.
    const reason = err instanceof Error ? err.message : String(err);
    const place = { file: opts.dataDir ?? files[0]?.path ?? '.', line: 1, column: 1 };
    return { ok: false, errors: [dataError(place, { field: '', expected: 'could not be loaded because of an internal error', found: reason.split('\n')[0], fix: 'please report this with the file attached' })], warnings: [] };
  }
}

function loadFiles(files: readonly SourceFile[], opts: { dataDir?: string }): LoadResult {
  const errors: DataError[] = [];
  const warnings: DataError[] = [];
  const checked: Checked[] = [];
  const seen = new Map<string, string>();
  const logs = new Map<string, SourceFile>();
  let root = opts.dataDir;
  for (const f of [...files].sort((a, b) => compareText(a.path, b.path))) {
    const c = classify(f.path);
    const place = { file: f.path, line: 1, column: 1 };
    if (c.kind === 'ignored') {
      if (c.reason) warnings.push(dataError(place, { field: '', ...c.reason }));
      // A sea-trial log is read with the boat file beside it (boats/<id>.trials.csv), not on its own.
      if (isTrialLog(f.path)) logs.set(f.path.replace(/\\/g, '/'), f);
      continue;
    }
    root ??= c.root;
    const key = `${c.kind}:${c.stem}`;
    if (seen.has(key)) {
      errors.push(dataError(place, { field: 'id', expected: `must be unique among ${c.kind} files`, found: `"${c.stem}" again (also ${seen.get(key)})`, fix: 'remove one copy' }));
      continue;
    }
    seen.set(key, f.path);
    if (f.unreadable) {
      const { line = 1, column = 1, ...problem } = f.unreadable;
      errors.push(dataError({ file: f.path, line, column }, { field: '', ...problem }));
      checked.push({ kind: c.kind, stem: c.stem, raw: undefined });
      continue;
    }
    const one = checkFile({ path: f.path, text: lfLineBreaks(f.text), kind: c.kind, stem: c.stem });
    errors.push(...one.errors);
    checked.push({ kind: c.kind, stem: c.stem, source: one.source, raw: one.raw });
  }
  const built = buildProject(checked, logs);
  errors.push(...built.errors);
  warnings.push(...built.warnings);
  if (!checked.some((c) => c.kind === 'site')) {
    errors.push(dataError({ file: posix.join(root ?? '.', 'site.yaml'), line: 1, column: 1 }, { field: '', expected: 'must exist (shop name, contact line, data revision, issue date)', found: 'no such file', fix: 'create it (matchbook start writes one in a new folder); see the data-format guide' }));
  }
  if (errors.length > 0 || !built.site) return { ok: false, errors: sortErrors(errors), warnings: sortErrors(warnings) };
  return { ok: true, project: { site: built.site, engines: built.engines, jets: built.jets, boats: built.boats, books: built.books }, warnings: sortErrors(warnings) };
}

/** Parse, validate and check the id of one file; raw is undefined unless it passed. */
function checkFile(args: { path: string; text: string; kind: FileKind; stem: string }): { errors: DataError[]; source?: YamlSource; raw?: unknown } {
  const parsed = parseYaml({ file: args.path, text: args.text });
  if (!parsed.ok) return { errors: parsed.errors };
  const source = parsed.source;
  const idErrors = args.kind === 'site' ? [] : idCheck(source, args.stem);
  const v = validate(source, SCHEMAS[args.kind]);
  if (!v.ok) return { errors: [...v.errors, ...idErrors], source };
  return { errors: idErrors, source, raw: idErrors.length === 0 ? v.value : undefined };
}

/** The id must equal the file name, so references and file names never disagree. */
function idCheck(source: YamlSource, stem: string): DataError[] {
  const value = source.value as { id?: unknown } | null;
  const id = typeof value === 'object' && value !== null ? value.id : undefined;
  if (typeof id !== 'string' || id === stem) return [];
  // A file name that is no id (capitals, underscores, `__proto__`) can only be fixed by renaming the file.
  const fix = SLUG_PATTERN.test(stem) ? `change id to ${stem}, or rename the file to ${id}.yaml` : `rename the file to ${id}.yaml (file names are lower-case ids)`;
  return [at(source, ['id'], { expected: `must match the file name (${stem}.yaml)`, fix })];
}

interface Built {
  errors: DataError[];
  warnings: DataError[];
  site?: SiteConfig;
  engines: EngineFamily[];
  jets: JetUnit[];
  boats: Boat[];
  books: Book[];
}

/** Normalise in dependency order: engines and jets, then boats, then books. */
function buildProject(checked: readonly Checked[], logs: ReadonlyMap<string, SourceFile>): Built {
  const errors: DataError[] = [];
  const warnings: DataError[] = [];
  const of = (kind: FileKind) => checked.filter((c) => c.kind === kind);
  // Each kind's registry: every file's stem, null where the file did not load.
  const registry = <T>(kind: FileKind, run: (c: Checked & { source: YamlSource }) => Normalised<T>): Map<string, T | null> =>
    new Map(
      of(kind).map((c) => {
        if (c.raw === undefined || !c.source) return [c.stem, null];
        const r = run({ ...c, source: c.source });
        warnings.push(...r.warnings);
        if (!r.ok) errors.push(...r.errors);
        return [c.stem, r.ok ? r.value : null];
      }),
    );
  const engines = registry('engine', (c) => normaliseEngine(c.source, c.raw as never));
  const jets = registry('jet', (c) => normaliseJet(c.source, c.raw as never));
  const boats = registry('boat', (c) => normaliseBoat(c.source, c.raw as never, { engines, jets }, logs.get(trialLogPath(c.source.file.replace(/\\/g, '/')))));
  warnings.push(...strayLogs({ logs: [...logs.keys()], boatIds: of('boat').map((c) => c.stem) }));
  const siteFileChecked = of('site')[0];
  const site = siteFileChecked?.raw !== undefined ? normaliseSite(siteFileChecked.raw as never) : undefined;
  const books = registry('book', (c) => normaliseBook(c.source, c.raw as never, { engines, jets, boats, siteCautions: site?.extraCautions?.length ?? 0 }));
  // References in files that did not load, and into files that did not load: every problem in one run.
  const ids = (kind: FileKind, key: string) => new Map(of(kind).flatMap((c) => (c.source ? [[c.stem, memberIds(c.source.value, key)] as const] : [])));
  const variantIds = ids('engine', 'variants');
  const impellerIds = ids('jet', 'impellers');
  // A file that loaded had all its references resolved while normalising; only the others need the loose pass.
  const failed = (c: Checked, registry: ReadonlyMap<string, unknown>) => c.source !== undefined && registry.get(c.stem) == null;
  for (const c of of('boat')) if (failed(c, boats)) errors.push(...looseBoatReferences({ source: c.source!, engines, jets, variantIds, impellerIds }));
  for (const c of of('book')) if (failed(c, books)) errors.push(...looseBookReferences({ source: c.source!, engines, jets, boats }));
  const sorted = <T extends { id: string }>(m: Map<string, T | null>) => [...m.values()].filter((x): x is T => x !== null).sort((a, b) => compareText(a.id, b.id));
  return { errors, warnings, site, engines: sorted(engines), jets: sorted(jets), boats: sorted(boats), books: sorted(books) };
}
