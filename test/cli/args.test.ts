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

describe('parseArgs() print options', () => {
  it('reads --bleed in millimetres and --crop-marks / --no-crop-marks for build and check, none by default', () => {
    expect(parseArgs(['build']).print).toEqual({});
    expect(parseArgs(['build', '--bleed', '3']).print).toEqual({ bleedMm: 3 });
    expect(parseArgs(['check', '--bleed=3.18', '--crop-marks']).print).toEqual({ bleedMm: 3.18, cropMarks: true });
    expect(parseArgs(['build', '--no-crop-marks', '--data', 'd']).print).toEqual({ cropMarks: false });
    expect(parseArgs(['build', '--bleed', '0']).print).toEqual({ bleedMm: 0 });
    expect(parseArgs(['check', '--bleed', '10']).print).toEqual({ bleedMm: 10 });
  });

  it('refuses a bleed that is not a number of millimetres from 0 to 10, saying what it found and what to write', () => {
    for (const bad of ['-1', 'three', '3,5', '10.5', '11', '1e1', '3.125', '.5', 'NaN', ' 3']) {
      expect(() => parseArgs(['build', `--bleed=${bad}`]), bad).toThrow(UsageError);
      expect(() => parseArgs(['build', `--bleed=${bad}`]), bad).toThrow(`--bleed must be the bleed in millimetres, a number from 0 (no bleed) to 10, for example --bleed 3 (the usual print-shop bleed), found "${bad}"`);
    }
    expect(() => parseArgs(['build', '--bleed', '3mm'])).toThrow(/found "3mm"; leave out the unit, millimetres are understood/);
    expect(() => parseArgs(['build', '--bleed'])).toThrow('--bleed needs a value, for example --bleed 3');
    expect(() => parseArgs(['build', '--bleed', '--out', 'x'])).toThrow('--bleed needs a value, for example --bleed 3');
  });

  it('refuses print options where they do nothing, a value on a flag, and both flags at once', () => {
    expect(() => parseArgs(['serve', '--bleed', '3'])).toThrow(/"serve" does not take "--bleed"/);
    expect(() => parseArgs(['start', '--crop-marks'])).toThrow(/"start" does not take "--crop-marks"; it accepts --data, --help/);
    expect(() => parseArgs(['build', '--crop-marks=yes'])).toThrow(/"build" does not take "--crop-marks=yes"; --crop-marks takes no value/);
    expect(() => parseArgs(['check', '--crop-marks', '--no-crop-marks'])).toThrow('--crop-marks and --no-crop-marks contradict each other; give one of them');
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
    expect(helpText('build')).toMatch(/^Usage: matchbook build \[--data DIR\] \[--out DIR\] \[--bleed MM\] \[--crop-marks \| --no-crop-marks\]\n/);
    expect(helpText('check')).toMatch(/^Usage: matchbook check \[--data DIR\] \[--bleed MM\] \[--crop-marks \| --no-crop-marks\]\n/);
    for (const command of ['build', 'check'] as const) {
      expect(helpText(command)).toContain('--bleed MM         bleed in millimetres beyond the trim, 0 to 10');
      expect(helpText(command)).toContain('--no-crop-marks    no crop marks');
    }
    expect(helpText('serve')).toMatch(/^Usage: matchbook serve \[--data DIR\] \[--out DIR\] \[--port N\] \[--host ADDRESS\]\n/);
    expect(helpText('serve')).toContain('http://127.0.0.1:N/');
    expect(helpText('start')).toMatch(/^Usage: matchbook start \[--data DIR\]\n/);
  });
});
