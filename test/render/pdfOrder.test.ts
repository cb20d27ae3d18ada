/**
 * A PDF's bytes must not depend on what was drawn before it in the same process (a build renders many
 * sheets and books in each worker, in an order that depends on the pool). The renderer shares one
 * opened font per weight between documents, so this checks that nothing drawn earlier leaks into a
 * later document: the same scene gives the same bytes after another scene as in a fresh module state.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { textNode } from '../../src/scene/text.ts';
import type { Scene } from '../../src/scene/types.ts';
import { sceneOf } from './scenes.ts';

const OPTIONS = { title: 'Order test', subject: 'Invented demo data', keywords: ['waterjet'], dateIso: '2024-05-01' };
const dir = mkdtempSync(join(tmpdir(), 'matchbook-pdf-order-'));

/**
 * In Source Sans 3 the curly double quotes, the straight double quote, the colon and the ellipsis are
 * composite glyphs built from the single quote, apostrophe and full-stop glyphs (read from the font's
 * glyf table). A first document that draws only the composites makes its subset pull in those
 * component glyphs without their characters.
 */
const COMPOSITES_ONLY: Scene = sceneOf({
  title: 'Composites only',
  children: [
    textNode({ text: '\u201CLight\u201D: 5600 rpm \u2026 "heavy"', sizePt: 14, weight: 'bold', x: 20, y: 40 }),
    textNode({ text: 'Cruise: 40 kW \u201Cmost likely\u201D \u2026', sizePt: 12, weight: 'regular', x: 20, y: 60 }),
  ],
});

/** The second document draws the component glyphs themselves: an apostrophe, a full stop, a quote. */
const COMPONENTS: Scene = sceneOf({
  title: 'Components',
  children: [
    textNode({ text: 'The boat\u2019s jet. It\u2018s \u2018fitted\u2019 and \'rated\'.', sizePt: 14, weight: 'bold', x: 20, y: 40 }),
    textNode({ text: 'Owner\u2019s card. Don\'t run past max rpm.', sizePt: 12, weight: 'regular', x: 20, y: 60 }),
  ],
});

type Render = typeof import('../../src/render/pdf.ts').renderPdf;

/** renderPdf from a module state no earlier test has touched (a fresh import of the renderer). */
async function freshRenderer(): Promise<Render> {
  vi.resetModules();
  return (await import('../../src/render/pdf.ts')).renderPdf;
}

function pdftotext(bytes: Uint8Array, name: string): string {
  const file = join(dir, `${name}.pdf`);
  writeFileSync(file, bytes);
  return execFileSync('/usr/bin/pdftotext', [file, '-'], { encoding: 'utf8' });
}

describe('renderPdf() output order', () => {
  it('gives the same bytes for a scene drawn after another scene as for one drawn first', async () => {
    const fresh = await (await freshRenderer())([COMPONENTS], OPTIONS);
    const render = await freshRenderer();
    await render([COMPOSITES_ONLY], OPTIONS);
    const after = await render([COMPONENTS], OPTIONS);
    expect(after.length).toBe(fresh.length);
    expect(Buffer.from(after).equals(Buffer.from(fresh))).toBe(true);
  });

  it('keeps apostrophes, quotes and full stops extractable whatever was drawn first', async () => {
    const render = await freshRenderer();
    await render([COMPOSITES_ONLY], OPTIONS);
    // poppler maps each glyph back to text through the subset's ToUnicode table.
    const text = pdftotext(await render([COMPONENTS], OPTIONS), 'components').replace(/\s+/g, ' ');
    expect(text).toContain('The boat\u2019s jet. It\u2018s \u2018fitted\u2019 and \'rated\'.');
    expect(text).toContain('Owner\u2019s card. Don\'t run past max rpm.');
    // And the first document keeps its own characters.
    const first = pdftotext(await render([COMPOSITES_ONLY], OPTIONS), 'composites').replace(/\s+/g, ' ');
    expect(first).toContain('\u201CLight\u201D: 5600 rpm \u2026 "heavy"');
  });
});
