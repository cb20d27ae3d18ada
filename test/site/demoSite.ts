/**
 * The site view of a project without drawing a sheet (tests of pages and tables), and pages parsed back
 * with htmlparser2 into tables of cell texts and classes, so tests read what a browser would.
 */
import { DomUtils, parseDocument } from 'htmlparser2';
import { loadProject } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { siteResults } from '../../src/site/siteResults.ts';
import { siteView } from '../../src/site/siteViewBuild.ts';
import type { SiteView } from '../../src/site/siteView.ts';

/** The demo project from data/ (demo data: invented makers and boats). */
export async function demoProject(): Promise<Project> {
  const loaded = await loadProject('data');
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('\n'));
  return loaded.project;
}

/** The templates' view of a project, with no sheets drawn. */
export function viewOf(project: Project): SiteView {
  const plan = planSheets(project);
  const { boatResults, repowerResults, familyResults } = siteResults(project, plan);
  return siteView({ project, dateIso: '2026-11-02', plan, sheets: new Map(), boatResults, repowerResults, familyResults, schemas: [], guides: [] });
}

/** A cell as read back: its whitespace-folded text, classes, tag, scope, whether bold, and a link if any. */
export interface ParsedCell {
  readonly text: string;
  readonly tag: 'th' | 'td';
  readonly scope?: string;
  readonly classes: readonly string[];
  readonly strong: boolean;
  readonly href?: string;
}

export interface ParsedTable {
  readonly caption: string;
  readonly head: readonly ParsedCell[];
  readonly rows: readonly (readonly ParsedCell[])[];
  /** The cell of a row under the column headed exactly `header`. */
  cell(row: readonly ParsedCell[], header: string): ParsedCell;
}

const { findAll, findOne, getAttributeValue, textContent } = DomUtils;
type Element = ReturnType<typeof findAll>[number];

const fold = (s: string) => s.replace(/\s+/g, ' ').trim();
const isElement = (n: unknown): n is Element => typeof n === 'object' && n !== null && (n as Element).type === 'tag';

function parsedCell(e: Element): ParsedCell {
  const link = findOne((x) => x.name === 'a', e.children);
  const scope = getAttributeValue(e, 'scope');
  const href = link ? getAttributeValue(link, 'href') : undefined;
  return {
    text: fold(textContent(e)),
    tag: e.name as 'th' | 'td',
    ...(scope !== undefined ? { scope } : {}),
    classes: (getAttributeValue(e, 'class') ?? '').split(/\s+/).filter(Boolean),
    strong: findOne((x) => x.name === 'strong', e.children) !== null,
    ...(href !== undefined ? { href } : {}),
  };
}

/** Every table of a page, parsed. */
export function pageTables(html: string): ParsedTable[] {
  const doc = parseDocument(html);
  return findAll((e) => e.name === 'table', doc.children).map((t) => {
    const caption = findOne((e) => e.name === 'caption', t.children);
    const rowsOf = (section: string) => {
      const s = findOne((e) => e.name === section, t.children);
      return s ? findAll((e) => e.name === 'tr', s.children).map((tr) => tr.children.filter(isElement).map(parsedCell)) : [];
    };
    const head = rowsOf('thead')[0] ?? [];
    return {
      caption: caption ? fold(textContent(caption)) : '',
      head,
      rows: rowsOf('tbody'),
      cell(row, header) {
        const i = head.findIndex((h) => h.text === header);
        if (i < 0) throw new Error(`no column "${header}" in table "${caption ? textContent(caption) : ''}"; columns: ${head.map((h) => h.text).join(' | ')}`);
        return row[i];
      },
    };
  });
}

/** The one table whose caption starts with `start`. */
export function tableStarting(tables: readonly ParsedTable[], start: string): ParsedTable {
  const found = tables.filter((t) => t.caption.startsWith(start));
  if (found.length !== 1) throw new Error(`expected one table captioned "${start}…", found ${found.length}: ${tables.map((t) => t.caption).join(' / ')}`);
  return found[0];
}

/** The page's visible text, whitespace-folded. */
export function pageText(html: string): string {
  return fold(textContent(parseDocument(html)));
}

/** The element with this id, or null. */
export function byId(html: string, id: string): Element | null {
  return findOne((e) => getAttributeValue(e, 'id') === id, parseDocument(html).children);
}

/** The page's fact list: each <dt> with its <dd>, as parsed cells (class "warn" or "data-sheet" when marked). */
export function pageFacts(html: string): Map<string, ParsedCell> {
  const dl = findOne((e) => e.name === 'dl', parseDocument(html).children);
  const out = new Map<string, ParsedCell>();
  let term = '';
  for (const e of (dl?.children ?? []).filter(isElement)) {
    if (e.name === 'dt') term = fold(textContent(e));
    else if (e.name === 'dd') out.set(term, parsedCell(e));
  }
  return out;
}
