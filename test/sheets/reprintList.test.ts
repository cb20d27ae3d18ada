/**
 * The print-run checklist flows: a short list on one page with the full cautions, a list of a thousand
 * sheets (long titles and file names among them) over as many pages as it needs, every page keeping the
 * print rules and the built-in cautions whole at its foot, every item once and in order, nothing shortened.
 */
import { describe, expect, it } from 'vitest';
import type { Paper, SiteConfig } from '../../src/data/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { BUILT_IN_CAUTIONS } from '../../src/sheets/kit/cautions.ts';
import { reprintListScene, type ReprintListInput } from '../../src/sheets/reprintList.ts';
import { sceneProblems } from './sceneChecks.ts';
import { texts } from './sceneWalk.ts';

const site: SiteConfig = { shopName: 'Demo shop', contactLine: 'Demo contact line', powerUnitFirst: 'kW', speedUnit: 'kn', fuelUnit: 'L/h', dataRevision: 'demo rev 7', issueDate: '2026-01-01' };
const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const LETTER: Paper = { size: 'Letter', orientation: 'portrait', bleedMm: 0 };

const input = (count: number, paper: Paper): ReprintListInput => ({
  site,
  dateIso: '2026-01-01',
  paper,
  summary: 'Compared with the previous build of this output folder.',
  sections: [
    {
      heading: `Changed sheets to print (${count})`,
      items: Array.from({ length: count }, (_, i) => ({
        // Every seventh title is long enough to need a second line; file names are long too.
        title: i % 7 === 0 ? `Boat number ${i} with a rather long descriptive name for the fleet list: console card` : `Boat ${i}: spec sheet`,
        detail: `spec-boat-${i}${i % 5 === 0 ? '-card4x6-landscape-bleed' : ''}.pdf · A4 portrait`,
      })),
    },
    { heading: 'Removed sheets to take out of use (0)', items: [] },
  ],
  closing: '3 sheets did not change.',
});

describe('print-run checklist', () => {
  it('puts a short list on one page with the full cautions and no continuation line', () => {
    const scene = reprintListScene(input(5, A4));
    expect(scenePages(scene)).toHaveLength(1);
    expect(sceneProblems(scene, A4)).toEqual([]);
    const words = texts(scene).map((t) => t.text).join(' ');
    for (const item of input(5, A4).sections[0].items) {
      expect(words).toContain(item.title);
      expect(words).toContain(item.detail);
    }
    expect(words).toContain('Cautions');
    expect(words).toContain('Data revision demo rev 7');
    expect(texts(scene).filter((t) => t.role === 'caution-line')).toEqual([]);
    // An empty list gets no heading.
    expect(words).not.toContain('Removed sheets');
    // One tick box per item.
    const boxes = (function count(n: typeof scene.root): number {
      return n.children.reduce((k, c) => k + (c.type === 'group' ? count(c) : c.type === 'rect' && c.role === 'tick-box' ? 1 : 0), 0);
    })(scene.root);
    expect(boxes).toBe(5);
  });

  for (const paper of [A4, LETTER]) {
    it(`flows a thousand items over pages of ${paper.size}, each page within the print rules, every item once, in order, whole`, () => {
      const scene = reprintListScene(input(1000, paper));
      const pages = scenePages(scene);
      // About 40 lines a page on A4 at 9 pt: a thousand items (some on two lines) take well over 20.
      expect(pages.length).toBeGreaterThan(20);
      const titles: string[] = [];
      pages.forEach((page, i) => {
        expect(sceneProblems(page, paper), `page ${i + 1}`).toEqual([]);
        expect(page.widthMm).toBe(scene.widthMm);
        const line = texts(page).filter((t) => t.role === 'caution-line').map((t) => t.text).join(' ');
        expect(line, `page ${i + 1}`).toBe(`Cautions: ${BUILT_IN_CAUTIONS.join(' ')}`);
        titles.push(...texts(page).filter((t) => t.role === 'reprint-title').map((t) => t.text));
      });
      // A title on two lines is two texts: joined back, the titles read as given, none shortened.
      const joined = titles.join('\n').replace(/\n(?!Boat )/g, ' ').split('\n');
      expect(joined).toEqual(input(1000, paper).sections[0].items.map((it) => it.title));
      expect(titles.some((t) => t.endsWith('\u2026'))).toBe(false);
      const last = texts(pages.at(-1)!).map((t) => t.text).join(' ');
      for (const caution of BUILT_IN_CAUTIONS) expect(last.replace(/\s+/g, ' ')).toContain(caution.split(' ').slice(0, 6).join(' '));
      expect(texts(pages[1]).some((t) => t.text.includes('(continued)'))).toBe(true);
    });
  }
});
