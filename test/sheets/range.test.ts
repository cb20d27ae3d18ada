/**
 * Time and range at each cruise setting, from the tank and a reserve (a tenth of the tank unless the boat
 * says otherwise; common practice, no source): worked here independently from the analysis's own fuel
 * flow and speed — hours = tank × (1 − reserve) / fuel flow, distance = hours × speed — and found on the
 * spec sheet, the console card and in the buyer's words.
 */
import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import type { Boat, Paper } from '../../src/data/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { texts } from './sceneWalk.ts';

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const CARD: Paper = { size: 'A6', orientation: 'landscape', bleedMm: 0 };
const withTank = (extra: Partial<Boat>): Boat => ({ ...boat, fuelTankL: 120, ...extra });
const ctxOf = (b: Boat) => ({ project: { ...project, boats: [b] }, dateIso: '2026-11-02' });

describe('time and range at each cruise setting', () => {
  it('keeps 10 % of the tank by default and the boat’s own reserve when it gives one', () => {
    for (const [b, reserve] of [[withTank({}), 0.1], [withTank({ fuelReservePct: 33 }), 0.33]] as const) {
      const r = analyseBoat({ boat: b, project: ctxOf(b).project });
      expect(r.estimates.fuelReservePct).toBeCloseTo(reserve * 100, 9);
      const planing = r.cruise.filter((c) => c.speedKn !== undefined && c.fuelLPerH !== undefined);
      expect(planing.length).toBeGreaterThan(0);
      for (const c of planing) {
        const hours = (120 * (1 - reserve)) / c.fuelLPerH!;
        expect(c.hoursWithReserve).toBeCloseTo(hours, 9);
        expect(c.rangeWithReserveNm).toBeCloseTo(hours * c.speedKn!, 9);
      }
      // Below planing speed there is no speed, so no range either.
      for (const c of r.cruise.filter((c) => c.speedKn === undefined)) expect(c.rangeWithReserveNm).toBeUndefined();
    }
  });

  it('prints time and range on the spec sheet, the console card and in the buyer’s cruising line, with the reserve', () => {
    const b = withTank({});
    const r = analyseBoat({ boat: b, project: ctxOf(b).project });
    const fast = r.cruise.find((c) => c.label === 'Fast cruise')!;
    const hours = fast.hoursWithReserve!.toFixed(1);
    const nm = String(Math.round(fast.rangeWithReserveNm!));
    const spec = scenePages(sheetScene({ kind: 'specSheet', boatId: b.id, paper: A4 }, ctxOf(b))).flatMap(texts);
    const cells = spec.filter((t) => t.role === 'table-cell').map((t) => t.text);
    const headers = spec.filter((t) => t.role === 'table-header').map((t) => t.text).join(' ');
    expect(headers).toContain('Time (h, est.)');
    expect(headers).toContain('Range (nm, est.)');
    const row = cells.indexOf('Fast cruise');
    expect(cells.slice(row, row + 10)).toEqual(expect.arrayContaining([hours, nm]));
    const words = spec.map((t) => t.text).join(' ');
    expect(words).toContain('keeping 10 % in reserve');
    const card = scenePages(sheetScene({ kind: 'consoleCard', boatId: b.id, paper: CARD }, ctxOf(b))).flatMap(texts);
    expect(card.filter((t) => t.role === 'cruise-speed').map((t) => t.text)).toContain(`~${Math.round(fast.speedKn!)} kn · ${hours} h · ${nm} nm`);
    expect(card.filter((t) => t.role === 'cruise-reserve').map((t) => t.text).join(' ')).toBe('Speed, time and range are estimates; time and range keep 10 % of the tank in reserve.');
  });

  it('gives a range in statute miles when the site reads speeds in mph (1 nm = 1.150779 mi, NIST SP 811)', () => {
    const b = withTank({});
    const ctx = { project: { ...project, site: { ...project.site, speedUnit: 'mph' as const }, boats: [b] }, dateIso: '2026-11-02' };
    const r = analyseBoat({ boat: b, project: ctx.project });
    const fast = r.cruise.find((c) => c.label === 'Fast cruise')!;
    const card = scenePages(sheetScene({ kind: 'consoleCard', boatId: b.id, paper: CARD }, ctx)).flatMap(texts);
    const mi = String(Math.round(fast.rangeWithReserveNm! * 1.150779));
    expect(card.filter((t) => t.role === 'cruise-speed').map((t) => t.text).join(' ')).toContain(`· ${mi} mi`);
  });
});
