/**
 * The dev server's site data on broken data: it never throws (a throw would stop the rebuild and the
 * page would keep showing the old site with no word of what is wrong); it hands the templates the
 * problems, split into place, sentence and the lines under it.
 */
import { cpSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BUILT_IN_CAUTIONS } from '../../src/sheets/kit/cautions.ts';
import { liveSiteData, problemView } from '../../src/site/liveSite.ts';
import { indexPage } from '../../src/site/pages/pages.ts';

describe('liveSiteData() on broken data', () => {
  it('returns an empty site carrying the problems when nothing has built yet', async () => {
    const root = mkdtempSync(join(tmpdir(), 'matchbook-live-'));
    const data = join(root, 'shop');
    cpSync('data', data, { recursive: true });
    writeFileSync(join(data, 'jets', 'kelpspindle-riffle.yaml'), 'id: kelpspindle-riffle\nlabel: Kelpspindle Riffle jet unit\nexponent 3\ntolerance_pct: 5\n');
    const said: string[] = [];
    const site = await liveSiteData({ dataDir: data, outDir: join(root, 'out'), report: (t) => said.push(t) })();
    const view = site.view;
    expect(view.problems?.heading).toBe('The data has 1 problem; fix it and save.');
    expect(view.problems?.note).toBe('Nothing has built yet. This page reloads by itself when the files are fixed.');
    expect(view.problems?.items).toEqual([
      {
        where: `${join(data, 'jets', 'kelpspindle-riffle.yaml')}:3:1`,
        message: 'the file must be valid YAML, found "exponent 3" with no colon after its key — write it as key: value, for example exponent: 3',
        detail: ['3 | exponent 3', '  | ^', 'the YAML parser said: Implicit keys need to be on a single line'],
      },
    ]);
    // Nothing else to show, but the cautions still print on the page.
    expect([view.families.length, view.boats.length, view.books.length]).toEqual([0, 0, 0]);
    expect(view.cautions).toEqual(BUILT_IN_CAUTIONS);
    const html = indexPage(view);
    expect(html).toContain('<section class="build-problems" role="alert"');
    expect(html).toContain('<pre>3 | exponent 3\n  | ^\nthe YAML parser said: Implicit keys need to be on a single line</pre>');
    expect(html.indexOf('build-problems')).toBeLessThan(html.indexOf('class="cautions"'));
    // The terminal hears the same, with a count.
    expect(said.join('')).toContain(':3:1 the file must be valid YAML, found "exponent 3" with no colon after its key');
    expect(said.join('')).toContain('1 problem in the data.');
  });

  it('splits a located error into its place and the rest of its sentence', () => {
    const e = { file: 'shop/boats/b.yaml', line: 4, column: 9, field: 'engine', found: '"x"', expected: 'must name an engine', message: 'shop/boats/b.yaml:4:9 engine must name an engine, found "x"' };
    expect(problemView(e)).toEqual({ where: 'shop/boats/b.yaml:4:9', message: 'engine must name an engine, found "x"', detail: [] });
  });
});
