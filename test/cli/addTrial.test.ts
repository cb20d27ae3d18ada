import { cpSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { NODE_FS, type AtomicFs } from '../../src/data/atomicFile.ts';
import { parseArgs } from '../../src/cli/args.ts';
import { runAddTrial } from '../../src/cli/addTrial.ts';
import type { CliIo } from '../../src/cli/io.ts';
import { matchbook } from './runCli.ts';

const folders: string[] = [];
afterEach(() => {
  for (const f of folders.splice(0)) rmSync(f, { recursive: true, force: true });
});

/** A copy of the demo data folder, with the reedshank log given as bytes when log is given. */
function demoCopy(log?: string): { dir: string; logPath: string } {
  const dir = mkdtempSync(join(tmpdir(), 'matchbook-addtrial-'));
  folders.push(dir);
  cpSync('data', dir, { recursive: true });
  const logPath = join(dir, 'boats', 'reedshank.trials.csv');
  if (log !== undefined) writeFileSync(logPath, log);
  return { dir, logPath };
}

function captured(): CliIo & { text: () => string } {
  let text = '';
  return { out: (t) => void (text += t), err: (t) => void (text += t), env: {}, isTty: false, text: () => text };
}

const GOOD = ['--boat', 'reedshank', '--date', '2026-09-14', '--impeller', 'gust', '--rpm', '4930'];
// A log as a spreadsheet saves it: a byte-order mark, CRLF line ends, a quoted note, no line end after the last row.
const EXISTING = '\ufeff# DEMO DATA\r\ndate,impeller,wot_rpm,notes\r\n2026-05-02,gust,4870,"Two aboard, calm"';

describe('matchbook add-trial adds one sea trial to a boat’s log', () => {
  it('keeps every earlier byte as a prefix and writes the row in the log’s own line ends', async () => {
    const { dir, logPath } = demoCopy(EXISTING);
    const before = readFileSync(logPath);
    const io = captured();
    const status = await runAddTrial(parseArgs(['add-trial', '--data', dir, ...GOOD, '--notes', 'Calm, "flat" water']), io);
    expect(status, io.text()).toBe(0);
    const after = readFileSync(logPath);
    expect(after.subarray(0, before.length).equals(before)).toBe(true);
    // The missing line end is added in the file's style, then the row, quoted as RFC 4180 says.
    expect(after.subarray(before.length).toString('utf8')).toBe('\r\n2026-09-14,gust,4930,"Calm, ""flat"" water"\r\n');
    expect(io.text()).toContain('row 4; Reedshank (river runner) now has 4 sea trials');
    expect(readdirSync(join(dir, 'boats')).filter((n) => n.includes('.tmp'))).toEqual([]);
  });

  it('makes a new log with its header row when the boat has none', async () => {
    const { dir, logPath } = demoCopy();
    expect(existsSync(logPath)).toBe(false);
    const r = matchbook(['add-trial', '--data', dir, ...GOOD, '--speed-kn', '41.2', '--by', 'Shop']);
    expect(r.status, r.stderr).toBe(0);
    expect(readFileSync(logPath, 'utf8')).toBe('date,impeller,wot_rpm,speed_kn,load_kg,air_temp_c,humidity_pct,pressure_hpa,altitude_m,water,recorded_by,notes\n2026-09-14,gust,4930,41.2,,,,,,,Shop,\n');
    // The build reads it back: check counts the trial with the boat file's two.
    const check = matchbook(['check', '--data', dir]);
    expect(check.status, check.stderr).toBe(0);
    expect(check.stdout).toMatch(/\(\d+ sea trials\)/);
  });

  it('a failed write leaves the log byte for byte as it was, and no temporary file', async () => {
    for (const failAt of ['write', 'fsync', 'rename'] as const) {
      const { dir, logPath } = demoCopy(EXISTING);
      const before = readFileSync(logPath);
      const failing: AtomicFs = {
        ...NODE_FS,
        // The write fails after half the bytes reached the temporary file: a full disk.
        write: failAt === 'write' ? async (fd, data) => (await NODE_FS.write(fd, data.subarray(0, data.length >> 1)), Promise.reject(Object.assign(new Error('no space'), { code: 'ENOSPC' }))) : NODE_FS.write,
        fsync: failAt === 'fsync' ? () => Promise.reject(Object.assign(new Error('i/o'), { code: 'EIO' })) : NODE_FS.fsync,
        rename: failAt === 'rename' ? () => Promise.reject(Object.assign(new Error('denied'), { code: 'EACCES' })) : NODE_FS.rename,
      };
      const io = captured();
      const status = await runAddTrial(parseArgs(['add-trial', '--data', dir, ...GOOD]), io, { fs: failing });
      expect(status, failAt).toBe(1);
      expect(io.text()).toContain(`could not write ${dir}/boats/reedshank.trials.csv`);
      expect(io.text()).toContain('The log is unchanged.');
      expect(readFileSync(logPath).equals(before), failAt).toBe(true);
      expect(readdirSync(join(dir, 'boats')).filter((n) => n.includes('.tmp')), failAt).toEqual([]);
    }
  });

  it('checks the new row by the loader’s rules and writes nothing when it is wrong', async () => {
    const { dir, logPath } = demoCopy(EXISTING);
    const before = readFileSync(logPath);
    const bad = await (async () => {
      const io = captured();
      const status = await runAddTrial(parseArgs(['add-trial', '--data', dir, '--boat', 'reedshank', '--date', '2026-02-30', '--impeller', 'gust', '--rpm', '49x0']), io);
      return { status, text: io.text() };
    })();
    expect(bad.status).toBe(1);
    expect(bad.text).toContain('--date (column date) must be a real calendar date (YYYY-MM-DD), found "2026-02-30"');
    expect(bad.text).toContain('--rpm (column wot_rpm) must be a number, found "49x0"');
    const unknown = captured();
    expect(await runAddTrial(parseArgs(['add-trial', '--data', dir, ...GOOD.slice(0, 4), '--impeller', 'gusty', '--rpm', '4930']), unknown)).toBe(1);
    expect(unknown.text()).toContain('--impeller (column impeller) must name one of the impellers of kelpspindle-riffle, found "gusty" — did you mean gust?');
    // The log's header has no speed_kn column: the value has nowhere to go.
    const noColumn = captured();
    expect(await runAddTrial(parseArgs(['add-trial', '--data', dir, ...GOOD, '--speed-kn', '41']), noColumn)).toBe(1);
    expect(noColumn.text()).toContain('the header row has no column speed_kn for --speed-kn');
    expect(readFileSync(logPath).equals(before)).toBe(true);
  });

  it('names an unknown boat and a missing option as misuse (exit 2)', () => {
    const { dir } = demoCopy();
    const boat = matchbook(['add-trial', '--data', dir, '--boat', 'reedshnk', '--date', '2026-09-14', '--impeller', 'gust', '--rpm', '4930']);
    expect(boat.status).toBe(2);
    expect(boat.stderr).toContain('--boat must name a boat of');
    expect(boat.stderr).toContain('did you mean reedshank?');
    const missing = matchbook(['add-trial', '--data', dir, '--boat', 'reedshank']);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain('add-trial needs --date, --impeller, --rpm');
  });
});
