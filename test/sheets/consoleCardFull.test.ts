import { describe, expect, it } from 'vitest';
import type { CruiseSetting } from '../../src/data/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { CARD_CAUTION_LINE } from '../../src/sheets/kit/cautions.ts';
import { boat, project, site } from './fixtures/demoProject.ts';
import { sceneProblems } from './sceneChecks.ts';
import { texts } from './sceneWalk.ts';

describe('a console card with more cruise settings than it can hold', () => {
  it('keeps every row and continues on the back (a second page of the same paper), keeping the print rules on both', () => {
    const cruise: CruiseSetting[] = Array.from({ length: 6 }, (_, i) => ({ kind: 'rpm', label: `Setting ${i + 1} upstream, loaded`, speedRpm: 3000 + 300 * i }));
    const extraCautions = ['Shop caution: check the intake grate, the steering cables and the reverse bucket linkage before every trip.'];
    const paper = { size: 'A6', orientation: 'portrait', bleedMm: 0 } as const;
    const scene = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper }, { project: { ...project, site: { ...site, extraCautions }, boats: [{ ...boat, cruise }] }, dateIso: '2026-11-02' });
    const pages = scenePages(scene);
    expect(pages.length).toBe(2);
    const all = pages.flatMap(texts);
    const rows = all.filter((t) => t.role === 'cruise-label' && t.text.startsWith('Setting'));
    expect(rows.map((r) => r.text)).toEqual(cruise.map((c) => c.label));
    expect(all.some((t) => t.role === 'cruise-hidden-note')).toBe(false);
    // The front keeps the range the owner reads at the helm; the back carries the shop's caution.
    expect(texts(pages[0]).some((t) => t.role === 'wot-range')).toBe(true);
    expect(texts(pages[1]).map((t) => t.text).join(' ')).toContain('reverse bucket linkage');
    expect(texts(pages[1]).find((t) => t.role === 'sheet-kind')?.text).toBe('CONSOLE CARD · page 2');
    // The front says the cautions in one line and where the rest are; the back has them all.
    expect(texts(pages[0]).filter((t) => t.role === 'caution-line').map((t) => t.text).join(' ')).toBe(CARD_CAUTION_LINE);
    expect(texts(pages[0]).some((t) => t.role === 'caution')).toBe(false);
    expect(texts(pages[1]).filter((t) => t.role === 'caution').length).toBeGreaterThanOrEqual(4);
    for (const page of pages) expect(sceneProblems(page, paper)).toEqual([]);
  });
});
