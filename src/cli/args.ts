/**
 * Command-line parsing for `matchbook <command> [options]`. Small and strict: an unknown command or
 * option is a usage error (exit 2) that says what was found and what is accepted.
 */
import { isIP } from 'node:net';

export type CommandName = 'build' | 'check' | 'serve' | 'start';

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
}

export class UsageError extends Error {}

const COMMANDS: readonly CommandName[] = ['build', 'check', 'serve', 'start'];

/** Options each command accepts (value-taking options only; --help is always accepted). */
const OPTIONS: Readonly<Record<CommandName, readonly string[]>> = {
  build: ['--data', '--out'],
  check: ['--data'],
  serve: ['--data', '--out', '--port', '--host'],
  start: ['--data'],
};

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
  const defaults = { dataDir: 'data', outDir: 'out', port: 8080, portGiven: false, host: '127.0.0.1' };
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
      const example = name === '--port' ? '8080' : name === '--host' ? '127.0.0.1' : 'DIR';
      throw new UsageError(`${name} needs a value, for example ${name} ${example}`);
    }
    values.set(name, value);
  }
  return {
    command: first,
    dataDir: values.get('--data') ?? defaults.dataDir,
    outDir: values.get('--out') ?? defaults.outDir,
    port: values.has('--port') ? parsePort(values.get('--port') ?? '') : defaults.port,
    portGiven: values.has('--port'),
    host: values.has('--host') ? parseHost(values.get('--host') ?? '') : defaults.host,
  };
}
