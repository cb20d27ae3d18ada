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
