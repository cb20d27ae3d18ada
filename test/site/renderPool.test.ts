/**
 * The render pool gives back every page of a sheet that continues on further pages: the worker renders
 * them, and the pool hands their SVG and PNG on with the first page's files (a build once lost them and
 * stopped while writing the site's pages).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { scenePages } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { createRenderPool } from '../../src/site/renderPool.ts';
import { renderSheetNow } from '../../src/site/renderSheet.ts';
import { demoProject } from '../sheets/fixtures/boatVariation.ts';
import { stressProject } from '../sheets/fixtures/stressProjects.ts';

const pool = createRenderPool({ size: 1 });
afterAll(() => pool.close());

describe('render pool', () => {
  it('returns the SVG and PNG of every further page, the same as rendering on the main thread', { timeout: 120_000 }, async () => {
    const project = stressProject(await demoProject(), 'ALL');
    const scene = sheetScene({ kind: 'specSheet', boatId: project.boats[0].id, paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } }, { project, dateIso: '2026-12-03' });
    const pages = scenePages(scene).length;
    expect(pages).toBeGreaterThan(1);
    const pooled = await pool.render(scene);
    const here = await renderSheetNow(scene);
    expect(pooled.morePages?.length).toBe(pages - 1);
    expect(pooled.morePages?.map((p) => p.svg)).toEqual(here.morePages?.map((p) => p.svg));
    // PNG files start with the PNG signature (ISO/IEC 15948, 5.2: 89 50 4E 47 0D 0A 1A 0A).
    for (const page of pooled.morePages ?? []) expect([...page.png.slice(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(pooled.morePages?.[0].svg).toContain('page 2');
  });
});
