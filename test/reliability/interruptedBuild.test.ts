/**
 * A build that fails or is stopped leaves nothing behind (issue #14, class 3), through the real command
 * line: a failure injected at each stage (MATCHBOOK_TEST_FAULT, test-only) and a build killed with
 * SIGINT, SIGTERM and SIGKILL while it writes its sheets. Each time the previous output stays
 * byte-identical and, by the end of the next build at the latest, no `.out-build-…` or `.out-old-…`
 * folder is left beside it. The tests wait for states (polling the folder); they never time anything.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { matchbook as matchbookSync, REPO } from '../cli/runCli.ts';
import { tree } from './outputTree.ts';
import { writeSmallData } from './smallData.ts';

const EPOCH = { SOURCE_DATE_EPOCH: '1767225600' };
let root: string;
let data: string;
let out: string;
let before: Map<string, Buffer>;

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'matchbook-interrupted-'));
  data = writeSmallData(join(root, 'data'));
  out = join(root, 'out');
  const r = matchbookSync(['build', '--data', data, '--out', out], EPOCH);
  if (r.status !== 0) throw new Error(r.stderr);
  before = tree(out);
}, 300_000);

/** What lies beside the output folder besides the data and the output. */
const leftovers = (): string[] => readdirSync(root).filter((n) => n !== 'data' && n !== 'out' && n !== 'data-other');

function expectOutputUnchanged(): void {
  const now = tree(out);
  expect([...now.keys()]).toEqual([...before.keys()]);
  for (const [path, bytes] of before) expect(now.get(path)?.equals(bytes), path).toBe(true);
}

describe('a failure at each stage of a build', () => {
  // scene: the third sheet's layout; render: the second sheet once drawn, others still in flight;
  // books: a book's PDF; files: the results; pages: the third page Eleventy writes; swap: just before it.
  const CASES = [
    { fault: 'scene:3', status: 1, says: 'nothing written' },
    { fault: 'render:2', status: 1, says: 'nothing written' },
    { fault: 'books', status: 3, says: 'failure injected by MATCHBOOK_TEST_FAULT at books cards' },
    { fault: 'files', status: 3, says: 'failure injected by MATCHBOOK_TEST_FAULT at files results' },
    { fault: 'pages:3', status: 3, says: 'failure injected by MATCHBOOK_TEST_FAULT at pages' },
    { fault: 'swap', status: 3, says: 'failure injected by MATCHBOOK_TEST_FAULT at swap' },
  ] as const;
  for (const c of CASES) {
    it(`${c.fault}: exit ${c.status}, the previous output byte-identical, no staging folder left`, () => {
      const r = matchbookSync(['build', '--data', data, '--out', out], { ...EPOCH, MATCHBOOK_TEST_FAULT: c.fault });
      expect(r.status, r.stderr).toBe(c.status);
      expect(r.stderr).toContain(c.says);
      expect(leftovers()).toEqual([]);
      expectOutputUnchanged();
    });
  }
});

/** Starts a build, waits until its staging folder holds a rendered sheet, then sends the signal. */
async function killMidBuild(signal: NodeJS.Signals): Promise<{ code: number | null; signal: NodeJS.Signals | null; stderr: string; sawStaging: string }> {
  const child = spawn(process.execPath, [`${REPO}bin/matchbook.js`, 'build', '--data', data, '--out', out], {
    cwd: REPO,
    env: { ...process.env, NO_COLOR: '1', ...EPOCH },
  });
  let stderr = '';
  child.stderr.on('data', (b: Buffer) => (stderr += b.toString()));
  const ended = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((done) => child.on('exit', (code, sig) => done({ code, signal: sig })));
  let sawStaging = '';
  for (let i = 0; i < 6000 && child.exitCode === null; i += 1) {
    const staging = leftovers().find((n) => n.startsWith('.out-build-'));
    if (staging && existsSync(join(root, staging, 'sheets')) && readdirSync(join(root, staging, 'sheets')).some((n) => n.endsWith('.png'))) {
      sawStaging = staging;
      child.kill(signal);
      break;
    }
    await new Promise((done) => setTimeout(done, 10));
  }
  return { ...(await ended), stderr, sawStaging };
}

describe('a build stopped mid-way', () => {
  for (const [signal, status] of [['SIGINT', 130], ['SIGTERM', 143]] as const) {
    it(`${signal}: exits ${status}, removes its staging folder itself, the previous output byte-identical`, async () => {
      const r = await killMidBuild(signal);
      expect(r.sawStaging).toMatch(/^\.out-build-\d+-[0-9a-f]{8}$/);
      expect(r.code, r.stderr).toBe(status);
      expect(r.stderr).toContain(`matchbook: stopped by ${signal}; nothing written`);
      expect(leftovers()).toEqual([]);
      expectOutputUnchanged();
    });
  }

  it('SIGKILL: the staging folder stays (nothing can run), the output is intact, and the next build removes it', async () => {
    const r = await killMidBuild('SIGKILL');
    expect(r.signal).toBe('SIGKILL');
    expect(leftovers()).toEqual([r.sawStaging]);
    expectOutputUnchanged();
    const next = matchbookSync(['build', '--data', data, '--out', out], EPOCH);
    expect(next.status, next.stderr).toBe(0);
    expect(leftovers()).toEqual([]);
    expect([...tree(out).keys()]).toEqual([...before.keys()]);
  });
});

/** The real command, without blocking, so several can run at once. */
function buildAsync(dataDir: string, outDir: string): Promise<{ code: number | null; stderr: string }> {
  return new Promise((done) => {
    const child = spawn(process.execPath, [`${REPO}bin/matchbook.js`, 'build', '--data', dataDir, '--out', outDir], { cwd: REPO, env: { ...process.env, NO_COLOR: '1', ...EPOCH } });
    let stderr = '';
    child.stderr.on('data', (b: Buffer) => (stderr += b.toString()));
    child.on('exit', (code) => done({ code, stderr }));
  });
}

describe('builds at the same time into one folder', () => {
  it('three builds of two data sets at once: all succeed, one whole build is in place, nothing is left beside it', async () => {
    // A second data set: the same shop with one boat less, so its tree is told apart from the first.
    const other = join(root, 'data-other');
    writeSmallData(other);
    rmSync(join(other, 'boats', 'heavy-boat.yaml'));
    const runs = await Promise.all([buildAsync(data, out), buildAsync(other, out), buildAsync(data, out)]);
    for (const r of runs) expect(r.code, r.stderr).toBe(0);
    expect(leftovers()).toEqual([]);
    const files = [...tree(out).keys()];
    const first = [...before.keys()];
    if (files.includes('boats/heavy-boat/index.html')) expect(files).toEqual(first);
    else expect(files).toEqual(first.filter((f) => !f.includes('heavy-boat')));
  });
});
