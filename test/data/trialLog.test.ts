import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { readTrialLog, trialLogPath } from '../../src/data/trialLog.ts';
import { analyseBoat } from '../../src/analysis/index.ts';
import { demoWith, demoFiles } from './helpers.ts';

const LOG = 'data/boats/reedshank.trials.csv';
const HEADER = 'date,impeller,wot_rpm,speed_kn,air_temp_c,recorded_by,notes';

const load = (text: string, path = LOG) => loadProjectFromFiles(demoWith(path, text), { dataDir: 'data' });
const messages = (text: string, path = LOG) => {
  const r = load(text, path);
  return r.ok ? [] : r.errors.map((e) => e.message);
};

describe('readTrialLog() reads a boat’s sea-trial log', () => {
  it('names the log after the boat file beside it', () => {
    expect(trialLogPath('data/boats/reedshank.yaml')).toBe('data/boats/reedshank.trials.csv');
  });

  it('reads rows in any column order, with comments before the header, a byte-order mark, CRLF and a quoted note', () => {
    const text = '\ufeff# Demo log\r\nwot_rpm,date,impeller,notes\r\n4870,2026-05-02,gust,"Two aboard, calm"\r\n\r\n4,2026-05-03,gust,\r\n';
    const r = readTrialLog({ file: LOG, text: text.replace('\r\n4,', '\r\n4855,') });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.rows.map((x) => [x.line, x.raw.date, x.raw.wot_rpm, x.raw.notes])).toEqual([
      [3, '2026-05-02', 4870, 'Two aboard, calm'],
      [5, '2026-05-03', 4855, undefined],
    ]);
    expect(r.rows[1].field('wot_rpm')).toBe('row 5, column A (wot_rpm)');
  });

  it('puts the conditions columns where a boat file’s trial has them, and water as fresh, salt or a density', () => {
    const r = readTrialLog({ file: LOG, text: 'date,impeller,wot_rpm,air_temp_c,humidity_pct,pressure_hpa,water,recorded_by\n2026-05-02,gust,4870,18,60,1002,1012,Ana\n2026-05-03,gust,4870,,,,salt,\n' });
    expect(r.ok && r.rows.map((x) => [x.raw.conditions, x.raw.water, x.recordedBy])).toEqual([
      [{ air_temp_c: 18, humidity_pct: 60, pressure_hpa: 1002 }, { density_kg_m3: 1012 }, 'Ana'],
      [undefined, 'salt', undefined],
    ]);
  });
});

