/**
 * Two builds of the demo data through the real command, in different folders, from different working
 * folders, more than a second apart: the trees are byte-identical, SOURCE_DATE_EPOCH sets the printed
 * date, no built file shows NaN, Infinity, undefined or null where a number belongs, and every page
 * and every sheet (HTML, SVG, each PDF page) carries the cautions, and every link and source inside the
 * site resolves to a file (and every #fragment to an id on its page).
 */
import { cpSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BUILT_IN_CAUTIONS, CARD_CAUTION_LINE, CONTINUING_CAUTION } from '../../src/sheets/kit/cautions.ts';
import { checkLinks } from '../site/linkCheck.ts';
import { matchbook } from './cli.ts';
import { removeDir, tempDir } from './corpus.ts';
import { numbersIn } from './mutations.ts';
import { folded, pdfPages, tree, visibleText } from './outputTree.ts';

/** 1767225600 s after 1970-01-01 UTC is 2026-01-01 (20454 days × 86400 s). */
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const EPOCH_DATE = '2026-01-01';

const first = tempDir('demo-a');
const second = tempDir('demo-b');
let a: Map<string, Buffer>;
let b: Map<string, Buffer>;

async function buildIn(dir: string, cwd: string): Promise<Map<string, Buffer>> {
  cpSync('data', join(dir, 'data'), { recursive: true });
  // Relative paths from a working folder that differs between the two builds.
  const run = await matchbook(['build', '--data', 'data', '--out', 'site/out'], { cwd, env: ENV });
  if (run.status !== 0) throw new Error(`demo build failed:\n${run.stderr}`);
  return tree(join(dir, 'site', 'out'));
}

beforeAll(async () => {
  a = await buildIn(first, first);
  await new Promise((done) => setTimeout(done, 1100)); // the clock moves on by more than a second
  b = await buildIn(second, second);
});
afterAll(() => {
  removeDir(first);
  removeDir(second);
});

const text = (path: string) => a.get(path)!.toString('utf8');
const of = (ext: string) => [...a.keys()].filter((p) => p.endsWith(ext));

describe('two builds of the same data', () => {
  it('give byte-identical trees of SVG, PNG, PDF, HTML, JSON and CSV', () => {
    expect([...b.keys()]).toEqual([...a.keys()]);
    for (const ext of ['.svg', '.png', '.pdf', '.html', '.json', '.csv']) expect(of(ext).length, ext).toBeGreaterThan(0);
    const differing = [...a].filter(([path, bytes]) => Buffer.compare(bytes, b.get(path)!) !== 0).map(([path]) => path);
    expect(differing).toEqual([]);
  });

  it('print the date SOURCE_DATE_EPOCH gives, not the clock or the issue date', () => {
    expect(visibleText(text('index.html'))).toContain(EPOCH_DATE);
    expect(visibleText(text('sheets/spec-reedshank.svg'))).toContain(`issued ${EPOCH_DATE}`);
    expect(folded(pdfPages(join(first, 'site/out/sheets/spec-reedshank.pdf')).join(' '))).toContain(`issued ${EPOCH_DATE}`);
    expect(visibleText(text('sheets/spec-reedshank.svg'))).not.toContain('issued 2026-11-02');
  });
});

/** Words that must never stand where a number is printed (matched as whole words). */
const NONSENSE = /\b(NaN|-?Infinity|undefined|null)\b/;

