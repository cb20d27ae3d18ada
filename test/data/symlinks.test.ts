/**
 * Files outside the data folder (issue #14, class 6): a symbolic link in the data folder that leads
 * outside it (a file link, a folder link, a chain of links) is refused unread, as a located error
 * naming the link's own path and telling to copy the file in; neither the target's path nor a byte of
 * its contents reaches any message, from the loader or from `matchbook check`. Links that stay inside
 * the folder are read; a link to nothing is a located error, not silently skipped.
 */
import { cpSync, mkdirSync, mkdtempSync, readFileSync, renameSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { matchbook } from '../cli/runCli.ts';

/** A secret outside the data folder, shaped like an environment file and like a definition. */
const SECRET = 'SECRET_TOKEN=do-not-print-me';

function setup(): { base: string; data: string; outside: string } {
  const base = mkdtempSync(join(tmpdir(), 'matchbook-links-'));
  const data = join(base, 'data');
  cpSync('data', data, { recursive: true });
  const outside = join(base, 'private');
  mkdirSync(outside);
  writeFileSync(join(outside, '.env'), `${SECRET}\nid: greyling\n`);
  writeFileSync(join(outside, 'boat.yaml'), readFileSync('data/boats/greyling.yaml', 'utf8').replace('id: greyling', 'id: outside-boat').replace(/^name: .*$/m, `name: ${SECRET}`));
  return { base, data, outside };
}

const everything = (r: Awaited<ReturnType<typeof loadProject>>) =>
  JSON.stringify(r.ok ? r.warnings : [...r.errors, ...r.warnings]);

describe('links in the data folder', () => {
  it('a file link leading outside (to an environment file, to a definition) is refused unread, at the link', async () => {
    const { data, outside } = setup();
    symlinkSync(join(outside, '.env'), join(data, 'boats', 'env-link.yaml'));
    symlinkSync(join(outside, 'boat.yaml'), join(data, 'boats', 'outside-boat.yaml'));
    const r = await loadProject(data);
    expect(r.ok).toBe(false);
    const messages = r.ok ? [] : r.errors.map((e) => e.message);
    expect(messages).toEqual([
      `${data}/boats/env-link.yaml:1:1 the file must be a file inside the data folder, found a symbolic link that leads outside the data folder — copy the file into the data folder instead of linking to it`,
      `${data}/boats/outside-boat.yaml:1:1 the file must be a file inside the data folder, found a symbolic link that leads outside the data folder — copy the file into the data folder instead of linking to it`,
    ]);
    expect(everything(r)).not.toContain('SECRET');
    expect(everything(r)).not.toContain(outside);
  });

  it('a folder link and a chain of links leading outside are refused the same way', async () => {
    const { data, outside } = setup();
    renameSync(join(data, 'books'), join(outside, 'books'));
    symlinkSync(join(outside, 'books'), join(data, 'books'));
    symlinkSync(join(outside, '.env'), join(data, 'hop'));
    symlinkSync(join(data, 'hop'), join(data, 'engines', 'chained.yaml'));
    const r = await loadProject(data);
    const messages = r.ok ? [] : r.errors.map((e) => e.message);
    expect(messages.filter((m) => m.includes('/books/'))).toHaveLength(3);
    expect(messages.find((m) => m.includes('/books/dealer-spec-sheets.yaml'))).toBe(
      `${data}/books/dealer-spec-sheets.yaml:1:1 the file must be a file inside the data folder, found a file in a folder that is a link leading outside the data folder — copy the file into the data folder instead of linking to it`,
    );
    expect(messages.find((m) => m.includes('chained.yaml'))).toContain('engines/chained.yaml:1:1 the file must be a file inside the data folder, found a symbolic link that leads outside');
    expect(everything(r)).not.toContain('SECRET');
    expect(everything(r)).not.toContain(outside);
  });

  it('a link that stays inside the folder is read; a link to nothing is a located error', async () => {
    const { data } = setup();
    mkdirSync(join(data, 'shared'));
    renameSync(join(data, 'boats', 'greyling.yaml'), join(data, 'shared', 'greyling.yaml'));
    symlinkSync('../shared/greyling.yaml', join(data, 'boats', 'greyling.yaml'));
    const inside = await loadProject(data);
    expect(inside.ok).toBe(true);
    if (inside.ok) expect(inside.project.boats.map((b) => b.id)).toContain('greyling');
    symlinkSync(join(data, 'nowhere.yaml'), join(data, 'boats', 'dangling.yaml'));
    const dangling = await loadProject(data);
    expect(dangling.ok ? [] : dangling.errors.map((e) => e.message)).toEqual([
      `${data}/boats/dangling.yaml:1:1 the file must be a file, found a link to something that does not exist — copy the file into the data folder, or remove the link`,
    ]);
  });

  it('matchbook check prints the refusal and not one byte of the file behind the link (site.yaml linked to an environment file)', () => {
    const { data, outside } = setup();
    renameSync(join(data, 'site.yaml'), join(outside, 'site.yaml'));
    symlinkSync(join(outside, '.env'), join(data, 'site.yaml'));
    const r = matchbook(['check', '--data', data]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain(`${data}/site.yaml:1:1 the file must be a file inside the data folder, found a symbolic link that leads outside the data folder`);
    expect(`${r.stdout}${r.stderr}`).not.toContain('SECRET');
    expect(`${r.stdout}${r.stderr}`).not.toContain(outside);
  });
});