describe('a bad log row is named by file, line, column, row and column name', () => {
  it.each([
    ['text in a number cell', `${HEADER}\n2026-05-02,gust,48x0,,,,\n`, 'data/boats/reedshank.trials.csv:2:17 row 2, column C (wot_rpm) must be a number, found "48x0"'],
    ['a decimal comma', `${HEADER}\n2026-05-02,gust,4870,"40,5",,,\n`, 'data/boats/reedshank.trials.csv:2:22 row 2, column D (speed_kn) must be a number, found "40,5" — write the decimal with a point'],
    ['a date that does not exist', `${HEADER}\n2026-02-30,gust,4870,,,,\n`, 'data/boats/reedshank.trials.csv:2:1 row 2, column A (date) must be a real calendar date (YYYY-MM-DD), found "2026-02-30"'],
    ['a date in another form', `${HEADER}\n02/05/2026,gust,4870,,,,\n`, 'data/boats/reedshank.trials.csv:2:1 row 2, column A (date) must be a date written YYYY-MM-DD'],
    ['an rpm out of range', `${HEADER}\n2026-05-02,gust,45000,,,,\n`, 'data/boats/reedshank.trials.csv:2:17 row 2, column C (wot_rpm) must be between 100 and 20000 rpm, found 45000'],
    ['an empty required cell', `${HEADER}\n2026-05-02,,4870,,,,\n`, "data/boats/reedshank.trials.csv:2:12 row 2, column B (impeller) must hold the trial's impeller, found an empty cell"],
    ['an unknown impeller', `${HEADER}\n2026-05-02,gusty,4870,,,,\n`, 'data/boats/reedshank.trials.csv:2:12 row 2, column B (impeller) must name one of the impellers of kelpspindle-riffle, found "gusty" — did you mean gust?'],
    ['an unknown column', 'date,impeller,wot_rpm,air_temp\n2026-05-02,gust,4870,18\n', 'data/boats/reedshank.trials.csv:1:23 column D of the header row must name a column of the trial log, found "air_temp" — did you mean air_temp_c?'],
    ['a missing column', 'date,impeller\n2026-05-02,gust\n', 'data/boats/reedshank.trials.csv:1:1 the header row must have the columns date, impeller, wot_rpm, found no wot_rpm'],
    ['a cell past the header', `${HEADER}\n2026-05-02,gust,4870,,,,calm,flat\n`, 'data/boats/reedshank.trials.csv:2:30 row 2, column H is past the header\'s last column (G)'],
    ['semicolons', 'date;impeller;wot_rpm\n2026-05-02;gust;4870\n', 'data/boats/reedshank.trials.csv:1:1 the header row must separate the columns with commas'],
    ['an unclosed quote', `${HEADER}\n2026-05-02,gust,4870,,,,"calm\n`, 'data/boats/reedshank.trials.csv:'],
    ['an empty file', '', 'data/boats/reedshank.trials.csv:1:1 the file must start with a header row naming the columns'],
    ['an invisible character in a note', `${HEADER}\n2026-05-02,gust,4870,,,,calm\u202e\n`, 'data/boats/reedshank.trials.csv:2:29 row 2, column G (notes) must hold only printable characters'],
  ])('%s', (_what, text, start) => {
    const found = messages(text);
    expect(found.length, found.join('\n')).toBeGreaterThan(0);
    expect(found.some((m) => m.startsWith(start)), found.join('\n')).toBe(true);
  });

  it('a trial both in the boat file and in the log is refused at the log row, naming the boat file’s line', () => {
    // reedshank.yaml lists 2026-03-21, gust, 4860 rpm as its second trial.
    const found = messages(`${HEADER}\n2026-03-21,gust,4860,,,,\n`);
    expect(found).toEqual([expect.stringMatching(/^data\/boats\/reedshank\.trials\.csv:2:1 row 2, column A \(date\) is a trial the boat file also lists \(data\/boats\/reedshank\.yaml:\d+, same date, impeller and rpm\)/)]);
  });

  it('an rpm above the engine’s maximum is kept and warned of, as in a boat file', () => {
    const r = load(`${HEADER}\n2026-05-02,gust,6400,,,,\n`);
    expect(r.ok).toBe(true);
    expect(r.warnings.map((w) => w.message)).toContainEqual(expect.stringMatching(/^data\/boats\/reedshank\.trials\.csv:2:17 row 2, column C \(wot_rpm\) is above the engine's max_rpm/));
  });

  it('a CSV in boats/ that no boat reads is warned of, not read', () => {
    const r = load(`${HEADER}\n2026-05-02,gust,4870,,,,\n`, 'data/boats/reedshank-log.csv');
    expect(r.ok).toBe(true);
    expect(r.warnings.map((w) => w.message)).toContainEqual(expect.stringMatching(/^data\/boats\/reedshank-log\.csv:1:1 the file is not read: a sea-trial log is named after its boat/));
    const orphan = load(`${HEADER}\n2026-05-02,gust,4870,,,,\n`, 'data/boats/reedshnk.trials.csv');
    expect(orphan.warnings.map((w) => w.message)).toContainEqual(expect.stringContaining('there is no boats/reedshnk.yaml, found "reedshnk.trials.csv" — did you mean reedshank?'));
  });
});

describe('the log’s trials join the boat file’s', () => {
  it('in date order, with who ran them and where each is written', () => {
    const r = load(`${HEADER}\n2026-05-02,gust,4870,40.0,18,Ana,calm\n2026-03-01,squall,4700,,,,\n`);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const boat = r.project.boats.find((b) => b.id === 'reedshank')!;
    expect(boat.trials.map((t) => [t.date, t.impellerId, t.wotRpm, t.origin?.file, t.origin?.line])).toEqual([
      ['2026-03-01', 'squall', 4700, LOG, 3],
      ['2026-03-14', 'squall', 4690, 'data/boats/reedshank.yaml', expect.any(Number)],
      ['2026-03-21', 'gust', 4860, 'data/boats/reedshank.yaml', expect.any(Number)],
      ['2026-05-02', 'gust', 4870, LOG, 2],
    ]);
    const logged = boat.trials[3];
    expect([logged.recordedBy, logged.speedKn, logged.ambient.airTempC, logged.notes]).toEqual(['Ana', 40, 18, 'calm']);
    // Air the row leaves out comes from the boat's site (reedshank.yaml: 55 % humidity, 120 m).
    expect(logged.ambient.relativeHumidityPct).toBe(55);
  });

  it('calibration uses every trial of the fitted impeller, from the boat file and the log alike', () => {
    const base = loadProjectFromFiles(demoFiles(), { dataDir: 'data' });
    const withLog = load(`${HEADER}\n2026-05-02,gust,4900,,,,\n2026-06-02,gust,4880,,,,\n`);
    if (!base.ok || !withLog.ok) throw new Error('demo data did not load');
    const before = analyseBoat({ boat: base.project.boats.find((b) => b.id === 'reedshank')!, project: base.project });
    const after = analyseBoat({ boat: withLog.project.boats.find((b) => b.id === 'reedshank')!, project: withLog.project });
    expect(before.calibrated?.calibration.trialDates).toEqual(['2026-03-14', '2026-03-21']);
    expect(after.calibrated?.calibration.trialDates).toEqual(['2026-03-14', '2026-03-21', '2026-05-02', '2026-06-02']);
    // The card's measured line is the latest trial of the fitted impeller, wherever it is written.
    expect(after.calibrated?.fittedMeasured).toEqual({ date: '2026-06-02', wotRpm: 4880 });
    // Two more gust trials above the boat file's 4860 rpm: the fitted impeller's calibrated WOT moves up.
    expect(after.calibrated!.wot.nominal.speedRpm).toBeGreaterThan(before.calibrated!.wot.nominal.speedRpm);
  });
});
