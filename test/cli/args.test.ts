import { describe, expect, it } from 'vitest';
import { UsageError, parseArgs } from '../../src/cli/args.ts';
import { helpText } from '../../src/cli/help.ts';

describe('parseArgs()', () => {
  it('reads build with --data and --out in both spellings, defaulting to data and out', () => {
    expect(parseArgs(['build'])).toMatchObject({ command: 'build', dataDir: 'data', outDir: 'out' });
    expect(parseArgs(['build', '--data', 'd', '--out=o'])).toMatchObject({ command: 'build', dataDir: 'd', outDir: 'o' });
    expect(parseArgs(['serve', '--port', '9000'])).toMatchObject({ command: 'serve', port: 9000 });
    expect(parseArgs(['start'])).toMatchObject({ command: 'start', dataDir: 'data' });
    expect(parseArgs(['start', '--data=shop'])).toMatchObject({ command: 'start', dataDir: 'shop' });
  });

  it('turns --help anywhere into help for that command', () => {
    expect(parseArgs(['check', '--help'])).toMatchObject({ command: 'help', helpFor: 'check' });
    expect(parseArgs(['--help'])).toMatchObject({ command: 'help', helpFor: undefined });
    expect(parseArgs([])).toMatchObject({ command: 'help' });
    expect(parseArgs(['help', 'build'])).toMatchObject({ command: 'help', helpFor: 'build' });
  });

  it('rejects unknown commands and options, options a command does not take, and missing values', () => {
    expect(() => parseArgs(['bulid'])).toThrow(/unknown command "bulid"; expected one of build, check, serve/);
    expect(() => parseArgs(['check', '--out', 'x'])).toThrow(/"check" does not take "--out"/);
    expect(() => parseArgs(['start', '--out', 'x'])).toThrow(/"start" does not take "--out"; it accepts --data, --help/);
    expect(() => parseArgs(['build', '--data'])).toThrow(/--data needs a value/);
    expect(() => parseArgs(['build', '--data', '--out', 'x'])).toThrow(/--data needs a value/);
    expect(() => parseArgs(['serve', '--port', '70000'])).toThrow(UsageError);
  });
});

describe('helpText()', () => {
  it('names every command and the exit statuses in the general help', () => {
    const text = helpText();
    for (const word of ['build', 'check', 'serve', 'start', 'Exit status: 0 done, 1 the data has problems, 2 the command was misused']) {
      expect(text).toContain(word);
    }
  });

  it('gives each command the options it accepts', () => {
    expect(helpText('build')).toMatch(/^Usage: matchbook build \[--data DIR\] \[--out DIR\]/);
    expect(helpText('check')).toMatch(/^Usage: matchbook check \[--data DIR\]\n/);
    expect(helpText('serve')).toContain('--port N');
    expect(helpText('start')).toMatch(/^Usage: matchbook start \[--data DIR\]\n/);
  });
});
