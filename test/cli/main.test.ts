import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { matchbook, REPO } from './runCli.ts';

/** A stack trace line as Node prints it. */
const STACK = /^\s+at .+\(?.+:\d+:\d+\)?$/m;

function brokenData(): string {
  const dir = join(mkdtempSync(join(tmpdir(), 'matchbook-cli-')), 'data');
  cpSync(join(REPO, 'data'), dir, { recursive: true });
  const file = join(dir, 'jets', 'kelpspindle-riffle.yaml');
  // A negative impeller rating: the first rating in the file becomes -3.4.
  writeFileSync(file, readFileSync(file, 'utf8').replace(/(rating_kw:\s*)[\d.]+/, '$1-3.4'));
  return dir;
}

describe('the matchbook command', () => {
  it('prints help and exits 0 for --help and for each command\'s --help', () => {
    const general = matchbook(['--help']);
    expect(general.status).toBe(0);
    expect(general.stdout).toContain('Usage: matchbook <command>');
    const build = matchbook(['build', '--help']);
    expect(build.status).toBe(0);
    expect(build.stdout).toContain('Usage: matchbook build [--data DIR] [--out DIR]');
  });

  it('exits 2 with a one-line reason for misuse, and no stack trace', () => {
    const r = matchbook(['bild']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('unknown command "bild"');
    expect(r.stderr).not.toMatch(STACK);
    const out = matchbook(['build', '--out', REPO]);
    expect(out.status).toBe(2);
    expect(out.stderr).toMatch(/would replace the project, home or data folder/);
    const bleed = matchbook(['build', '--bleed', '12', '--out', join(tmpdir(), 'matchbook-never-written')]);
    expect(bleed.status).toBe(2);
    expect(bleed.stderr).toBe('matchbook: --bleed must be the bleed in millimetres, a number from 0 (no bleed) to 10, for example --bleed 3 (the usual print-shop bleed), found "12"\nRun "matchbook --help" for usage.\n');
  });

  it('check lays every sheet out with the bleed and crop marks the command line asks for', () => {
    const r = matchbook(['check', '--bleed', '5', '--crop-marks']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
  });

  it('check exits 0 on the demo data and 1 on broken data, naming the file and field', () => {
    expect(matchbook(['check']).status).toBe(0);
    const r = matchbook(['check', '--data', brokenData()]);
    expect(r.status).toBe(1);
    expect(`${r.stdout}${r.stderr}`).toMatch(/kelpspindle-riffle\.yaml:\d+:\d+/);
    expect(`${r.stdout}${r.stderr}`).toContain('-3.4');
    expect(r.stderr).not.toMatch(STACK);
  });

  it('build exits 1 on broken data, writes nothing and shows no stack trace', () => {
    const out = join(mkdtempSync(join(tmpdir(), 'matchbook-cli-out-')), 'out');
    const r = matchbook(['build', '--data', brokenData(), '--out', out]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('-3.4');
    expect(r.stderr).toContain('nothing written');
    expect(r.stderr).not.toMatch(STACK);
  });
});
