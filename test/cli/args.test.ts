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
    expect(() => parseArgs(['serve', '--port', '80.5'])).toThrow(/--port must be a whole number/);
    expect(() => parseArgs(['serve', '--port', '-1'])).toThrow(/--port needs a value|--port must be/);
  });

  it('serve listens on 127.0.0.1 unless --host says otherwise; --port 0 lets the system choose', () => {
    expect(parseArgs(['serve'])).toMatchObject({ host: '127.0.0.1', port: 8080, portGiven: false });
    expect(parseArgs(['serve', '--port', '0'])).toMatchObject({ port: 0, portGiven: true });
    expect(parseArgs(['serve', '--host', '0.0.0.0'])).toMatchObject({ host: '0.0.0.0' });
    expect(parseArgs(['serve', '--host=::1'])).toMatchObject({ host: '::1' });
    expect(parseArgs(['serve', '--host', 'preview.example'])).toMatchObject({ host: 'preview.example' });
    for (const bad of ['a b', 'http://x', '-x.example', 'x..example', `${'a'.repeat(64)}.example`]) {
      expect(() => parseArgs(['serve', `--host=${bad}`]), bad).toThrow(/--host must be an IP address or a host name/);
    }
    expect(() => parseArgs(['build', '--host', '0.0.0.0'])).toThrow(/"build" does not take "--host"/);
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
    expect(helpText('serve')).toMatch(/^Usage: matchbook serve \[--data DIR\] \[--out DIR\] \[--port N\] \[--host ADDRESS\]\n/);
    expect(helpText('serve')).toContain('http://127.0.0.1:N/');
    expect(helpText('start')).toMatch(/^Usage: matchbook start \[--data DIR\]\n/);
  });
});
