/**
 * The spec sheet speaks to a buyer: top speed and full-throttle rpm first, whether the impeller suits the
 * engine, cruising speed and fuel, the other impellers in plain words, and no speed below planing speed.
 */
import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import type { Boat, Paper, Project } from '../../src/data/types.ts';
import type { Scene, TextNode } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { alternativeWords, buyerAnswer } from '../../src/sheets/buyerWords.ts';
import { rpmText } from '../../src/sheets/kit/format.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { texts } from './sceneWalk.ts';

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const specOf = (b: Boat): Scene => sheetScene({ kind: 'specSheet', boatId: b.id, paper: A4 }, { project: { ...project, boats: [b] } as Project, dateIso: '2026-11-02' });
const textOf = (scene: Scene, role: string) => texts(scene).filter((t: TextNode) => t.role === role).map((t) => t.text).join(' ');

describe('the spec sheet for a buyer', () => {
  const result = analyseBoat({ boat, project });
  const fitted = result.alternatives.find((a) => a.fitted === 'yes')!;

  it('leads with the top speed and full-throttle rpm of the fitted impeller, then whether it suits the engine', () => {
    const scene = specOf(boat);
    expect(textOf(scene, 'buyer-headline')).toBe(`Top speed about ${Math.round(fitted.topSpeedKn!)} kn at full throttle, ${rpmText(result.wot.nominal.speedRpm)} rpm`);
    const answer = textOf(scene, 'buyer-answer');
    expect(answer).toMatch(new RegExp(`^Impeller ${fitted.label} (suits|is a little light for|is too heavy for|is too light for) this engine`));
    expect(answer).toContain(`${rpmText(result.limits.windowLowRpm)}–${rpmText(result.limits.windowHighRpm)} rpm`);
    // No lab-report words in the answer: those go to the technical note at the end.
    expect(answer).not.toMatch(/standard error|±|handbook|Crouch/);
    expect(textOf(scene, 'technical-note')).toMatch(/± 5 %.*Crouch/s);
  });

  it('gives the fastest cruise setting with a speed, its rpm and its fuel', () => {
    const fastest = [...result.cruise].filter((c) => c.speedKn !== undefined && c.status === 'ok').sort((a, b) => b.speedKn! - a.speedKn!)[0];
    expect(buyerAnswer(result, 'kn').cruise).toBe(`Cruising (${fastest.label}): about ${Math.round(fastest.speedKn!)} kn at ${rpmText(fastest.speedRpm!)} rpm, about ${Math.round(fastest.fuelLPerH!)} L of fuel an hour.`);
  });

  it('says each other impeller is heavier or lighter by its rating, and moves rpm the way the cube law says', () => {
    for (const a of alternativeWords(result)) {
      if (a.fitted) continue;
      const rating = result.alternatives.find((x) => x.impellerId === a.impellerId)!.ratingKw;
      // A heavier impeller absorbs more at a given rpm, so WOT rpm falls (DOMAIN.md, affinity laws).
      if (rating > fitted.ratingKw) expect(a.words).toMatch(/heavier: (about \d+ rpm lower|about the same rpm)/);
      else expect(a.words).toMatch(/lighter: (about \d+ rpm higher|about the same rpm)/);
    }
    const ids = result.alternatives.map((a) => a.impellerId);
    // Gannet's impellers a–e by rating, b fitted: a is one step lighter, d two steps heavier.
    expect(alternativeWords(result)[ids.indexOf('a')].words).toMatch(/^one step lighter/);
    expect(alternativeWords(result)[ids.indexOf('d')].words).toMatch(/^two steps heavier/);
  });

  it('says a cruise point below planing speed is not estimated instead of giving a planing-formula speed', () => {
    // 6 kW for a 1250 kg skiff is a trolling setting, far below its planing speed (about 19 kn, Fn∇ = 3).
    const slow: Boat = { ...boat, cruise: [{ kind: 'power', label: 'Trolling', powerKw: 6 }, ...boat.cruise] };
    const r = analyseBoat({ boat: slow, project: { ...project, boats: [slow] } as Project });
    expect(r.cruise[0].speedBasis).toBe('belowPlaning');
    const cells = texts(specOf(slow)).filter((t) => t.role === 'table-cell').map((t) => t.text);
    const row = cells.indexOf('Trolling');
    expect(row).toBeGreaterThanOrEqual(0);
    expect(cells.slice(row, row + 7)).toContain('below planing speed: speed not estimated');
    expect(textOf(specOf(slow), 'technical-note')).toMatch(/Below about 19 kn this hull is not taken as planing/);
  });
});
