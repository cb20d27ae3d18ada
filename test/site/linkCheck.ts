/**
 * A link checker for a built site on disk: every `href` and `src` of every .html page (and every
 * `url()` of every .css file) that points inside the site must name a file of the folder, and a
 * `#fragment` on a page must name an id (or an anchor's name) on that page. The site works opened from
 * disk, so a link to a folder is broken too. Web addresses (any scheme, or `//host`) are outside the site
 * and not followed.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, posix, relative, sep } from 'node:path';
import { DomUtils, parseDocument } from 'htmlparser2';

const { findAll, getAttributeValue } = DomUtils;

/** Attributes that name another file; xlink:href is SVG 1.1's spelling of href. */
const LINK_ATTRS = ['href', 'src', 'xlink:href'] as const;

export interface LinkReport {
  /** Internal references checked (links, sources, stylesheet urls), counted once per occurrence. */
  readonly checked: number;
  /** Pages read. */
  readonly pages: number;
  /** One line per broken reference: `page: attr="value" → what is missing`. */
  readonly broken: readonly string[];
}

function filesUnder(root: string): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir).sort()) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else out.push(relative(root, path).split(sep).join('/'));
    }
  };
  walk(root);
  return out;
}

const isOutside = (ref: string) => /^[a-z][a-z0-9+.-]*:|^\/\//i.test(ref);

/** Every id and anchor name of a page. */
function anchorsOf(html: string): Set<string> {
  const doc = parseDocument(html);
  const ids = new Set<string>();
  for (const e of findAll((x) => getAttributeValue(x, 'id') !== undefined || (x.name === 'a' && getAttributeValue(x, 'name') !== undefined), doc.children)) {
    const id = getAttributeValue(e, 'id');
    if (id !== undefined) ids.add(id);
    const name = e.name === 'a' ? getAttributeValue(e, 'name') : undefined;
    if (name !== undefined) ids.add(name);
  }
  return ids;
}

/** Checks every internal reference of the site in `root`. */
export function checkLinks(root: string): LinkReport {
  const files = filesUnder(root);
  const present = new Set(files);
  const anchors = new Map<string, Set<string>>();
  const anchorsIn = (page: string) => {
    let found = anchors.get(page);
    if (!found) {
      found = anchorsOf(readFileSync(join(root, page), 'utf8'));
      anchors.set(page, found);
    }
    return found;
  };
  const broken: string[] = [];
  let checked = 0;

  const check = (from: string, what: string, ref: string) => {
    const value = ref.trim();
    if (value === '' || isOutside(value)) return;
    checked += 1;
    const hashAt = value.indexOf('#');
    const pathPart = (hashAt < 0 ? value : value.slice(0, hashAt)).replace(/\?.*$/, '');
    const fragment = hashAt < 0 ? '' : decodeURIComponent(value.slice(hashAt + 1));
    let target: string;
    if (pathPart === '') target = from;
    else {
      const decoded = decodeURIComponent(pathPart);
      const joined = decoded.startsWith('/') ? posix.normalize(decoded.slice(1)) : posix.join(posix.dirname(from), decoded);
      // A folder ("guides/") is not a file: opened from disk it shows a listing or nothing, so it counts as broken.
      target = joined;
    }
    if (target.startsWith('../') || target === '..') {
      broken.push(`${from}: ${what}="${ref}" → leaves the site`);
      return;
    }
    if (!present.has(target)) {
      broken.push(`${from}: ${what}="${ref}" → no file ${target}`);
      return;
    }
    if (fragment !== '' && target.endsWith('.html') && !anchorsIn(target).has(fragment)) {
      broken.push(`${from}: ${what}="${ref}" → no id "${fragment}" in ${target}`);
    }
  };

  const pages = files.filter((f) => f.endsWith('.html'));
  for (const page of pages) {
    const doc = parseDocument(readFileSync(join(root, page), 'utf8'));
    for (const e of findAll((x) => LINK_ATTRS.some((a) => x.attribs[a] !== undefined), doc.children)) {
      for (const attr of LINK_ATTRS) {
        const value = e.attribs[attr];
        if (value !== undefined) check(page, attr, value);
      }
    }
  }
  for (const sheet of files.filter((f) => f.endsWith('.css'))) {
    for (const m of readFileSync(join(root, sheet), 'utf8').matchAll(/url\(\s*(['"]?)([^'")]+)\1\s*\)/g)) check(sheet, 'url', m[2]);
  }
  return { checked, pages: pages.length, broken };
}
