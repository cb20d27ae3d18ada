/**
 * Build-level promises on a small data set (test/reliability/smallData.ts), through the real command:
 * hostile text is escaped in HTML and SVG and printed in the PDF; text the font cannot print is a
 * located error naming the code point; over-revving and lugging fits are warned about on every sheet of
 * the boat; a failing build leaves the previous output untouched and a removed boat leaves no files.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { findAll, textContent } from 'domutils';
import { parseDocument } from 'htmlparser2';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createStaging, discardStaging } from '../../src/site/atomicDir.ts';
import { xmlProblems } from '../render/xmlCheck.ts';
import { matchbook, STACK_TRACE } from './cli.ts';
import { removeDir, tempDir } from './corpus.ts';
import { folded, pdfPages, tree } from './outputTree.ts';
import { HOSTILE, writeSmallData } from './smallData.ts';

const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const root = tempDir('small');
const data = join(root, 'data');
const out = join(root, 'out');
const build = (dataDir = 'data') => matchbook(['build', '--data', dataDir, '--out', 'out'], { cwd: root, env: ENV });

beforeAll(async () => {
  writeSmallData(data);
  const run = await build();
  if (run.status !== 0) throw new Error(`small build failed:\n${run.stderr}`);
});
afterAll(() => removeDir(root));

const read = (path: string) => readFileSync(join(out, path), 'utf8');

/** All text nodes of a parsed document, joined with spaces and folded. */
function parsedText(markup: string, opts: { xmlMode: boolean }): { text: string; elements: string[] } {
  const doc = parseDocument(markup, { xmlMode: opts.xmlMode, decodeEntities: true });
  const elements = findAll(() => true, doc.children).map((e) => e.name.toLowerCase());
  const texts = findAll((e) => !['script', 'style'].includes(e.name.toLowerCase()), doc.children).flatMap((e) =>
    e.children.filter((c) => c.type === 'text').map((c) => textContent(c)),
  );
  return { text: folded(texts.join(' ')), elements };
}

describe('hostile text in names and notes', () => {
  it('is escaped in every HTML page: parsed back, it is text, never a script or a <b> element', () => {
    const pages = [...tree(out).keys()].filter((p) => p.endsWith('.html'));
    expect(pages.length).toBeGreaterThan(3);
    for (const page of pages) {
      const html = read(page);
      const { elements } = parsedText(html, { xmlMode: false });
      const scripts = findAll((e) => e.name === 'script', parseDocument(html).children);
      expect(scripts.map((s) => textContent(s)).join(' '), page).not.toContain('alert(');
      expect(elements, page).not.toContain('b');
      expect(elements, page).not.toContain('far');
      expect(elements, page).not.toContain('jet');
    }
    const { text } = parsedText(read('boats/greyling/index.html'), { xmlMode: false });
    for (const s of [HOSTILE.boatName, HOSTILE.notes, HOSTILE.shopName, HOSTILE.cruiseLabel]) expect(text).toContain(s);
  });

  it('is escaped in every SVG: well-formed XML whose text nodes read back exactly', () => {
    const svgs = [...tree(out).keys()].filter((p) => p.endsWith('.svg'));
    // Ten sheets; a sheet that goes on over pages (a two-sided card) adds a file per further page.
    expect(svgs.filter((p) => !/-page-\d+\.svg$/.test(p)).length).toBe(10);
    for (const path of svgs) {
      const svg = read(path);
      expect(xmlProblems(svg), path).toEqual([]);
      expect(parsedText(svg, { xmlMode: true }).elements, path).not.toContain('script');
    }
    const spec = parsedText(read('sheets/spec-greyling.svg'), { xmlMode: true }).text;
    for (const s of [HOSTILE.boatName, HOSTILE.shopName, HOSTILE.cruiseLabel]) expect(spec).toContain(s);
  });

  it('prints in the PDF with the embedded font: accented and Greek letters, quotes and markup characters come back as text', () => {
    const text = folded(pdfPages(join(out, 'sheets/spec-greyling.pdf')).join(' '));
    for (const s of [HOSTILE.boatName, HOSTILE.shopName, HOSTILE.cruiseLabel]) expect(text).toContain(s);
    // Every font embedded, and only the sheet font (poppler's pdffonts: name, type, encoding, emb, sub, uni, …).
    const fonts = spawnSync('pdffonts', [join(out, 'sheets/spec-greyling.pdf')], { encoding: 'utf8' }).stdout.split('\n').slice(2).filter(Boolean);
    expect(fonts.length).toBeGreaterThan(0);
    for (const row of fonts) {
      expect(row).toMatch(/\+SourceSans3-(Regular|Bold)\s/);
      expect(row.split(/\s+/).slice(-5, -2), row).toEqual(['yes', 'yes', 'yes']);
    }
  });

  it.each([
    ['an emoji', 'Greyling 🚤', '🚤', 'U+1F6A4', 17],
    ['right-to-left Hebrew', 'Greyling שלום', 'ש', 'U+05E9', 17],
  ])('refuses %s the font cannot print with a located error naming the code point, writing nothing', async (_what, name, ch, code, column) => {
    const dir = join(root, `unprintable-${code}`);
    writeSmallData(join(dir, 'data'), { boatName: name });
    const run = await matchbook(['build', '--data', 'data', '--out', 'out'], { cwd: dir, env: ENV });
    expect(run.status).toBe(1);
    // name: "Greyling 🚤" — the character is the 17th of line 4 of the boat file.
    expect(run.stderr).toContain(`data/boats/greyling.yaml:4:${column} name must use characters the sheet font`);
    expect(run.stderr).toContain(`found "${ch}" (${code})`);
    expect(run.stderr).not.toMatch(STACK_TRACE);
    expect(readdirSync(dir)).toEqual(['data']);
  });
});

