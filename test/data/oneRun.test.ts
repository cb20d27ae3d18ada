/**
 * `check` lists every problem in one run: a file with a schema error still has its references checked,
 * and a reference into a file that did not load is checked against the ids that file writes, so fixing
 * one error never reveals another that was there all along.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles, type SourceFile } from '../../src/data/load.ts';
import { demoFiles } from './helpers.ts';

const BOAT = 'data/boats/reedshank.yaml';
const JET = 'data/jets/kelpspindle-riffle.yaml';
const BOOK = 'data/books/dealer-spec-sheets.yaml';

function demoWithEdits(edits: Record<string, [string, string]>): SourceFile[] {
  return demoFiles().map((f) => {
    const edit = edits[f.path];
    if (!edit) return f;
    expect(f.text).toContain(edit[0]);
    return { ...f, text: f.text.replace(edit[0], edit[1]) };
  });
}

const messages = (files: SourceFile[]) => {
  const r = loadProjectFromFiles(files);
  return r.ok ? [] : r.errors.map((e) => e.message);
};

describe('every problem in one run', () => {
  it('checks the engine a boat names even when the boat file has a schema error', () => {
    expect(messages(demoWithEdits({ [BOAT]: ['  displacement_kg: 1350\n', '  displacement_kg: -1350\n'] }))).toHaveLength(1);
    const both = messages(demoWithEdits({ [BOAT]: ['  displacement_kg: 1350\n', '  displacement_kg: -1350\n'] }).map((f) => (f.path === BOAT ? { ...f, text: f.text.replace('engine: copperwhistle-strider', 'engine: copperwhistle-stridr') } : f)));
    expect(both).toEqual([
      `${BOAT}:9:20 hull.displacement_kg must be between 50 and 100000 kg, found -1350`,
      `${BOAT}:11:9 engine must name one of the engine families in data/engines/, found "copperwhistle-stridr" — did you mean copperwhistle-strider? known: anvilmoth-hauler, copperwhistle-strider, thimblefinch-trotter`,
    ]);
  });

  it('checks the impeller a boat names against a jet file that did not load', () => {
    const found = messages(
      demoWithEdits({
        [JET]: ['    rating_kw: 1.82', '    rating_kw: -1.82'],
        [BOAT]: ['impeller: gust', 'impeller: gusts'],
      }),
    );
    const jetLine = readFileSync(JET, 'utf8').split('\n').findIndex((l) => l.includes('rating_kw: 1.82')) + 1;
    expect(found).toEqual([
      `${BOAT}:14:11 impeller must name one of the impellers of kelpspindle-riffle, found "gusts" — did you mean gust? known: wisp, breeze, gust, squall, gale, storm`,
      `${JET}:${jetLine}:16 impellers[1].rating_kw must be a positive number, found -1.82`,
    ]);
  });

  it('checks the boats a book names even when the book has a schema error', () => {
    const found = messages(demoWithEdits({ [BOOK]: ['audience: dealer', 'audience: dealers'] }).map((f) => (f.path === BOOK ? { ...f, text: f.text.replace('boat: sorrel-belle', 'boat: sorrel-bel') } : f)));
    expect(found).toHaveLength(2);
    expect(found[0]).toMatch(new RegExp(`^${BOOK}:5:11 audience must be shop, dealer or owner, found "dealers"`));
    expect(found[1]).toMatch(new RegExp(`^${BOOK}:12:30 sheets\\[1\\]\\.boat must name one of the boats in data/boats/, found "sorrel-bel" — did you mean sorrel-belle\\?`));
  });

  it('does not check references against ids that are themselves the mistake (a duplicated id)', () => {
    // The jet lists gust twice (squall renamed by mistake): the boat naming squall is right, the jet is wrong.
    const found = messages(demoWithEdits({ [JET]: ['  - id: squall', '  - id: gust'] }));
    expect(found).toHaveLength(1);
    expect(found[0]).toMatch(/impellers\[3\]\.id must be unique in impellers/);
  });
});
