/**
 * The user guides of docs/ as pages of the site. The Markdown sources stay readable on their own (a
 * repository browser shows them with their relative links and images); the build renders them with
 * markdown-it and rewrites those links to the pages and image copies of the built site:
 *   docs/model.md#2-air-at-the-site → guides/model/index.html#2-air-at-the-site
 *   docs/img/spec.png               → guides/img/spec.png
 * Headings get the ids a repository browser gives them, so one #fragment works in both places.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, posix } from 'node:path';
import MarkdownIt, { type Token } from 'markdown-it';
import type { GuideView } from './siteView.ts';

export interface GuideSpec {
  /** The Markdown file in docs/. */
  readonly file: string;
  /** The page's folder under guides/. */
  readonly slug: string;
  /** Its name in the site's navigation. */
  readonly navLabel: string;
  /** Whether the page lists the JSON Schemas after the text (the data-format guide). */
  readonly withSchemas?: boolean;
}

/** The guides every site carries, in navigation order. Contributor docs (architecture, speed, reliability) stay in the repository. */
export const GUIDES: readonly GuideSpec[] = [
  { file: 'sheets.md', slug: 'sheets', navLabel: 'Reading the sheets' },
  { file: 'model.md', slug: 'model', navLabel: 'How the numbers are made' },
  { file: 'data-format.md', slug: 'data-format', navLabel: 'Data format', withSchemas: true },
  { file: 'results.md', slug: 'results', navLabel: 'Results JSON' },
];

/** The folder of docs/ images inside the site. */
export const GUIDE_IMAGES_DIR = 'guides/img';

/** Where a guide's page lives, relative to the site root. */
export function guideHref(slug: string): string {
  return `guides/${slug}/index.html`;
}

/**
 * A heading's id as a repository browser makes it (the github-slugger rule, from memory): lower case,
 * every character but letters, marks, digits, "_", "-" and spaces dropped, spaces turned into "-",
 * a repeated id followed by "-1", "-2", …
 */
export function headingId(text: string, taken: Map<string, number>): string {
  const base = text.toLowerCase().replace(/[^\p{L}\p{M}\p{N}\p{Pc}\- ]/gu, '').replace(/ /g, '-');
  const seen = taken.get(base) ?? 0;
  taken.set(base, seen + 1);
  return seen === 0 ? base : `${base}-${seen}`;
}

const textOf = (tokens: readonly Token[]): string => tokens.map((t) => (t.children ? textOf(t.children) : t.content)).join('');

/**
 * A link or image path of a docs/ Markdown file as the guide page at guides/<slug>/index.html needs
 * it. Links to other guides and to docs/img/ are rewritten; web addresses and same-page fragments stay;
 * anything else is left as written (the site's link check then reports it).
 */
export function guideLink(ref: string, guides: readonly GuideSpec[]): string {
  if (/^[a-z][a-z0-9+.-]*:|^\/\/|^#/i.test(ref)) return ref;
  const hashAt = ref.indexOf('#');
  const path = hashAt < 0 ? ref : ref.slice(0, hashAt);
  const fragment = hashAt < 0 ? '' : ref.slice(hashAt);
  const inDocs = posix.normalize(path);
  const guide = guides.find((g) => g.file === inDocs);
  if (guide) return `../${guide.slug}/index.html${fragment}`;
  if (inDocs.startsWith('img/')) return `../img/${inDocs.slice('img/'.length)}${fragment}`;
  return ref;
}

/** A guide's Markdown as HTML: heading ids, and links and images pointing into the built site. */
export function renderGuide(markdown: string, guides: readonly GuideSpec[]): { title: string; html: string } {
  // Raw HTML in the sources is shown as text, never passed through.
  const md = new MarkdownIt({ html: false, linkify: false, typographer: false });
  const tokens = md.parse(markdown, {});
  const taken = new Map<string, number>();
  let title = '';
  tokens.forEach((token, i) => {
    if (token.type === 'heading_open') {
      const text = textOf(tokens[i + 1]?.children ?? []);
      if (token.tag === 'h1' && title === '') title = text.trim();
      token.attrSet('id', headingId(text.trim(), taken));
    }
    for (const child of token.children ?? []) {
      const attr = child.type === 'link_open' ? 'href' : child.type === 'image' ? 'src' : undefined;
      const ref = attr ? child.attrGet(attr) : null;
      if (attr && ref !== null) child.attrSet(attr, guideLink(ref, guides));
    }
  });
  return { title, html: md.renderer.render(tokens, md.options, {}) };
}

/** Every guide whose Markdown file is in docsDir, rendered; a guide whose file is missing is left out. */
export function readGuides(docsDir: string, guides: readonly GuideSpec[] = GUIDES): GuideView[] {
  const present = guides.filter((g) => existsSync(join(docsDir, g.file)));
  return present.map((g) => {
      const { title, html } = renderGuide(readFileSync(join(docsDir, g.file), 'utf8'), present);
      return { slug: g.slug, title: title || g.navLabel, navLabel: g.navLabel, href: guideHref(g.slug), bodyHtml: html, withSchemas: g.withSchemas === true };
    });
}
