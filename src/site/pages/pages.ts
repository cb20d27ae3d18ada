/** The bodies of the site's pages; templates/ only pick the page and its data. */
import { html, trustedHtml, type SafeHtml } from '../html.ts';
import type { BoatView, BookView, FamilyView, LinkView, RepowerView, ReprintView, SiteView } from '../siteView.ts';
import { pageLayout } from './layout.ts';
import { facts, linkList, sheetFigure, table } from './parts.ts';

function section(id: string, title: string, body: SafeHtml): SafeHtml {
  return html`<section id="${id}" aria-labelledby="${id}-title"><h2 id="${id}-title">${title}</h2>${body}</section>`;
}

function resultsLink(site: SiteView, target: { resultsHref: string; csvLinks: readonly LinkView[] }, root: string): SafeHtml {
  const doc = site.resultsDocHref ? html` (fields and columns described in <a href="${root}${site.resultsDocHref}">the results guide</a>)` : '';
  const csv = target.csvLinks.map((l) => html`, <a href="${root}${l.href}" download>${l.label}</a>`);
  return html`<p class="results-downloads"><a href="${root}${target.resultsHref}" download>Results as JSON</a>${csv}${doc}.</p>`;
}

function none(list: readonly unknown[], text: string): SafeHtml | null {
  return list.length === 0 ? html`<p>${text}</p>` : null;
}

/** "A, B and 3 more": linked names. */
function namedList(named: { links: readonly LinkView[]; more: number }, root: string): SafeHtml {
  const items = named.links.map((l, i) => html`${i === 0 ? '' : i === named.links.length - 1 && named.more === 0 ? ' and ' : ', '}<a href="${root}${l.href}">${l.label}</a>`);
  return html`${items}${named.more > 0 ? html` and ${named.more} more` : ''}`;
}

/** What this build changed against the previous build of the folder, with the print-run checklist. */
function reprintSection(r: ReprintView, root: string): SafeHtml {
  const changed = r.changed.links.length > 0 ? html`<p>Changed: ${namedList(r.changed, root)}.</p>` : null;
  const reissued = r.revisionAndDateOnly > 0 ? html`<p>${r.revisionAndDateOnly} ${r.changed.links.length > 0 ? 'other ' : ''}${r.revisionAndDateOnly === 1 ? 'sheet differs' : 'sheets differ'} only in the issue date and data revision printed on ${r.revisionAndDateOnly === 1 ? 'it' : 'them'}.</p>` : null;
  const added = r.added.links.length > 0 ? html`<p>New: ${namedList(r.added, root)}.</p>` : null;
  return section('changes', r.heading, html`<p>${r.summary}</p>${changed}${added}${reissued}
<p><a href="${root}${r.checklistHref}" download>Print-run checklist (PDF)</a>, <a href="${root}${r.jsonHref}" download>the same list as JSON</a>.</p>`);
}

/** The front page: summaries of engine families and boats, the jet units' impeller tables, and books. */
export function indexPage(site: SiteView): string {
  const root = '';
  const body = html`<h1>${site.shopName}: impeller matching charts</h1>
<p class="lede">Predicted wide-open-throttle (WOT) operating points of waterjet impellers on marine engines,
as wall charts for the shop, spec sheets for dealers and console cards for owners.</p>
${site.reprint ? reprintSection(site.reprint, root) : ''}
${section('families', 'Engine families', html`${none(site.families, 'No engine families defined.') ?? table(site.familySummary, root)}`)}
${section('jets', 'Jet units', html`${none(site.jets, 'No jet units defined.')}${site.jets.map(
    (j) => html`<h3 id="jet-${j.id}">${j.label} (${j.maker})</h3>${table(j.table, root)}`,
  )}`)}
${section('boats', 'Boats', html`${none(site.boats, 'No boats defined.') ?? table(site.boatSummary, root)}`)}
${section('books', 'Chart books', html`${none(site.books, 'No books defined.')}<ul class="links">${site.books.map(
    (b) => html`<li><a href="${root}${b.href}">${b.title}</a> (for the ${b.audience}, ${b.sheets.length} sheets,
<a href="${root}${b.pdfHref}" download>PDF</a>)</li>`,
  )}</ul>`)}
${site.guides.length > 0 ? html`<p>Guides: ${site.guides.map((g, i) => html`${i > 0 ? ', ' : ''}<a href="${root}${g.href}">${g.navLabel}</a>`)}.</p>` : ''}`;
  return pageLayout({ site, title: 'Impeller matching charts', root, body });
}

