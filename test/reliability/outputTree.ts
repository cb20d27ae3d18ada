/** Reading a built output folder back: every file's bytes, the text a reader sees, the PDF's text per page. */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

/** Every file under root by relative path ("sheets/spec-x.svg"), in name order. */
export function tree(root: string): Map<string, Buffer> {
  const files = new Map<string, Buffer>();
  const walk = (dir: string): void => {
    for (const name of readdirSync(dir).sort()) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else files.set(relative(root, path).replace(/\\/g, '/'), readFileSync(path));
    }
  };
  walk(root);
  return files;
}

/** The text of each page of a PDF, by poppler's pdftotext (pages end with a form feed). */
export function pdfPages(path: string): string[] {
  const r = spawnSync('pdftotext', ['-enc', 'UTF-8', path, '-'], { encoding: 'utf8', maxBuffer: 1 << 26 });
  if (r.status !== 0) throw new Error(`pdftotext failed on ${path}: ${r.stderr}`);
  return r.stdout.split('\f').slice(0, -1);
}

/** Whitespace folded to single spaces, so text wrapped across lines reads as one sentence. */
export const folded = (text: string): string => text.replace(/\s+/g, ' ').trim();

/** The text content of markup (HTML or SVG) with entities decoded: what a reader or screen reader gets. */
export function visibleText(markup: string): string {
  const noScripts = markup.replace(/<(script|style)\b[^>]*>[\s\S]*?<\/\1>/gi, ' ');
  return folded(decodeEntities(noScripts.replace(/<[^>]*>/g, ' ')));
}

/** Decode the five XML entities and numeric references (HTML pages use no other named ones in text we check). */
export function decodeEntities(text: string): string {
  const named: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: '\u00a0' };
  return text.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, name: string) => {
    if (name[0] === '#') return String.fromCodePoint(name[1] === 'x' || name[1] === 'X' ? parseInt(name.slice(2), 16) : Number(name.slice(1)));
    return named[name] ?? whole;
  });
}
