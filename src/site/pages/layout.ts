/** The page shell shared by every page: head, navigation, cautions, footer. Works with JavaScript off. */
import { html, trustedHtml, type SafeHtml } from '../html.ts';
import type { SheetView, SiteView } from '../siteView.ts';

export interface PageArgs {
  readonly site: SiteView;
  readonly title: string;
  /** The way back to the site root from this page: "" for the index, "../../" two folders down. */
  readonly root: string;
  readonly body: SafeHtml;
  /** Sheets shown inline; each gets a print page of its own paper size. */
  readonly sheets?: readonly SheetView[];
  /** The page's own address from the site root, marked as the current page in the navigation. */
  readonly href?: string;
}

/** @page rules so each inline sheet prints alone on paper of its own size, without margins. */
function printPageRules(sheets: readonly SheetView[]): SafeHtml {
  const sizes = new Map(sheets.map((s) => [s.printPage, `${s.widthMm}mm ${s.heightMm}mm`]));
  if (sizes.size === 0) return html``;
  const rules = [...sizes].map(([name, size]) => `@page ${name} { size: ${size}; margin: 0; }`).join('\n');
  return html`<style media="print">\n${trustedHtml(rules)}\n</style>`;
}

/** The cautions block; the same sentences the sheets print. */
export function cautionsBlock(site: SiteView): SafeHtml {
  return html`<aside class="cautions" aria-labelledby="cautions-title">
<h2 id="cautions-title">Cautions</h2>
<ul>${site.cautions.map((c) => html`<li>${c}</li>`)}</ul>
</aside>`;
}

/** While `serve` runs on broken data: the problems, each with its place, at the top of the page. */
export function problemsBlock(site: SiteView): SafeHtml {
  const p = site.problems;
  if (!p) return html``;
  return html`<section class="build-problems" role="alert" aria-labelledby="build-problems-title">
<h2 id="build-problems-title">${p.heading}</h2>
<p>${p.note}</p>
<ol>${p.items.map(
    (item) => html`<li>${item.where ? html`<code class="where">${item.where}</code> ` : ''}${item.message}${
      item.detail.length > 0 ? html`<pre>${item.detail.join('\n')}</pre>` : ''
    }</li>`,
  )}</ol>
</section>`;
}

/** A whole HTML page. */
export function pageLayout(args: PageArgs): string {
  const { site, root } = args;
  return html`<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${args.title} · ${site.shopName}</title>
<link rel="stylesheet" href="${root}assets/site.css">
${printPageRules(args.sheets ?? [])}
</head>
<body${(args.sheets ?? []).length > 0 ? html` class="with-sheets"` : ''}>
<header class="site-header">
<p class="site-name"><a href="${root}index.html">${site.shopName}</a></p>
<nav aria-label="Site"><ul>
<li><a href="${root}index.html#families">Engine families</a></li>
<li><a href="${root}index.html#jets">Jet units</a></li>
<li><a href="${root}index.html#boats">Boats</a></li>
<li><a href="${root}index.html#books">Books</a></li>
</ul></nav>
${site.guides.length > 0 ? html`<nav aria-label="Guides" class="guides-nav"><p class="nav-label">Guides</p><ul>${site.guides.map(
    (g) => html`<li><a href="${root}${g.href}"${g.href === args.href ? html` aria-current="page"` : ''}>${g.navLabel}</a></li>`,
  )}</ul></nav>` : ''}
</header>
<main>
${problemsBlock(site)}
${cautionsBlock(site)}
${args.body}
</main>
<footer class="site-footer">
<p>${site.contactLine}</p>
<p>Data revision ${site.dataRevision}, issued ${site.dateIso}. Made with matchbook.</p>
</footer>
</body>
</html>
`.value;
}
