/**
 * Artwork at the sheet's edge: whatever touches the trim must run on to the bleed edge, so a cut a
 * little off the line leaves no white sliver, and nothing but crop marks reaches past the bleed
 * (common practice, no source). sceneProblems applies the rule to every sheet the sheet tests draw.
 */
import { describe, expect, it } from 'vitest';
import type { Paper } from '../../src/data/types.ts';
import { bleedBox, cropMarks, pageFrame } from '../../src/scene/paper.ts';
import { textNode } from '../../src/scene/text.ts';
import type { Scene, SceneNode } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { sceneProblems } from './sceneChecks.ts';

const PAPER: Paper = { size: 'A5', orientation: 'portrait', bleedMm: 3 };

function sceneWith(children: readonly SceneNode[], paper: Paper = PAPER): Scene {
  const frame = pageFrame({ paper });
  return {
    ...frame,
    title: 'Edge test',
    description: 'A band along the top edge',
    subject: 'test',
    keywords: [],
    dateIso: '2026-12-03',
    root: { type: 'group', children: [...cropMarks(frame), ...children] },
  };
}

describe('the bleed-edge rule of sceneProblems()', () => {
  const frame = pageFrame({ paper: PAPER });
  const trim = frame.trimBox;
  const bleed = bleedBox(frame);
  const band = (y: number, height: number): SceneNode => ({ type: 'rect', role: 'edge-band', x: bleed.x, y, width: bleed.width, height, fill: { colour: '#1f5f8b' } });

  it('accepts a band that runs from the bleed edge across the sheet, and crop marks outside the bleed', () => {
    expect(sceneProblems(sceneWith([band(bleed.y, 15)]), PAPER)).toEqual([]);
  });

  it('refuses a band that stops at the trim edge instead of running into the bleed', () => {
    expect(sceneProblems(sceneWith([band(trim.y, 12)]), PAPER)).toContain('stops short of the bleed edge (top): edge-band ');
  });

  it('refuses a band that runs past the bleed edge into the crop marks', () => {
    expect(sceneProblems(sceneWith([band(bleed.y - 2, 17)]), PAPER)).toContain('past the bleed edge (top): edge-band ');
  });

  it('never lets text leave the safe area, even to the bleed edge', () => {
    const text = textNode({ text: 'Edge', sizePt: 12, weight: 'bold', x: bleed.x, y: bleed.y + 3, role: 'edge-text' });
    expect(sceneProblems(sceneWith([text]), PAPER)).toContain('outside the safe area: edge-text Edge');
  });

  it('holds on every sheet kind printed with bleed and crop marks from the command line', () => {
    const paper: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 5, cropMarks: true };
    for (const kind of ['specSheet', 'consoleCard', 'upgradeSheet'] as const) {
      const scene = sheetScene({ kind, boatId: boat.id, paper }, { project, dateIso: '2026-12-03' });
      expect(scene.trimBox.x, kind).toBe(12);
      expect(sceneProblems(scene, paper), kind).toEqual([]);
    }
  });
});
