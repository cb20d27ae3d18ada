/**
 * Run a zod schema over a parsed YAML file and turn every issue into a located DataError,
 * worded for a technician (our own messages; zod's defaults never reach the user).
 */
import type * as z from 'zod';
import { didYouMean } from './closest.ts';
import { dataError, fieldName, type Problem } from './errors.ts';
import type { DataError } from './types.ts';
import type { PathSegment, YamlSource } from './yamlSource.ts';

export type Validated<T> = { ok: true; value: T } | { ok: false; errors: DataError[] };

/** Marks the message of an unknown-key issue as the list of allowed keys (see wording()). */
const ALLOWED = 'allowed:';

/** Validate source.value against schema; every issue located at its file:line:column. */
export function validate<S extends z.ZodType>(source: YamlSource, schema: S): Validated<z.output<S>> {
  const result = schema.safeParse(source.value, { reportInput: true, error: wording });
  if (result.success) return { ok: true, value: result.data };
  const errors = result.error.issues.flatMap((issue) => locateIssue(source, issue as unknown as Issue));
  return { ok: false, errors };
}


/** Report a problem at a path of a file (used by the checks after the schema). */
export function at(source: YamlSource, path: readonly PathSegment[], problem: Omit<Problem, 'field' | 'found'> & { found?: string }): DataError {
  const where = source.locate(path);
  return dataError({ file: source.file, line: where.line, column: where.column }, { ...problem, field: fieldName(path), found: problem.found ?? where.found });
}

interface Issue {
  code: string;
  path: PathSegment[];
  message: string;
  input?: unknown;
  keys?: string[];
  values?: unknown[];
  expected?: string;
  params?: { found?: string; char?: string; fix?: string };
}

function locateIssue(source: YamlSource, issue: Issue): DataError[] {
  if (issue.code === 'unrecognized_keys' && issue.keys) {
    const allowed = issue.message.startsWith(ALLOWED) ? issue.message.slice(ALLOWED.length).split(',').filter(Boolean) : [];
    return issue.keys.map((key) => {
      const path = [...issue.path, key];
      const where = source.locate(path, { at: 'key' });
      return dataError(
        { file: source.file, line: where.line, column: where.column },
        { field: fieldName(path), expected: 'is not a field here', found: `a field named "${key}"`, fix: `${didYouMean(key, allowed)}fields allowed here: ${allowed.join(', ')}` },
      );
    });
  }
  const valueAt = source.locate(issue.path);
  // A list with too many entries is named at its key (impellers:), not at its first entry.
  const where = issue.code === 'too_big' && Array.isArray(issue.input) ? { ...source.locate(issue.path, { at: 'key' }), found: valueAt.found, exists: valueAt.exists } : valueAt;
  const place = { file: source.file, line: where.line, column: where.column };
  const field = fieldName(issue.path);
  if (!where.exists) {
    // A missing field: point at the mapping that should hold it and say what it takes.
    const what = issue.message === 'is required' ? 'its value' : `a value that ${issue.message}`;
    return [dataError(place, { field, expected: 'is required', found: 'nothing', fix: `add ${String(issue.path[issue.path.length - 1])}: with ${what}` })];
  }
  const length = issue.code === 'too_big' && typeof issue.input === 'string' ? ` (${[...issue.input].length} characters)` : '';
  // A character refused inside a text is named where it is typed (or where its escape starts), not at the text's start.
  const at = issue.params?.char ? { file: source.file, ...source.locateChar(issue.path, issue.params.char) } : place;
  return [dataError(at, { field, expected: issue.message, found: issue.params?.found ?? `${where.found}${length}`, fix: issue.params?.fix ?? hint(issue) })];
}

/** A fix worth saying for common slips: quoted numbers, units typed after numbers, near-miss words. */
function hint(issue: Issue): string | undefined {
  const input = issue.input;
  if (issue.code === 'invalid_type' && issue.expected === 'number' && typeof input === 'string') {
    if (/^\s*-?\d+(\.\d+)?\s*$/.test(input)) return 'remove the quotes so it reads as a number';
    if (/^\s*-?\d+,\d+\s*$/.test(input)) return 'write the decimal with a point, e.g. 2.3';
    if (/^\s*-?\d+(\.\d+)?\s*[^\d\s.]/.test(input)) return 'write the number alone; the unit is in the field name';
  }
  if (issue.code === 'invalid_value' && typeof input === 'string' && issue.values) {
    const dym = didYouMean(input, issue.values.map(String));
    return dym ? dym.trim() : undefined;
  }
  return undefined;
}

interface RawIssue {
  code: string;
  input?: unknown;
  expected?: string;
  values?: unknown[];
  origin?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inst?: { _zod?: { def?: { shape?: Record<string, unknown> } } };
}

/** Our wording for issues whose schema gave no message of its own. */
function wording(raw: unknown): string {
  const iss = raw as RawIssue;
  switch (iss.code) {
    case 'invalid_type':
      if (iss.input === undefined) return 'is required';
      if (iss.expected === 'number' && typeof iss.input === 'number') return 'must be a finite number';
      return `must be ${TYPE_WORDS[iss.expected ?? ''] ?? iss.expected}`;
    case 'unrecognized_keys':
      return ALLOWED + Object.keys(iss.inst?._zod?.def?.shape ?? {}).join(',');
    case 'invalid_value':
      return `must be one of ${(iss.values ?? []).map(String).join(', ')}`;
    case 'too_small':
      if (iss.origin === 'array') return `must have at least ${iss.minimum} entries`;
      if (iss.origin === 'string') return 'must not be empty';
      return `must be at least ${iss.minimum}`;
    case 'too_big':
      if (iss.origin === 'array') return `must have at most ${iss.maximum} entries`;
      return `must be at most ${iss.maximum}`;
    case 'invalid_union':
      return 'must be one of the allowed forms (see the data-format guide, guides/data-format/ in the built site)';
    default:
      return 'is not valid here (see the data-format guide, guides/data-format/ in the built site)';
  }
}

const TYPE_WORDS: Record<string, string> = {
  number: 'a number',
  string: 'text',
  object: 'a mapping (key: value lines)',
  array: 'a list',
  boolean: 'true or false',
  tuple: 'a list',
};
