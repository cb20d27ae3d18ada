import { existsSync, readFileSync } from 'node:fs';
import { join, posix } from 'node:path';
import MarkdownIt, { type Token } from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { GUIDES, guideLink, headingId, readGuides, renderGuide } from '../../src/site/guides.ts';
import { guidePage } from '../../src/site/pages/guidePage.ts';
import { indexPage } from '../../src/site/pages/pages.ts';
import { byId, demoProject, pageText, viewOf } from './demoSite.ts';

const DOCS = 'docs';

describe('guide links', () => {
  it('guideLink() sends a guide to its page and a docs image to the site copy, keeping the #fragment', () => {
    expect(guideLink('model.md#2-air-at-the-site', GUIDES)).toBe('../model/index.html#2-air-at-the-site');
    expect(guideLink('./results.md', GUIDES)).toBe('../results/index.html');
    expect(guideLink('img/spec-reedshank.png', GUIDES)).toBe('../img/spec-reedshank.png');
  });

  it('guideLink() leaves web addresses, same-page fragments and files the site does not carry as written', () => {
    expect(guideLink('https://example.invalid/a.md', GUIDES)).toBe('https://example.invalid/a.md');
    expect(guideLink('#cautions', GUIDES)).toBe('#cautions');
    // Not a published guide: left alone, so the site's link check reports it if a guide ever links it.
    expect(guideLink('architecture.md', GUIDES)).toBe('architecture.md');
  });

  it('headingId() gives the ids a repository browser gives (github-slugger rule, from memory)', () => {
    const taken = new Map<string, number>();
    expect(headingId('2. Air at the site', taken)).toBe('2-air-at-the-site');
    expect(headingId('engines/<id>.yaml — an engine family', taken)).toBe('enginesidyaml--an-engine-family');
    expect(headingId('Wall chart — `analyseWallChart({ family, jet, conditions })`', taken)).toBe('wall-chart--analysewallchart-family-jet-conditions-');
    expect(headingId('Cautions', taken)).toBe('cautions');
    expect(headingId('Cautions', taken)).toBe('cautions-1');
  });

  it('renderGuide() writes ids on headings, rewrites links and images, and shows raw HTML as text', () => {
    const { title, html } = renderGuide('# Air &amp; water\n\nSee [the model](model.md#3-what-the-impeller-takes).\n\n![Card](img/card.png)\n\n<script>x</script>\n', GUIDES);
    expect(title).toBe('Air & water');
    expect(html).toContain('<h1 id="air--water">Air &amp; water</h1>');
    expect(html).toContain('<a href="../model/index.html#3-what-the-impeller-takes">the model</a>');
    expect(html).toContain('<img src="../img/card.png" alt="Card">');
    expect(html).toContain('&lt;script&gt;x&lt;/script&gt;');
    expect(html).not.toContain('<script>');
  });
});

/** Every link and image of a Markdown source, as written. */
function refsOf(markdown: string): string[] {
  const walk = (tokens: readonly Token[]): string[] =>
    tokens.flatMap((t) => [
      ...(t.type === 'link_open' ? [t.attrGet('href') ?? ''] : []),
      ...(t.type === 'image' ? [t.attrGet('src') ?? ''] : []),
      ...walk(t.children ?? []),
    ]);
  return walk(new MarkdownIt().parse(markdown, {}));
}

describe('the guides of docs/', () => {
  const guides = readGuides(DOCS);

  it('are all found, titled by their first heading, at guides/<slug>/index.html', () => {
    expect(guides.map((g) => [g.href, g.title])).toEqual([
      ['guides/sheets/index.html', 'Reading the sheets'],
      ['guides/model/index.html', 'How matchbook computes a match'],
      ['guides/data-format/index.html', 'Data format'],
      ['guides/results/index.html', 'Results JSON'],
    ]);
  });

  it('ship in the npm package, with their images, so an installed matchbook builds sites that carry them', () => {
    const files = (JSON.parse(readFileSync('package.json', 'utf8')) as { files: string[] }).files;
    for (const g of GUIDES) expect(files, g.file).toContain(`docs/${g.file}`);
    expect(files).toContain('docs/img/');
  });

  it('link, in their Markdown sources, only to files that exist beside them and to headings those files have', () => {
    // So the sources read on a repository browser, where the relative paths are followed as written.
    const problems: string[] = [];
    for (const g of GUIDES) {
      for (const ref of refsOf(readFileSync(join(DOCS, g.file), 'utf8'))) {
        if (/^[a-z]+:/i.test(ref)) continue;
        const [path, fragment] = ref.split('#');
        const file = path === '' ? g.file : posix.normalize(path);
        if (!existsSync(join(DOCS, file))) problems.push(`${g.file}: ${ref} (no file docs/${file})`);
        else if (fragment && file.endsWith('.md')) {
          // The ids headingId() gives, which a repository browser gives too (tested above).
          const ids = [...renderGuide(readFileSync(join(DOCS, file), 'utf8'), GUIDES).html.matchAll(/<h[1-6] id="([^"]+)"/g)].map((m) => m[1]);
          if (!ids.includes(fragment)) problems.push(`${g.file}: ${ref} (no heading #${fragment} in docs/${file})`);
        }
      }
    }
    expect(problems).toEqual([]);
  });

  it('link in the site only to other guides, their images and same-page headings', () => {
    const hrefs = guides.flatMap((g) => [...g.bodyHtml.matchAll(/(?:href|src)="([^"]+)"/g)].map((m) => m[1]));
    expect(hrefs.length).toBeGreaterThan(4);
    const wrong = hrefs.filter((h) => !/^(https?:|#|\.\.\/(sheets|model|data-format|results)\/index\.html(#|$)|\.\.\/img\/[\w-]+\.png$)/.test(h));
    expect(wrong).toEqual([]);
    // The data-format guide's link into the model guide keeps its heading.
    expect(guides[2].bodyHtml).toContain('href="../model/index.html#2-air-at-the-site"');
  });
});

describe('guide pages', async () => {
  const guides = readGuides(DOCS);
  const site = { ...viewOf(await demoProject()), guides, schemas: [{ label: 'boat.schema.json', href: 'schema/boat.schema.json' }] };

  it('carry the cautions, the site navigation with every guide (this one marked current), and the guide text', () => {
    const page = guidePage(site, guides[1]);
    expect(byId(page, 'cautions-title')).not.toBeNull();
    for (const caution of site.cautions) expect(pageText(page)).toContain(caution);
    expect(page).toContain('<a href="../../index.html#boats">Boats</a>');
    for (const g of guides) expect(page).toContain(`href="../../${g.href}"`);
    expect(page).toContain('<a href="../../guides/model/index.html" aria-current="page">How the numbers are made</a>');
    expect(page).toContain('<title>How matchbook computes a match · ');
    expect(byId(page, '2-air-at-the-site')?.name).toBe('h2');
  });

  it('the data-format guide lists the JSON Schemas after its text; the others do not', () => {
    expect(guidePage(site, guides[2])).toContain('<a href="../../schema/boat.schema.json">boat.schema.json</a>');
    expect(guidePage(site, guides[0])).not.toContain('schema/boat.schema.json');
  });

  it('the index links every guide from its navigation and from its text', () => {
    const page = indexPage(site);
    for (const g of guides) expect(page.split(`href="${g.href}"`).length - 1, g.href).toBe(2);
  });
});
