/**
 * Command-line parsing for `matchbook <command> [options]`. Small and strict: an unknown command or
 * option is a usage error (exit 2) that says what was found and what is accepted.
 */
import { isIP } from 'node:net';
import type { PrintOverride } from '../standards/paper.ts';

export type CommandName = 'build' | 'check' | 'serve' | 'start' | 'add-trial';

export interface ParsedArgs {
  readonly command: CommandName | 'help';
  /** The command whose help was asked for; undefined for the general help. */
  readonly helpFor?: CommandName;
  readonly dataDir: string;
  readonly outDir: string;
  /** The first port serve tries; 0 lets the system choose. */
  readonly port: number;
  /** True when --port was given (then exactly that port is used). */
  readonly portGiven: boolean;
  /** The address serve listens on: 127.0.0.1 (this machine only) unless --host says otherwise. */
  readonly host: string;
  /** --bleed and --crop-marks / --no-crop-marks of build and check: they override every sheet's paper. */
  readonly print: PrintOverride;
  /** add-trial's options as typed (--boat, --date, --rpm, …), checked by the command itself. */
  readonly trial: Readonly<Record<string, string>>;
}

/** add-trial's options, each filling a column of the trial log (--boat names the boat). */
export const TRIAL_OPTIONS: Readonly<Record<string, string>> = {
  '--boat': '',
  '--date': 'date',
  '--impeller': 'impeller',
  '--rpm': 'wot_rpm',
  '--speed-kn': 'speed_kn',
  '--load-kg': 'load_kg',
  '--air-temp-c': 'air_temp_c',
  '--humidity-pct': 'humidity_pct',
  '--pressure-hpa': 'pressure_hpa',
  '--altitude-m': 'altitude_m',
  '--water': 'water',
  '--by': 'recorded_by',
  '--notes': 'notes',
};

export class UsageError extends Error {}

const COMMANDS: readonly CommandName[] = ['build', 'check', 'serve', 'start', 'add-trial'];

/** Options each command accepts that take a value (--help is always accepted). */
const OPTIONS: Readonly<Record<CommandName, readonly string[]>> = {
  build: ['--data', '--out', '--bleed'],
  check: ['--data', '--bleed'],
  serve: ['--data', '--out', '--port', '--host'],
  start: ['--data'],
  'add-trial': ['--data', ...Object.keys(TRIAL_OPTIONS)],
};

/** Options each command accepts that take no value. */
const FLAGS: Readonly<Record<CommandName, readonly string[]>> = {
  build: ['--crop-marks', '--no-crop-marks'],
  check: ['--crop-marks', '--no-crop-marks'],
  serve: [],
  start: [],
  'add-trial': [],
};

const EXAMPLES: Readonly<Record<string, string>> = { '--port': '8080', '--host': '127.0.0.1', '--bleed': '3', '--boat': 'reedshank', '--date': '2026-09-14', '--impeller': 'gust', '--rpm': '4900', '--notes': '"Two aboard"', '--by': '"Shop"', '--water': 'salt' };

// Print shops commonly ask for 3 mm of bleed, some for 5 or 1/8 in (3.175 mm); 10 mm is far beyond any
// of them (common practice, no source), so a larger figure is taken for a typing slip.
const MAX_BLEED_MM = 10;

/** --bleed in millimetres: a number from 0 (no bleed) to 10, with at most two decimals. */
function parseBleed(text: string): number {
  const bleedMm = /^\d{1,2}(\.\d{1,2})?$/.test(text) ? Number(text) : NaN;
  if (!(bleedMm <= MAX_BLEED_MM)) {
    throw new UsageError(
      `--bleed must be the bleed in millimetres, a number from 0 (no bleed) to ${MAX_BLEED_MM}, for example --bleed 3 (the usual print-shop bleed), found "${text}"` +
        (/^\d+(\.\d+)?\s*mm$/i.test(text) ? '; leave out the unit, millimetres are understood' : ''),
    );
  }
  return bleedMm;
}

