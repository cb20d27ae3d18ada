import { describe, expect, it } from 'vitest';
import { planSheets } from '../../src/site/planSheets.ts';
import { sceneKey } from '../../src/site/renderCache.ts';
import { loadProject } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';

async function demo(): Promise<Project> {
  const loaded = await loadProject('data');
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('\n'));
  return loaded.project;
}

describe('sceneKey()', () => {
  it('changes for the sheets of an edited boat and for no other sheet', async () => {
    const project = await demo();
    const [first, ...others] = project.boats;
    const edited: Project = { ...project, boats: [{ ...first, name: `${first.name} renamed` }, ...others] };
    const dateIso = '2026-01-01';
    for (const { request } of planSheets(project).sheets) {
      const before = sceneKey({ request, project, dateIso });
      const after = sceneKey({ request, project: edited, dateIso });
      const ofFirst = request.kind !== 'wallChart' && request.boatId === first.id;
      expect(after !== before, JSON.stringify(request).slice(0, 80)).toBe(ofFirst);
    }
  });

  it('changes for a repower comparison when the engine of one of its options is edited, not only the boat’s own', async () => {
    const project = await demo();
    const boat = project.boats.find((b) => b.repowerOptions?.some((o) => o.engineFamilyId !== b.engineFamilyId))!;
    const i = boat.repowerOptions!.findIndex((o) => o.engineFamilyId !== boat.engineFamilyId);
    const other = boat.repowerOptions![i];
    // A reload resolves the option to the edited variant (a new object), as the loader does after an edit.
    const edited: Project = { ...project, boats: project.boats.map((b) => (b === boat ? { ...b, repowerOptions: b.repowerOptions!.map((o, j) => (j === i ? { ...o, engine: { ...other.engine, conditionFactor: 0.9 } } : o)) } : b)) };
    const request = { kind: 'repowerSheet' as const, boatId: boat.id, paper: { size: 'A4' as const, orientation: 'portrait' as const, bleedMm: 0 } };
    expect(sceneKey({ request, project: edited, dateIso: '2026-01-01' })).not.toBe(sceneKey({ request, project, dateIso: '2026-01-01' }));
  });

  it('changes for every sheet when the site settings or the printed date change', async () => {
    const project = await demo();
    const renamedShop: Project = { ...project, site: { ...project.site, shopName: 'Another shop (demo)' } };
    for (const { request } of planSheets(project).sheets) {
      const key = sceneKey({ request, project, dateIso: '2026-01-01' });
      expect(sceneKey({ request, project: renamedShop, dateIso: '2026-01-01' })).not.toBe(key);
      expect(sceneKey({ request, project, dateIso: '2026-01-02' })).not.toBe(key);
      expect(sceneKey({ request, project, dateIso: '2026-01-01' })).toBe(key);
    }
  });
});
