// The link checker on a hand-made site: it reports exactly the references that name no file or no id,
// and leaves web addresses alone. (The demo site's own check is in test/reliability/demoBuild.test.ts,
// on the build that test already makes.)
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { checkLinks } from './linkCheck.ts';

const root = mkdtempSync(join(tmpdir(), 'matchbook-links-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

function put(path: string, text: string): void {
  mkdirSync(dirname(join(root, path)), { recursive: true });
  writeFileSync(join(root, path), text);
}

put('assets/site.css', `@font-face { src: url(fonts/a.ttf); } body { background: url("missing.png"); }`);
put('assets/fonts/a.ttf', 'font');
put('img/a.png', 'png');
put('guides/a/index.html', `<!doctype html><h1 id="top">A</h1><h2 id="air">Air</h2><a name="old">old</a>
<a href="../b/index.html#water">fine</a> <a href="../b/index.html#fire">no such id</a> <a href="#air">fine</a>
<a href="#old">fine</a> <a href="#nowhere">no such id here</a> <a href="../../img/a.png?v=1">fine</a>`);
put('guides/b/index.html', `<!doctype html><h2 id="water">Water</h2><a href="../a/">a folder</a> <a href="../../../up.html">outside</a>`);
put('index.html', `<!doctype html><link rel="stylesheet" href="assets/site.css">
<a href="guides/a/index.html#top">fine</a> <a href="guides/c/index.html">missing page</a> <img src="img/b.png" alt="">
<img src="img/a.png" alt=""> <a href="https://example.invalid/x.html">web</a> <a href="mailto:a@example.invalid">mail</a>
<a href="//example.invalid/y">web</a> <svg><image xlink:href="img/gone.png"/></svg> <a href="/img/a.png">fine</a>
<a href="guides/a/index.md">a Markdown source</a>`);

describe('checkLinks()', () => {
  const report = checkLinks(root);

  it('reports every reference that names no file, no id, a folder or a place outside the site, and nothing else', () => {
    expect(report.broken).toEqual([
      'guides/a/index.html: href="../b/index.html#fire" → no id "fire" in guides/b/index.html',
      'guides/a/index.html: href="#nowhere" → no id "nowhere" in guides/a/index.html',
      'guides/b/index.html: href="../a/" → no file guides/a/',
      'guides/b/index.html: href="../../../up.html" → leaves the site',
      'index.html: href="guides/c/index.html" → no file guides/c/index.html',
      'index.html: src="img/b.png" → no file img/b.png',
      'index.html: xlink:href="img/gone.png" → no file img/gone.png',
      'index.html: href="guides/a/index.md" → no file guides/a/index.md',
      'assets/site.css: url="missing.png" → no file assets/missing.png',
    ]);
  });

  it('counts the internal references it checked and skips web addresses', () => {
    // 6 + 2 + 8 in the pages (three web addresses skipped), 2 in the stylesheet.
    expect(report.pages).toBe(3);
    expect(report.checked).toBe(18);
  });
});
