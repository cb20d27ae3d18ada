/**
 * The repower comparison sheet: every figure it prints for an option equals that option worked out by
 * hand on the boat with the install swapped in (test/analysis/repowerByHand.ts names the formulas and
 * sources); the sentence names exactly the options inside their window; the cautions print on every
 * page; the sheet's units follow its units override; long content flows over pages, never refused.
 */
import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { Boat, Paper, Project, SheetRequest, UnitsOverride } from '../../src/data/types.ts';
import type { Scene } from '../../src/scene/types.ts';
import { scenePages } from '../../src/scene/types.ts';
import { BUILT_IN_CAUTIONS, sheetScene } from '../../src/sheets/index.ts';
import { CONTINUING_CAUTION } from '../../src/sheets/kit/cautions.ts';
import { demoFiles } from '../data/helpers.ts';
import { byHand, type OptionAsked } from '../analysis/repowerByHand.ts';
import { texts } from './sceneWalk.ts';

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const MPH_PER_KN = 1852 / 1609.344; // NIST SP 811: 1 nmi = 1852 m, 1 mi = 1609.344 m
const L_PER_US_GAL = 3.785411784; // NIST SP 811

function demo(): Project {
  const r = loadProjectFromFiles(demoFiles());
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.project;
}

const request = (boatId: string, units?: UnitsOverride): SheetRequest => ({ kind: 'repowerSheet', boatId, paper: A4, ...(units ? { units } : {}) });
const draw = (project: Project, boatId: string, units?: UnitsOverride) => sheetScene(request(boatId, units), { project, dateIso: '2026-11-02' });

/** One option's column of the comparison table, its lines top to bottom joined by spaces. */
function column(scene: Scene, header: string): string {
  const all = scenePages(scene).flatMap((p) => texts(p));
  const head = all.find((t) => t.text === header || t.text === `${header} (fitted now)`)!;
  expect(head, header).toBeDefined();
  return all.filter((t) => Math.abs(t.x - head.x) < 0.05 && t !== head && t.y > head.y).sort((a, b) => a.y - b.y).map((t) => t.text).join(' ');
}

const fmtRpm = (v: number) => String(Math.round(v / 10) * 10);
const whole = (v: number) => v.toFixed(0);

/** Reedshank's options as its demo file lists them. */
const REEDSHANK: readonly (OptionAsked & { label: string })[] = [
  { label: 'As fitted', family: 'copperwhistle-strider', variant: 'sport', jet: 'kelpspindle-riffle', impeller: 'gust', addKg: 0 },
  { label: 'Economy tune', family: 'copperwhistle-strider', variant: 'economy', jet: 'kelpspindle-riffle', impeller: 'breeze', addKg: 0 },
  { label: 'Economy, Squall', family: 'copperwhistle-strider', variant: 'economy', jet: 'kelpspindle-riffle', impeller: 'squall', addKg: 0 },
  { label: 'Race tune', family: 'copperwhistle-strider', variant: 'race', jet: 'kelpspindle-riffle', impeller: 'squall', addKg: 15 },
  { label: 'Six-cylinder', family: 'anvilmoth-hauler', variant: 'derated', jet: 'gullbobbin-shoal', impeller: 'pebble', addKg: 140 },
];