describe('no nonsense on paper', () => {
  it('no HTML page, SVG sheet or PDF page shows NaN, Infinity, undefined or null', () => {
    const found: string[] = [];
    // The guides are the prose of docs/, which names JSON's null and undefined on purpose; no figure is computed there.
    const computed = of('.html').filter((p) => !p.startsWith('guides/'));
    expect(computed.length).toBe(14);
    for (const path of [...computed, ...of('.svg')]) {
      const m = NONSENSE.exec(visibleText(text(path)));
      if (m) found.push(`${path}: ${m[0]}`);
    }
    for (const path of of('.pdf')) {
      pdfPages(join(first, 'site/out', path)).forEach((page, i) => {
        const m = NONSENSE.exec(page);
        if (m) found.push(`${path} page ${i + 1}: ${m[0]}`);
      });
    }
    expect(found).toEqual([]);
  });

  it('no SVG coordinate or attribute holds NaN or Infinity', () => {
    for (const path of of('.svg')) expect(text(path), path).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('every results JSON file holds finite numbers only, and no null or missing value', () => {
    const files = of('.json').filter((p) => p.startsWith('results/'));
    expect(files.length).toBe(9); // six boats, three engine families
    for (const path of files) {
      const raw = text(path);
      expect(raw, path).not.toMatch(/\bnull\b|NaN|Infinity/);
      const value = JSON.parse(raw) as unknown;
      expect(numbersIn(value).filter((n) => !Number.isFinite(n.value)), path).toEqual([]);
    }
  });

  it('every results CSV file is linked from its page and holds no NaN, Infinity or null', () => {
    const files = of('.csv').filter((p) => p.startsWith('results/'));
    expect(files.length).toBe(15); // six boats × (impellers, cruise), three engine families
    for (const path of files) expect(text(path), path).not.toMatch(/\bnull\b|NaN|Infinity|undefined/);
    const page = (p: string) => (p.startsWith('results/boats/') ? `boats/${p.split('/')[2].split('.')[0]}/index.html` : `families/${p.split('/')[2].split('.')[0]}/index.html`);
    for (const path of files) expect(text(page(path)), path).toContain(`href="../../${path}" download`);
  });
});

describe('cautions', () => {
  // The three points every sheet must make (DOMAIN.md, "Cautions that belong on every sheet").
  const essentials = [/sea trial/i, /maximum rpm/i, /qualified marine technician/i, /instructions/i, /regulations/i];
  const carries = (where: string, body: string) => {
    for (const caution of BUILT_IN_CAUTIONS) expect(body, `${where} lacks: ${caution}`).toContain(caution);
    for (const e of essentials) expect(body, where).toMatch(e);
  };

  it('appear on every HTML page', () => {
    const pages = of('.html');
    expect(pages.length).toBeGreaterThanOrEqual(14);
    for (const page of pages) carries(page, visibleText(text(page)));
  });

  // A page of a sheet that goes on over pages (the front of a two-sided console card, a spec sheet's
  // further pages) may carry the built-in cautions in their one-line form instead, which makes every
  // essential point; the whole sheet still carries them in full.
  const shortForms = [CARD_CAUTION_LINE, CONTINUING_CAUTION];
  const carriesOnPage = (where: string, body: string) => {
    if (shortForms.some((line) => body.includes(folded(line)))) for (const e of essentials) expect(body, where).toMatch(e);
    else carries(where, body);
  };

  it('appear on every SVG sheet', () => {
    const sheets = of('.svg').filter((p) => p.startsWith('sheets/'));
    // 3 default wall charts (the pairings boats use), 3 sheets for each of 6 boats, 1 repower comparison, and what the books add:
    // 1 wall chart under its own conditions (the books' other two are default charts), 1 spec sheet on
    // Letter, 3 console cards on the 4x6 card; a sheet that goes on over pages has one file per page.
    const firstPages = sheets.filter((p) => !/-page-\d+\.svg$/.test(p));
    expect(firstPages.length).toBe(27);
    for (const sheet of sheets) carriesOnPage(sheet, visibleText(text(sheet)));
    for (const sheet of firstPages) {
      const pages = sheets.filter((p) => p === sheet || p.startsWith(sheet.replace(/\.svg$/, '-page-')));
      carries(`${sheet} with its pages`, pages.map((p) => visibleText(text(p))).join(' '));
    }
  });

  it('appear on every page of every PDF, single sheets and books', () => {
    let pages = 0;
    for (const path of of('.pdf')) {
      const all = pdfPages(join(first, 'site/out', path));
      all.forEach((page, i) => {
        pages++;
        carriesOnPage(`${path} page ${i + 1}`, folded(page));
      });
      carries(`${path}, all pages`, folded(all.join(' ')));
    }
    expect(pages).toBeGreaterThanOrEqual(26 + 15);
  });
});

describe('links', () => {
  it('every href, src and stylesheet url inside the site names a file of the build, and every #fragment an id on its page', () => {
    const report = checkLinks(join(first, 'site/out'));
    expect(report.broken).toEqual([]);
    // 18 pages: index, 3 families, 6 boats, 1 repower comparison, 3 books, 4 guides; each page links the others through its navigation.
    expect(report.pages).toBe(18);
    expect(report.checked).toBeGreaterThan(300);
  });

  it('the guides are pages of the site, each linked from the navigation of every page', () => {
    const guides = ['guides/sheets/index.html', 'guides/model/index.html', 'guides/data-format/index.html', 'guides/results/index.html'];
    for (const guide of guides) expect(a.has(guide), guide).toBe(true);
    for (const page of of('.html')) {
      const depth = page.split('/').length - 1;
      for (const guide of guides) expect(text(page), page).toContain(`href="${'../'.repeat(depth)}${guide}"`);
    }
    // The raw Markdown is no longer copied into the site.
    expect(of('.md')).toEqual([]);
  });
});