describe('ids that try to leave the output folder', () => {
  it.each([
    ['a climb out with ../', '../../reliability-escape-7q', 3, 5],
    ['an absolute path', '/tmp/reliability-escape-7q', 3, 5],
  ])('%s is refused as data (exit 1) and nothing is written anywhere', async (_what, id, line, column) => {
    const dir = join(root, `id-${line}-${id.length}`);
    writeSmallData(join(dir, 'data'));
    const file = join(dir, 'data/boats/light-boat.yaml');
    writeFileSync(file, readFileSync(file, 'utf8').replace('id: light-boat', `id: ${id}`));
    const run = await matchbook(['build', '--data', 'data', '--out', 'site/out'], { cwd: dir, env: ENV });
    expect(run.status).toBe(1);
    expect(run.stderr).toContain(`data/boats/light-boat.yaml:${line}:${column} id must be a lower-case id`);
    expect(readdirSync(dir)).toEqual(['data']);
    for (const near of [root, dirname(root), '/tmp']) expect(readdirSync(near).filter((n) => n.includes('reliability-escape-7q'))).toEqual([]);
    rmSync(dir, { recursive: true });
  });
});

describe('fits that over-rev or lug', () => {
  const sheetText = (slug: string) => folded(pdfPages(join(out, `sheets/${slug}.pdf`)).join(' '));

  it.each(['spec', 'card', 'upgrade'])('are warned about on the %s sheet in words (over-revs, lugs)', (kind) => {
    expect(sheetText(`${kind}-light-boat`)).toMatch(/over-rev/i);
    expect(sheetText(`${kind}-heavy-boat`)).toMatch(/\blugs?\b|lugging|below the (WOT )?window/i);
  });

  it('never recommend an impeller whose WOT rpm lies outside the engine window (5400–5800 rpm)', () => {
    // Upgrade sheets name the best impeller for each power change as "Gale: 5680 rpm".
    for (const boat of ['greyling', 'light-boat', 'heavy-boat']) {
      const picks = [...sheetText(`upgrade-${boat}`).matchAll(/\b(?:Wisp|Breeze|Gust|Squall|Gale|Storm): (\d{4}) rpm/g)].map((m) => Number(m[1]));
      expect(picks.length, boat).toBeGreaterThan(0);
      for (const rpm of picks) {
        expect(rpm, boat).toBeGreaterThanOrEqual(5400);
        expect(rpm, boat).toBeLessThanOrEqual(5800);
      }
    }
  });
});

describe('atomic output', () => {
  it('builds in a staging folder beside out/, never elsewhere', () => {
    const staging = createStaging(out);
    try {
      expect(dirname(staging)).toBe(dirname(out));
      expect(staging).not.toBe(out);
    } finally {
      discardStaging(staging);
    }
  });

  it('leaves the previous out/ untouched, byte for byte, when a file breaks between two builds', async () => {
    const before = tree(out);
    const jet = join(data, 'jets/kelpspindle-riffle.yaml');
    const good = readFileSync(jet, 'utf8');
    writeFileSync(jet, good.replace('rating_kw: 2.06', 'rating_kw: [2.06'));
    const run = await build();
    writeFileSync(jet, good);
    expect(run.status).toBe(1);
    expect(run.stderr).toContain('jets/kelpspindle-riffle.yaml:');
    const after = tree(out);
    expect([...after.keys()]).toEqual([...before.keys()]);
    for (const [path, bytes] of before) expect(Buffer.compare(bytes, after.get(path)!), path).toBe(0);
    // No staging or old folder is left beside out/.
    expect(readdirSync(root).sort()).toEqual(['data', 'out', 'unprintable-U+05E9', 'unprintable-U+1F6A4']);
  });

  it('drops every file of a removed boat on the next build', async () => {
    expect([...tree(out).keys()].filter((p) => p.includes('heavy-boat')).length).toBeGreaterThan(4);
    rmSync(join(data, 'boats/heavy-boat.yaml'));
    const run = await build();
    expect(run.status, run.stderr).toBe(0);
    const files = [...tree(out).keys()];
    expect(files.filter((p) => p.includes('heavy-boat'))).toEqual([]);
    expect(files.filter((p) => p.includes('light-boat')).length).toBeGreaterThan(4);
    expect(read('index.html')).not.toContain('Heavy Boat');
  });
});
