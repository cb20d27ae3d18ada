import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import type { Project } from '../../src/data/types.ts';
import { boat, project } from '../sheets/fixtures/demoProject.ts';

describe('analyseBoat()', () => {
  it('answers the same boat and project with the one result it computed, and a changed boat with a new one', () => {
    const first = analyseBoat({ boat, project });
    expect(analyseBoat({ boat, project })).toBe(first);
    // A changed boat (more drive-line loss) is a new object, so it is analysed afresh: the engine must
    // deliver more power to turn the same impeller, so it settles lower (absorption ÷ efficiency).
    const changed = { ...boat, driveLine: { ...boat.driveLine, efficiency: boat.driveLine.efficiency * 0.9 } };
    const second = analyseBoat({ boat: changed, project: { ...project, boats: [changed] } as Project });
    expect(second).not.toBe(first);
    expect(second.wot.nominal.speedRpm).toBeLessThan(first.wot.nominal.speedRpm);
    expect(second).toEqual(analyseBoat({ boat: changed, project: { ...project, boats: [changed] } as Project }));
  });
});
