// Messages name files as the user typed the data folder: `--data shop` gives `shop/boats/…`,
// `--data ../shop` from a sub-folder gives `../shop/boats/…`, never the demo's `data/…`.
import { cpSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { REPO } from './runCli.ts';

function check(cwd: string, data: string): { status: number | null; stderr: string } {
  const r = spawnSync(process.execPath, [`${REPO}bin/matchbook.js`, 'check', '--data', data], {
    cwd,
    env: { ...process.env, NO_COLOR: '1' },
    encoding: 'utf8',
  });
  return { status: r.status, stderr: r.stderr };
}

describe('message paths with --data elsewhere', () => {
  const work = mkdtempSync(join(tmpdir(), 'matchbook-paths-'));
  const shop = join(work, 'shop');
  cpSync(join(REPO, 'data'), shop, { recursive: true });
  // reedshank.yaml line 11 is `engine: copperwhistle-strider`; name an engine that does not exist.
  const boat = join(shop, 'boats', 'reedshank.yaml');
  const text = readFileSync(boat, 'utf8');
  expect(text.split('\n')[10]).toBe('engine: copperwhistle-strider');
  writeFileSync(boat, text.replace('engine: copperwhistle-strider', 'engine: copperwhistle-stridr'));
  mkdirSync(join(work, 'sub'));

  it('--data shop names shop/boats/… and the folder shop/engines/', () => {
    const r = check(work, 'shop');
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('shop/boats/reedshank.yaml:11:9 engine must name one of the engine families in shop/engines/, found "copperwhistle-stridr"');
    expect(r.stderr).not.toMatch(/(^|[\s(])data\//m);
  });

  it('--data ../shop from a sub-folder names ../shop/boats/… and ../shop/engines/', () => {
    const r = check(join(work, 'sub'), '../shop');
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('../shop/boats/reedshank.yaml:11:9 engine must name one of the engine families in ../shop/engines/, found "copperwhistle-stridr"');
    expect(r.stderr).not.toMatch(/(^|[\s(])data\//m);
  });

  it('a YAML syntax error is named at ../shop/… too', () => {
    writeFileSync(join(shop, 'jets', 'broken.yaml'), 'id: broken\nimpellers: [a, b\n');
    const r = check(join(work, 'sub'), '../shop');
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/^\.\.\/shop\/jets\/broken\.yaml:\d+:\d+ /m);
  });
});
