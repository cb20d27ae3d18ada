/**
 * Units per book and per sheet, falling back to the site's: speed in kn, mph or km/h with an optional
 * second unit in brackets, fuel in L/h, US or imperial gallons an hour, power kW or hp first. Conversion
 * factors (exact by definition; NIST SP 811, appendix B): 1 nmi = 1852 m, 1 mi = 1609.344 m, 1 US gal =
 * 3.785411784 L, 1 imperial gal = 4.54609 L.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { Boat, SheetRequest } from '../../src/data/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { boat, project } from '../sheets/fixtures/demoProject.ts';
import { texts } from '../sheets/sceneWalk.ts';
import { demoWith } from './helpers.ts';

const CARDS = 'data/books/owner-console-cards.yaml';
const cards = readFileSync(CARDS, 'utf8');
const A4 = { size: 'A4', orientation: 'portrait', bleedMm: 0 } as const;
const MI_PER_NM = 1852 / 1609.344;

describe('units in a book file', () => {
  it('reach every sheet of the book, a sheet’s own units over the book’s, and name the sheets’ files', () => {
    const text = cards.replace(/^units:.*$/m, 'units: { speed: mph, speed_also: kn, fuel: US gal/h }').replace(/^( {2}- \{ kind: consoleCard, boat: [a-z-]+) \}$/m, '$1, units: { speed: km/h, speed_also: none } }');
    expect(text).not.toBe(cards);
    const r = loadProjectFromFiles(demoWith(CARDS, text));
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    const book = r.project.books.find((b) => b.id === 'owner-console-cards')!;
    expect(book.sheets.map((s) => s.units)).toEqual([
      { speedUnit: 'km/h', speedAlso: null, fuelUnit: 'US gal/h' },
      { speedUnit: 'mph', speedAlso: 'kn', fuelUnit: 'US gal/h' },
      { speedUnit: 'mph', speedAlso: 'kn', fuelUnit: 'US gal/h' },
    ]);
    const plan = planSheets(r.project);
    const slugs = plan.byBook.get(book.id)!;
    expect(slugs[0]).toMatch(/-kmh-usgal$/);
    expect(slugs[1]).toMatch(/-mph-kn-usgal$/);
    // The site's own cards (kn) keep their names: other units are other files.
    const siteSheets = [...plan.byBoat.values()].flat();
    for (const s of slugs) expect(siteSheets).not.toContain(s);
  });

  it('refuses a unit it does not know at its line, naming the ones it knows', () => {
    const text = cards.replace(/^units:.*$/m, 'units: { speed: mph, fuel: gallons }');
    const r = loadProjectFromFiles(demoWith(CARDS, text));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const line = text.split('\n').findIndex((l) => l.startsWith('units:')) + 1;
    expect(r.errors.map((e) => e.message).join('\n')).toMatch(new RegExp(`${CARDS}:${line}:\\d+ units\\.fuel must be L/h, US gal/h or imp gal/h`));
  });
});

describe('sheets printed in a book’s units', () => {
  const withTank: Boat = { ...boat, fuelTankL: 120, cruise: [...boat.cruise, { kind: 'speed', label: 'Typed in mph', speedKn: 28 / MI_PER_NM, typed: { value: 28, unit: 'mph' } }] };
  const ctx = { project: { ...project, boats: [withTank] }, dateIso: '2026-11-02' };
  const spec = (units: SheetRequest['units']) => scenePages(sheetScene({ kind: 'specSheet', boatId: boat.id, paper: A4, ...(units ? { units } : {}) }, ctx)).flatMap(texts);
  const r = analyseBoat({ boat: withTank, project: ctx.project });
  const top = r.alternatives.find((a) => a.fitted === 'yes')!.topSpeedKn!;
  const fast = r.cruise.find((c) => c.label === 'Fast cruise')!;

  it('gives speeds in mph with knots in brackets and fuel in US gallons an hour', () => {
    const t = spec({ speedUnit: 'mph', speedAlso: 'kn', fuelUnit: 'US gal/h' });
    const headline = t.find((n) => n.role === 'buyer-headline')!.text;
    expect(headline).toContain(`Top speed about ${Math.round(top * MI_PER_NM)} mph (${Math.round(top)} kn)`);
    const cells = t.filter((n) => n.role === 'table-cell').map((n) => n.text);
    const row = cells.indexOf('Fast cruise');
    expect(cells.slice(row, row + 9)).toEqual(expect.arrayContaining([`${Math.round(fast.speedKn! * MI_PER_NM)} (${Math.round(fast.speedKn!)})`, (fast.fuelLPerH! / 3.785411784).toFixed(1)]));
    expect(t.filter((n) => n.role === 'table-header').map((n) => n.text).join(' ')).toContain('Fuel (US gal/h, est.)');
  });

  it('gives fuel in imperial gallons an hour when asked', () => {
    const cells = spec({ fuelUnit: 'imp gal/h' }).filter((n) => n.role === 'table-cell').map((n) => n.text);
    const row = cells.indexOf('Fast cruise');
    expect(cells.slice(row, row + 9)).toContain((fast.fuelLPerH! / 4.54609).toFixed(1));
  });

  it('keeps a speed typed in mph as typed when the sheet reads mph, and converts it for a sheet in knots', () => {
    const asked = (t: ReturnType<typeof spec>) => {
      const cells = t.filter((n) => n.role === 'table-cell').map((n) => n.text);
      return cells[cells.indexOf('Typed in mph') + 1];
    };
    expect(asked(spec({ speedUnit: 'mph' }))).toBe('28 mph');
    expect(asked(spec(undefined))).toBe(`${(28 / MI_PER_NM).toFixed(1)} kn`);
  });

  it('falls back to the site’s units where the book gives none', () => {
    const t = spec(undefined);
    expect(t.find((n) => n.role === 'buyer-headline')!.text).toContain(`Top speed about ${Math.round(top)} kn at`);
    expect(t.filter((n) => n.role === 'table-header').map((n) => n.text).join(' ')).toContain('Fuel (L/h, est.)');
  });
});
