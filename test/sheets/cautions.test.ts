import { describe, expect, it } from 'vitest';
import type { Paper, SheetRequest } from '../../src/data/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { BUILT_IN_CAUTIONS, cautionsFor, sheetScene } from '../../src/sheets/index.ts';
import { boat, project, site } from './fixtures/demoProject.ts';
import { texts } from './sceneWalk.ts';

const extra = ['Check the intake grate for weed before each trip.', 'Log every impeller change in the service book.'];
const shop = { ...site, extraCautions: extra };
const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };

describe('cautionsFor() always keeps the built-in safety points', () => {
  it('returns the built-in cautions alone for a shop with none of its own', () => {
    expect(cautionsFor(site)).toEqual(BUILT_IN_CAUTIONS);
  });

  it("adds a shop's cautions after the built-in ones, in the shop's order", () => {
    expect(cautionsFor(shop)).toEqual([...BUILT_IN_CAUTIONS, ...extra]);
  });

  it('prints a shop caution that repeats a built-in one word for word only once', () => {
    const repeat = { ...site, extraCautions: [` ${BUILT_IN_CAUTIONS[1].toUpperCase()}`, extra[0]] };
    expect(cautionsFor(repeat)).toEqual([...BUILT_IN_CAUTIONS, extra[0]]);
  });

  it('names the three safety points: sea trial, maximum rpm, a qualified marine technician', () => {
    const all = cautionsFor(shop).join(' ');
    expect(all).toMatch(/sea trial/);
    expect(all).toMatch(/maker's maximum rpm/);
    expect(all).toMatch(/qualified marine technician following the engine and jet makers' instructions and local regulations/);
  });
});

describe.each<SheetRequest>([
  { kind: 'specSheet', boatId: boat.id, paper: A4 },
  { kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 0 } },
  { kind: 'upgradeSheet', boatId: boat.id, paper: A4 },
])('a $kind for a shop with its own cautions', (request) => {
  it('prints the built-in cautions first, then the shop\'s', () => {
    const scene = sheetScene(request, { project: { ...project, site: shop }, dateIso: '2026-11-02' });
    // Over every page: a full card continues its cautions on the back.
    const printed = scenePages(scene).flatMap((page) => texts(page).filter((t) => t.role === 'caution').map((t) => t.text)).join(' ');
    const at = [...BUILT_IN_CAUTIONS, ...extra].map((c) => printed.indexOf(c.split(' ').slice(0, 4).join(' ')));
    expect(at.every((i) => i >= 0), printed).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
  });
});