describe('repower comparison sheet', () => {
  const project = demo();
  const boat = project.boats.find((b) => b.id === 'reedshank')!;
  // The hull constant the boat's own sea trials measured (test/analysis/repower.test.ts checks it is the one kept).
  const C = analyseBoat({ boat, project }).estimates.hull.crouchConstant;

  it('prints for each option the figures of the boat with that install, worked out by hand', () => {
    const scene = draw(project, 'reedshank');
    expect(scenePages(scene)).toHaveLength(1);
    for (const o of REEDSHANK) {
      const h = byHand(project, boat, o, C);
      const col = column(scene, o.label);
      const expected = [
        fmtRpm(h.wot.speedRpm),
        `${fmtRpm(h.limits.windowLowRpm)}–${fmtRpm(h.limits.windowHighRpm)} (max ${fmtRpm(h.limits.maxRpm)})`,
        h.inWindow ? 'in the recommended range' : 'below the recommended range',
        whole(h.wot.powerKw),
        whole(h.topKn),
        whole(h.wotFlow),
        ...boat.cruise.flatMap((s) => {
          if (s.kind === 'rpm') return [fmtRpm(s.speedRpm), `${whole(h.atRpm(s.speedRpm).flow)} L/h`];
          if (s.kind === 'power') return [fmtRpm(h.atPower(s.powerKw))];
          const at = h.atSpeed(s.speedKn);
          return [fmtRpm(at.rpm), `${whole(at.flow)} L/h · ${at.hours.toFixed(1)} h · ${whole(at.rangeNm)} nm`];
        }),
      ];
      let from = 0;
      for (const e of expected) {
        const i = col.indexOf(e, from);
        expect(i, `${o.label}: "${e}" after position ${from} in "${col}"`).toBeGreaterThanOrEqual(from);
        from = i + e.length;
      }
      expect(col).toContain(o.addKg > 0 ? `+${o.addKg} kg` : 'none');
    }
    // The fitted install is marked in its heading, and only there.
    const heads = texts(scene).filter((t) => t.text.includes('(fitted now)'));
    expect(heads.map((t) => t.text)).toEqual(['As fitted (fitted now)']);
  });

  it('names in its sentence exactly the options whose full throttle lies inside their engine’s window', () => {
    const scene = draw(project, 'reedshank');
    const sentence = texts(scene).filter((t) => t.role === 'repower-answer').map((t) => t.text).join(' ');
    const inside = REEDSHANK.filter((o) => byHand(project, boat, o, C).inWindow).map((o) => o.label);
    const outside = REEDSHANK.filter((o) => !inside.includes(o.label)).map((o) => o.label);
    expect(inside.length).toBeGreaterThan(0);
    expect(outside.length).toBeGreaterThan(0);
    const [keep, not] = sentence.split(';');
    for (const l of inside) expect(keep).toContain(l);
    for (const l of outside) expect(not).toContain(l);
    expect(not.trim()).toMatch(/does not\.$/);
    // Nothing else: the part naming the options holds only those labels, their commas and the last "and".
    const named = inside.map((l) => (l.includes(',') ? `“${l}”` : l));
    expect(keep).toBe(`${named.slice(0, -1).join(', ')} and ${named[named.length - 1]} keep full throttle inside their engine’s recommended range`);
  });

  it('says so when every option, or none, keeps full throttle inside its window', () => {
    const only = (labels: string[]): Project => ({ ...project, boats: project.boats.map((b) => (b.id === 'reedshank' ? { ...b, repowerOptions: b.repowerOptions!.filter((o) => labels.includes(o.label)) } : b)) });
    const sentence = (p: Project) => texts(draw(p, 'reedshank')).filter((t) => t.role === 'repower-answer').map((t) => t.text).join(' ');
    expect(sentence(only(['As fitted', 'Race tune']))).toBe('All 2 options keep full throttle inside their engine’s recommended range.');
    // A boat whose both options lug: the heaviest impeller on the economy tune, and with 400 kg more.
    const lugging: Boat = { ...boat, repowerOptions: [boat.repowerOptions![2], { ...boat.repowerOptions![2], label: 'Squall, loaded', impellerId: 'storm' }] };
    const p = { ...project, boats: project.boats.map((b) => (b.id === 'reedshank' ? lugging : b)) };
    expect(byHand(p, lugging, { ...REEDSHANK[2], impeller: 'storm' }, C).inWindow).toBe(false);
    expect(sentence(p)).toMatch(/^None of the 2 options keeps full throttle inside its engine’s recommended range/);
  });

  it('carries the cautions, and prints in the units its sheet asks for', () => {
    const scene = draw(project, 'reedshank', { speedUnit: 'mph', speedAlso: 'kn', fuelUnit: 'US gal/h' });
    const all = texts(scene).map((t) => t.text).join(' ');
    for (const c of BUILT_IN_CAUTIONS) expect(all.replace(/\s+/g, ' ')).toContain(c.split(' ').slice(0, 6).join(' '));
    expect(all).toMatch(/Top speed, mph \(kn\), est\./);
    expect(all).toMatch(/US gal\/h/);
    const race = byHand(project, boat, REEDSHANK[3], C);
    const col = column(scene, 'Race tune');
    expect(col).toContain(`${whole(race.topKn * MPH_PER_KN)} (${whole(race.topKn)})`);
    expect(col).toContain((race.wotFlow / L_PER_US_GAL).toFixed(1));
    // With mph the weight it adds is in pounds too (1 lb = 0.45359237 kg).
    expect(col).toContain(`+15 kg (+${whole(15 / 0.45359237)} lb)`);
  });

  it('flows over pages with long content (six options, eight cruise settings), cautions on every page', () => {
    const many: Boat = {
      ...boat,
      cruise: Array.from({ length: 8 }, (_, i) => ({ kind: 'rpm' as const, label: `Setting number ${i + 1}`, speedRpm: 2400 + 200 * i })),
      repowerOptions: [...boat.repowerOptions!, { ...boat.repowerOptions![3], label: 'Race tune, Gale', impellerId: 'gale' }],
    };
    const p = { ...project, boats: project.boats.map((b) => (b.id === 'reedshank' ? many : b)) };
    const scene = draw(p, 'reedshank');
    const pages = scenePages(scene);
    expect(pages.length).toBeGreaterThan(1);
    for (const page of pages) {
      const words = texts(page).map((t) => t.text).join(' ');
      const full = BUILT_IN_CAUTIONS.every((c) => words.includes(c.split(' ').slice(0, 5).join(' ')));
      expect(full || words.includes(CONTINUING_CAUTION.split(' ').slice(0, 6).join(' '))).toBe(true);
    }
    // A setting's fuel row never starts a page away from its rpm row, wherever the break falls (4 to 8 settings of every kind).
    const mixed: Boat['cruise'] = [
      { kind: 'rpm', label: 'Harbour idle', speedRpm: 1200 },
      { kind: 'speed', label: 'Slow', speedKn: 12 },
      { kind: 'speed', label: 'Towing a skier', speedKn: 22 },
      { kind: 'rpm', label: 'Long run upriver', speedRpm: 3000 },
      ...boat.cruise,
      { kind: 'power', label: 'Half power', powerKw: 120 },
    ];
    for (let n = 4; n <= mixed.length; n++) {
      const b: Boat = { ...many, cruise: mixed.slice(0, n) };
      const split = scenePages(draw({ ...project, boats: project.boats.map((x) => (x.id === 'reedshank' ? b : x)) }, 'reedshank'));
      for (const page of split) {
        const words = texts(page).map((t) => t.text).join(' ');
        for (const c of b.cruise) if (words.includes(`${c.label}: fuel`)) expect(words, `${n} settings: ${c.label}`).toContain(`${c.label} (`);
      }
    }
    expect(pages.some((page) => texts(page).some((t) => t.text.includes('(continued)')))).toBe(true);
    // Every option has its column and every setting its rows, over the pages.
    const all = pages.flatMap((pg) => texts(pg)).map((t) => t.text).join(' ');
    for (const o of many.repowerOptions!) expect(all).toContain(o.label);
    for (const c of many.cruise) expect(all).toContain(c.label);
  });
});