/** One engine family: wall charts inline, results tables, downloads. */
export function familyPage(site: SiteView, family: FamilyView): string {
  const root = '../../';
  const body = html`<h1>${family.label}</h1>
${facts(family.facts)}${family.notes ? html`<p>${family.notes}</p>` : ''}
${section('charts', 'Wall charts', html`${none(family.charts, 'No wall charts for this family.')}${family.charts.map((s) => sheetFigure(s, root))}`)}
${section('results', 'Predicted operating points', html`${family.tables.map((t) => table(t, root))}
${resultsLink(site, family, root)}`)}
${section('boats', 'Boats with this engine family', html`${none(family.boats, 'No boats use this family.')}${linkList(family.boats, root)}`)}`;
  return pageLayout({ site, title: family.label, root, body, sheets: family.charts });
}

/** One boat: spec sheet and console card inline, tables, downloads. */
export function boatPage(site: SiteView, boat: BoatView): string {
  const root = '../../';
  const body = html`<h1>${boat.name}</h1>
${facts(boat.facts, root)}${boat.notes ? html`<p>${boat.notes}</p>` : ''}
${linkList(boat.links, root)}
${section('results', 'Predictions', html`${boat.tables.map((t) => table(t, root))}
${resultsLink(site, boat, root)}`)}
${boat.calibration ? section('trials', boat.calibration.heading, html`${boat.calibration.trials ? table(boat.calibration.trials, root) : ''}${boat.calibration.paragraphs.map((p) => html`<p>${p}</p>`)}`) : ''}
${boat.trend ? section('trend', boat.trend.heading, html`${boat.trend.plots.map((p) => html`<figure class="trend">${trustedHtml(p.svg)}<figcaption>${p.caption}</figcaption></figure>`)}${boat.trend.paragraphs.map((p) => html`<p>${p}</p>`)}`) : ''}
${section('sheets', 'Sheets', html`${boat.sheets.map((s) => sheetFigure(s, root))}`)}`;
  return pageLayout({ site, title: boat.name, root, body, sheets: boat.sheets });
}

/** A boat's repower comparison: the sentence, the options side by side, the sheet to print. */
export function repowerPage(site: SiteView, r: RepowerView): string {
  const root = '../../../';
  const body = html`<h1>${r.boatName}: repower comparison</h1>
<p class="lede"><strong>${r.sentence}</strong></p>
<p>Back to <a href="${root}${r.boatHref}">${r.boatName}</a>.</p>
${section('options', 'The options side by side', html`${table(r.table, root)}<p>${r.note}</p>
<p class="results-downloads"><a href="${root}${r.resultsHref}" download>Results as JSON</a> (the comparison is its <code>repower</code> field).</p>`)}
${section('sheets', 'Sheet', html`${r.sheets.map((s) => sheetFigure(s, root))}`)}`;
  return pageLayout({ site, title: `${r.boatName}: repower comparison`, root, body, sheets: r.sheets });
}

/** One chart book: its PDF and every sheet in order. */
export function bookPage(site: SiteView, book: BookView): string {
  const root = '../../';
  const body = html`<h1>${book.title}</h1>
<p>A book for the ${book.audience} of ${book.sheets.length} sheets.
<a href="${root}${book.pdfHref}" download>Download the whole book as one PDF</a> (one bookmark per sheet).</p>
${section('sheets', 'Sheets', html`${book.sheets.map((s) => sheetFigure(s, root))}`)}`;
  return pageLayout({ site: { ...site, cautions: book.cautions }, title: book.title, root, body, sheets: book.sheets });
}
