/** Building blocks of pages: tables, fact lists, sheet figures with their downloads. */
import { html, trustedHtml, type SafeHtml } from '../html.ts';
import type { CellView, LinkView, SheetView, TableView } from '../siteView.ts';

/**
 * A cell's content: a link (href relative to the site root), a warning in bold words, a data-sheet figure
 * in softer ink, or plain text. The cell's own class carries the warning bar (see cellClass).
 */
export function cellContent(cell: CellView, root: string): SafeHtml {
  if (typeof cell === 'string') return html`${cell}`;
  const inner = cell.href !== undefined ? html`<a href="${root}${cell.href}">${cell.text}</a>` : html`${cell.text}`;
  return cell.mark === 'warn' ? html`<strong>${inner}</strong>` : inner;
}

/** Classes of a cell: "num", "nowrap" and "words" by column, "warn" or "data-sheet" for marked cells. */
function cellClass(cell: CellView, column: { numeric: boolean; nowrap?: boolean; words?: boolean }): SafeHtml | '' {
  const mark = typeof cell === 'string' ? '' : cell.mark === 'warn' ? 'warn' : cell.mark === 'dataSheet' ? 'data-sheet' : '';
  const names = [column.numeric ? 'num' : '', column.nowrap ? 'nowrap' : '', column.words ? 'words' : '', mark].filter((n) => n !== '');
  return names.length === 0 ? '' : html` class="${names.join(' ')}"`;
}

/** A real HTML table with a caption, column headers and row headers; root leads from the page back to the site root. */
export function table(t: TableView, root = ''): SafeHtml {
  const num = (i: number) => t.numeric.includes(i);
  const column = (i: number) => ({ numeric: num(i), nowrap: t.nowrap?.includes(i), words: t.words?.includes(i) });
  return html`<div class="table-wrap"><table${t.layout ? html` class="${t.layout}"` : ''}>
<caption>${t.caption}</caption>
<thead><tr>${t.head.map((h, i) => html`<th scope="col"${num(i) ? html` class="num"` : ''}>${h}</th>`)}</tr></thead>
<tbody>
${t.rows.map(
  (row) =>
    html`<tr>${row.map((cell, i) =>
      i === 0
        ? html`<th scope="row"${cellClass(cell, { numeric: false })}>${cellContent(cell, root)}</th>`
        : html`<td${cellClass(cell, column(i))}>${cellContent(cell, root)}</td>`,
    )}</tr>
`,
)}</tbody>
</table>${t.note ? html`<p class="table-note">${t.note}</p>` : ''}</div>`;
}

/** A definition list of label/value pairs; marked values as in tables. */
export function facts(pairs: readonly (readonly [string, CellView])[], root = ''): SafeHtml {
  return html`<dl class="facts">${pairs.map(([k, v]) => html`<dt>${k}</dt><dd${cellClass(v, { numeric: false })}>${cellContent(v, root)}</dd>`)}</dl>`;
}

/** A list of links. */
export function linkList(links: readonly LinkView[], root: string): SafeHtml {
  return html`<ul class="links">${links.map((l) => html`<li><a href="${root}${l.href}">${l.label}</a></li>`)}</ul>`;
}

/** The three download links of one sheet. */
export function downloads(sheet: SheetView, root: string): SafeHtml {
  const d = sheet.downloads;
  return html`<p class="downloads">Download ${sheet.title}:
<a href="${root}${d.pdf}" download>PDF</a>
<a href="${root}${d.svg}" download>SVG</a>
<a href="${root}${d.png}" download>PNG (150 dpi)</a>${(sheet.morePages ?? []).map((p, i) => html`
<a href="${root}${p.downloads.svg}" download>SVG page ${i + 2}</a>
<a href="${root}${p.downloads.png}" download>PNG page ${i + 2}</a>`)}</p>`;
}

/**
 * One sheet inline: the SVG is the chart, its <desc> and the visible text alternative below carry
 * the same description for people who cannot see it. Printing shows only these figures, each on
 * a page of its own paper size.
 */
export function sheetFigure(sheet: SheetView, root: string): SafeHtml {
  const descId = `desc-${sheet.slug}`;
  return html`<figure class="sheet" id="sheet-${sheet.slug}" data-sheet-kind="${sheet.kind}" style="page: ${sheet.printPage}" aria-describedby="${descId}">
<div class="sheet-art">${trustedHtml(sheet.svgInline())}</div>
${(sheet.morePages ?? []).map((p) => html`<div class="sheet-art sheet-page">${trustedHtml(p.svgInline())}</div>`)}
<figcaption><span class="sheet-title">${sheet.title}</span>
<details class="text-alternative"><summary>Chart in words</summary><p id="${descId}">${sheet.description}</p></details>
${downloads(sheet, root)}</figcaption>
</figure>`;
}
