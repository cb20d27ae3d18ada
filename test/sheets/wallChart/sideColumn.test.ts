/**
 * The wall chart's side column names the boats that pair its engine family with its jet; a fleet of a
 * thousand such boats (generated, demo data) must still lay out, with three names and a count.
 */
import { describe, expect, it } from 'vitest';
import type { Boat, Project, SheetRequest } from '../../../src/data/types.ts';
import { defaultWallCharts } from '../../../src/analysis/index.ts';
import { sheetScene } from '../../../src/sheets/index.ts';
import { boatList, MAX_NAMED_BOATS } from '../../../src/sheets/wallChart/sideColumn.ts';
import { boat, project } from '../fixtures/demoProject.ts';
import { texts } from '../sceneWalk.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

/** n copies of the demo boat, ids (zero-padded, so id order is number order) and names numbered (invented fleet). */
function fleet(n: number): Boat[] {
  return Array.from({ length: n }, (_, i) => ({ ...boat, id: `fleet-${String(i + 1).padStart(4, "0")}`, name: `Fleet boat ${i + 1} (demo skiff)` }));
}

describe('boatList()', () => {
  it('names one, two and three boats in full, without their bracketed descriptions', () => {
    expect(boatList(fleet(1))).toBe('Fleet boat 1');
    expect(boatList(fleet(2))).toBe('Fleet boat 1 and Fleet boat 2');
    expect(boatList(fleet(MAX_NAMED_BOATS))).toBe('Fleet boat 1, Fleet boat 2 and Fleet boat 3');
  });

  it('names the first three boats and counts the rest past three', () => {
    expect(boatList(fleet(4))).toBe('Fleet boat 1, Fleet boat 2, Fleet boat 3 and 1 more');
    expect(boatList(fleet(1000))).toBe('Fleet boat 1, Fleet boat 2, Fleet boat 3 and 997 more');
  });
});

describe('wallChartScene() with 1,000 boats on one pairing', () => {
  it('lays out and says how many more boats share the drive line', () => {
    const big: Project = { ...project, boats: fleet(1000) };
    const request = defaultWallCharts(big)[0] as WallChartRequest;
    const scene = sheetScene(request, { project: big, dateIso: '2026-11-02' });
    const conditions = texts(scene).filter((t) => t.role === 'conditions').map((t) => t.text).join(' ');
    expect(conditions).toContain('(as fitted in Fleet boat 1, Fleet boat 2, Fleet boat 3 and 997 more).');
    expect(conditions).not.toContain('Fleet boat 4');
  });
});
