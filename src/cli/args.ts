/**
 * Command-line parsing for `matchbook <command> [options]`. Small and strict: an unknown command or
 * option is a usage error (exit 2) that says what was found and what is accepted.
 */

export type CommandName = 'build' | 'check' | 'serve' | 'start';

export interface ParsedArgs {
  readonly command: CommandName | 'help';
  /** The command whose help was asked for; undefined for the general help. */
  readonly helpFor?: CommandName;
  readonly dataDir: string;
  readonly outDir: string;
  readonly port: number;
}

export class UsageError extends Error {}

const COMMANDS: readonly CommandName[] = ['build', 'check', 'serve', 'start'];

/** Options each command accepts (value-taking options only; --help is always accepted). */
const OPTIONS: Readonly<Record<CommandName, readonly string[]>> = {
  build: ['--data', '--out'],
  check: ['--data'],
  serve: ['--data', '--out', '--port'],
  start: ['--data'],
};

function isCommand(word: string | undefined): word is CommandName {
  return word !== undefined && (COMMANDS as readonly string[]).includes(word);
}

function parsePort(text: string): number {
  const port = Number(text);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new UsageError(`--port must be a whole number from 1 to 65535, found "${text}"`);
  }
  return port;
}

/** Parses argv (without node and script) into a command and its options. */
export function parseArgs(argv: readonly string[]): ParsedArgs {
  const defaults = { dataDir: 'data', outDir: 'out', port: 8080 };
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
  for (let i = 0; i < rest.length; i += 1) {
    const word = rest[i];
    if (word === '--help' || word === '-h') return { command: 'help', helpFor: first, ...defaults };
    const eq = word.indexOf('=');
    const name = eq > 0 ? word.slice(0, eq) : word;
    if (!OPTIONS[first].includes(name)) {
      throw new UsageError(
        `"${first}" does not take "${word}"; it accepts ${[...OPTIONS[first], '--help'].join(', ')}`,
      );
    }
    const value = eq > 0 ? word.slice(eq + 1) : rest[(i += 1)];
    if (value === undefined || value === '' || (eq < 0 && value.startsWith('--'))) {
      throw new UsageError(`${name} needs a value, for example ${name} ${name === '--port' ? '8080' : 'DIR'}`);
    }
    values.set(name, value);
  }
  return {
    command: first,
    dataDir: values.get('--data') ?? defaults.dataDir,
    outDir: values.get('--out') ?? defaults.outDir,
    port: values.has('--port') ? parsePort(values.get('--port') ?? '') : defaults.port,
  };
}
