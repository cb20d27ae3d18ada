/** The data-format page: where definitions live and the JSON Schemas that describe them. */
import { html } from '../html.ts';
import type { SiteView } from '../siteView.ts';
import { pageLayout } from './layout.ts';

/** Explains the data folders and links every JSON Schema copied into the site. */
export function dataFormatPage(site: SiteView): string {
  const root = '../';
  const body = html`<h1>Data format</h1>
<p>Everything on this site is computed from plain YAML files in one data folder. Each file is checked
against a JSON Schema and against the rules of the trade before anything is drawn; a problem is
reported with its file, line, column and field, and nothing is written until it is fixed.</p>
<ul>
<li><code>engines/</code>: one file per engine family, with its variants, full-throttle curves or a known
WOT point, and the maker's speed limits.</li>
<li><code>jets/</code>: one file per jet unit, with its impeller family and each impeller's rating.</li>
<li><code>boats/</code>: one file per boat: hull, fitted engine, jet and impeller, drive line, water,
site conditions, cruise settings and sea-trial records.</li>
<li><code>books/</code>: one file per chart book: the list of sheets to print together.</li>
<li><code>site.yaml</code>: shop name, contact line, units shown first, data revision and issue date.</li>
</ul>
${site.dataFormatDocHref ? html`<p>Every field, its unit and its default: <a href="${root}${site.dataFormatDocHref}">data-format.md</a>.</p>` : ''}
<h2>JSON Schemas</h2>
${site.schemas.length === 0
    ? html`<p>No schemas were found.</p>`
    : html`<ul class="links">${site.schemas.map((s) => html`<li><a href="${root}${s.href}">${s.label}</a></li>`)}</ul>`}
<p>Check a folder without building: <code>npx matchbook check --data DIR</code>.</p>
${site.resultsDocHref ? html`<p>The results downloads are described in <a href="${root}${site.resultsDocHref}">results.md</a>.</p>` : ''}`;
  return pageLayout({ site, title: 'Data format', root, body });
}