function isCommand(word: string | undefined): word is CommandName {
  return word !== undefined && (COMMANDS as readonly string[]).includes(word);
}

function parsePort(text: string): number {
  const port = /^\d{1,5}$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(port) || port > 65535) {
    throw new UsageError(`--port must be a whole number from 1 to 65535 (or 0 to let the system choose), found "${text}"`);
  }
  return port;
}

/** An IPv4 or IPv6 address or a host name (RFC 1123 labels); anything else is a usage error. */
function parseHost(text: string): string {
  const name = /^(?=.{1,253}$)[A-Za-z0-9](?:[A-Za-z0-9-]{0,61}[A-Za-z0-9])?(?:\.[A-Za-z0-9](?:[A-Za-z0-9-]{0,61}[A-Za-z0-9])?)*$/;
  if (isIP(text) === 0 && !name.test(text)) {
    throw new UsageError(`--host must be an IP address or a host name, for example --host 127.0.0.1 (this machine only) or --host 0.0.0.0 (every network interface), found "${text}"`);
  }
  return text;
}

/** Parses argv (without node and script) into a command and its options. */
export function parseArgs(argv: readonly string[]): ParsedArgs {
  const defaults = { dataDir: 'data', outDir: 'out', port: 8080, portGiven: false, host: '127.0.0.1', print: {}, trial: {} };
  const [first, ...rest] = argv;
  if (first === undefined || first === '--help' || first === '-h' || first === 'help') {
    const topic = first === 'help' ? rest[0] : undefined;
    if (topic !== undefined && !isCommand(topic)) throw new UsageError(`there is no command "${topic}" to explain`);
    return { command: 'help', helpFor: topic, ...defaults };
  }
  if (!isCommand(first)) {
    throw new UsageError(`unknown command "${first}"; expected one of ${COMMANDS.join(', ')}`);
  }
  const values = new Map<string, string>();
  const flags = new Set<string>();
  for (let i = 0; i < rest.length; i += 1) {
    const word = rest[i];
    if (word === '--help' || word === '-h') return { command: 'help', helpFor: first, ...defaults };
    if (FLAGS[first].includes(word)) {
      flags.add(word);
      continue;
    }
    const eq = word.indexOf('=');
    const name = eq > 0 ? word.slice(0, eq) : word;
    if (!OPTIONS[first].includes(name)) {
      const takesNoValue = FLAGS[first].includes(name) ? `; ${name} takes no value` : '';
      throw new UsageError(
        `"${first}" does not take "${word}"${takesNoValue}; it accepts ${[...OPTIONS[first], ...FLAGS[first], '--help'].join(', ')}`,
      );
    }
    const value = eq > 0 ? word.slice(eq + 1) : rest[(i += 1)];
    if (value === undefined || value === '' || (eq < 0 && value.startsWith('--'))) {
      throw new UsageError(`${name} needs a value, for example ${name} ${EXAMPLES[name] ?? 'DIR'}`);
    }
    values.set(name, value);
  }
  if (flags.has('--crop-marks') && flags.has('--no-crop-marks')) {
    throw new UsageError('--crop-marks and --no-crop-marks contradict each other; give one of them');
  }
  const bleed = values.get('--bleed');
  const print: PrintOverride = {
    ...(bleed !== undefined ? { bleedMm: parseBleed(bleed) } : {}),
    ...(flags.has('--crop-marks') ? { cropMarks: true } : flags.has('--no-crop-marks') ? { cropMarks: false } : {}),
  };
  return {
    command: first,
    dataDir: values.get('--data') ?? defaults.dataDir,
    outDir: values.get('--out') ?? defaults.outDir,
    port: values.has('--port') ? parsePort(values.get('--port') ?? '') : defaults.port,
    portGiven: values.has('--port'),
    host: values.has('--host') ? parseHost(values.get('--host') ?? '') : defaults.host,
    print,
    trial: Object.fromEntries([...values].filter(([k]) => Object.hasOwn(TRIAL_OPTIONS, k))),
  };
}
