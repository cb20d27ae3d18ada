/** A guide page: one Markdown guide of docs/, rendered, in the site's shell (navigation, cautions). */
import { html, trustedHtml, type SafeHtml } from '../html.ts';
import type { GuideView, SiteView } from '../siteView.ts';
import { pageLayout } from './layout.ts';

/** The JSON Schemas copied into the site, for the data-format guide. */
function schemasSection(site: SiteView, root: string): SafeHtml {
  return html`<section id="json-schemas" aria-labelledby="json-schemas-title">
<h2 id="json-schemas-title">JSON Schemas of this site</h2>
${site.schemas.length === 0
    ? html`<p>No schemas were found.</p>`
    : html`<ul class="links">${site.schemas.map((s) => html`<li><a href="${root}${s.href}">${s.label}</a></li>`)}</ul>`}
<p>Check a folder without building: <code>npx matchbook check --data DIR</code>.</p>
</section>`;
}

/** The page of one guide, at guides/<slug>/index.html. */
export function guidePage(site: SiteView, guide: GuideView): string {
  const root = '../../';
  // The guide's HTML comes from the package's own docs, rendered with raw HTML turned off.
  const body = html`<article class="guide">
${trustedHtml(guide.bodyHtml)}
</article>
${guide.withSchemas ? schemasSection(site, root) : ''}`;
  return pageLayout({ site, title: guide.title, root, body, href: guide.href });
}
