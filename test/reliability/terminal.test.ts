/**
 * Control characters never reach the terminal (issue class: a key holding ESC sequences was printed raw
 * by `check`, so a crafted file could clear the screen or fake an "OK"). Through the real command line:
 * keys, values, folder names and options holding ESC, BEL and CSI sequences come out as \u001b-style
 * escapes, on stdout and stderr, whatever the command and exit status.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { matchbook, REPO_DIR } from './cli.ts';

/** A raw control character of any kind (C0 other than line feed, DEL, C1) or a bidi override. */
const RAW_CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

const root = mkdtempSync(join(tmpdir(), 'matchbook-terminal-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

describe('user text in every message of the command line is escaped', () => {
  it('check: a key and a value holding ESC sequences, in a data folder whose name holds one', { timeout: 60_000 }, async () => {
    const data = join(root, 'data\u001b[2J');
    cpSync(join(REPO_DIR, 'data'), data, { recursive: true });
    const jet = join(data, 'jets/kelpspindle-riffle.yaml');
    writeFileSync(jet, readFileSync(jet, 'utf8').replace(/^notes: .*$/m, 'notes: "pump \\e]0;owned\\a ok"\n"\\e[2J\\e[1;1HOK": 1'));
    const run = await matchbook(['check', '--data', data]);
    expect(run.status).toBe(1);
    const all = run.stdout + run.stderr;
    expect(all).not.toMatch(RAW_CONTROL);
    // The key (an unknown field), the value (refused by the text rule) and the folder, each escaped where it stands.
    expect(run.stderr).toContain('a field named "\\u001b[2J\\u001b[1;1HOK"');
    expect(run.stderr).toContain('notes must hold only printable characters');
    expect(run.stderr).toContain('data\\u001b[2J/jets/kelpspindle-riffle.yaml:');
    expect(run.stderr).toContain('nothing was built from ');
  });

  it('check OK names the folder escaped; a usage error escapes the option it quotes', { timeout: 60_000 }, async () => {
    const data = join(root, 'ok\u001b[31m\u0007');
    cpSync(join(REPO_DIR, 'data'), data, { recursive: true });
    const ok = await matchbook(['check', '--data', data]);
    expect(ok.status).toBe(0);
    expect(ok.stdout).toContain('ok\\u001b[31m\\u0007: ');
    expect(ok.stdout + ok.stderr).not.toMatch(RAW_CONTROL);
    const usage = await matchbook(['check', '--colour\u001b[2J']);
    expect(usage.status).toBe(2);
    expect(usage.stderr).toContain('\\u001b[2J');
    expect(usage.stdout + usage.stderr).not.toMatch(RAW_CONTROL);
  });

  it('build: a refused build names an output folder holding ESC escaped', { timeout: 60_000 }, async () => {
    const data = join(root, 'bad-data');
    cpSync(join(REPO_DIR, 'data'), data, { recursive: true });
    const boat = join(data, 'boats/greyling.yaml');
    writeFileSync(boat, readFileSync(boat, 'utf8').replace(/^name: .*$/m, 'name: "Grey\\e[8m"'));
    const run = await matchbook(['build', '--data', data, '--out', join(root, 'out\u001b[2J')]);
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('out\\u001b[2J');
    expect(run.stdout + run.stderr).not.toMatch(RAW_CONTROL);
  });
});
