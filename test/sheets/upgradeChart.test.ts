import { describe, expect, it } from 'vitest';
import type { Scene } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boat, project, site } from './fixtures/demoProject.ts';
import { leaves, scaleFromTicks } from './sceneWalk.ts';

/** The power range (kW, left axis in the fixture's kW) the plot frame spans, read back from its ticks. */
function plotPowerRange(scene: Scene): { heightMm: number; lowKw: number; highKw: number } {
  const frame = leaves(scene).find((n) => n.role === 'plot-frame');
  if (frame?.type !== 'rect') throw new Error('no plot frame');
  const toMm = scaleFromTicks(scene, 'left');
  const mmPerKw = toMm(1) - toMm(0);
  const at = (mm: number) => (mm - toMm(0)) / mmPerKw;
  return { heightMm: frame.height, lowKw: at(frame.y + frame.height), highKw: at(frame.y) };
}

const upgrade = (extraCautions: string[]) =>
  sheetScene({ kind: 'upgradeSheet', boatId: boat.id, paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } }, { project: { ...project, site: { ...site, extraCautions } }, dateIso: '2026-11-02' });

describe("the upgrade sheet's chart", () => {
  it('keeps its power range as tight when it shrinks below 70 mm (fewer ticks, not a wider range)', () => {
    const full = plotPowerRange(upgrade([]));
    const long = 'Shop caution: check the intake grate, the steering cables and the reverse bucket linkage before every trip, and after any grounding.';
    const squeezed = plotPowerRange(upgrade([long, long.replace('Shop', 'Second shop'), long.replace('Shop', 'Third shop')]));
    expect(squeezed.heightMm).toBeLessThan(full.heightMm - 10);
    expect(squeezed.heightMm).toBeLessThan(50);
    // Each range holds the same curves; rounding may widen either by at most a quarter of what was asked.
    expect(squeezed.highKw - squeezed.lowKw).toBeLessThan((full.highKw - full.lowKw) * 1.3);
    expect(squeezed.lowKw).toBeGreaterThan(0);
  });
});
