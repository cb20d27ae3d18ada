import { describe, expect, it } from 'vitest';
import type { CruiseSetting } from '../../src/data/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boat, project, site } from './fixtures/demoProject.ts';
import { sceneProblems } from './sceneChecks.ts';
import { texts } from './sceneWalk.ts';

describe('a console card with more cruise settings than it can hold', () => {
  it('keeps the first rows, counts the rest in a note, and keeps the print rules', () => {
    const cruise: CruiseSetting[] = Array.from({ length: 6 }, (_, i) => ({ kind: 'rpm', label: `Setting ${i + 1} upstream, loaded`, speedRpm: 3000 + 300 * i }));
    const extraCautions = ['Shop caution: check the intake grate, the steering cables and the reverse bucket linkage before every trip.'];
    const paper = { size: 'A6', orientation: 'portrait', bleedMm: 0 } as const;
    const scene = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper }, { project: { ...project, site: { ...site, extraCautions }, boats: [{ ...boat, cruise }] }, dateIso: '2026-11-02' });
    const rows = texts(scene).filter((t) => t.role === 'table-cell' && t.text.startsWith('Setting'));
    const note = texts(scene).find((t) => t.role === 'cruise-hidden-note');
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.length).toBeLessThan(6);
    expect(note?.text).toBe(`${6 - rows.length} more cruise setting${6 - rows.length > 1 ? 's' : ''} on the spec sheet.`);
    expect(sceneProblems(scene, paper)).toEqual([]);
  });
});
