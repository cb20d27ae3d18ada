import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { DataError } from '../../src/data/types.ts';
import { demoWithFixture } from './helpers.ts';

function errorsOf(fixture: string): DataError[] {
  const result = loadProjectFromFiles(demoWithFixture(fixture));
  if (result.ok) throw new Error(`fixture ${fixture} loaded without errors`);
  return [...result.errors];
}

const where = (e: DataError) => `${e.file}:${e.line}:${e.column}`;

describe('loadProjectFromFiles() locates each kind of mistake at file:line:column', () => {
  it('reports a YAML syntax error once, at the bracket that never closes (not the line after, where the parser stopped)', () => {
    const errors = errorsOf('syntax-error');
    expect(errors).toHaveLength(1);
    expect(where(errors[0])).toBe('data/jets/kelpspindle-riffle.yaml:19:16');
    expect(errors[0].message).toBe(
      'data/jets/kelpspindle-riffle.yaml:19:16 the file must be valid YAML, found a [ that is never closed — add the closing ] at the end of the list on line 19',
    );
    expect(errors[0].detail).toEqual([
      '19 |     rating_kw: [2.15',
      '   |                ^',
      'the YAML parser said: Flow sequence in block collection must be sufficiently indented and end with a ] (it stopped at line 20, column 3)',
    ]);
  });

  it('reports text where a number belongs, with the value found and the fix', () => {
    const [e] = errorsOf('wrong-type');
    expect(e.message).toBe(
      'data/jets/kelpspindle-riffle.yaml:19:16 impellers[2].rating_kw must be a number, found "2.15 kW" — write the number alone; the unit is in the field name',
    );
    expect(e.field).toBe('impellers[2].rating_kw');
    expect(e.found).toBe('"2.15 kW"');
  });

  // Each fixture holds one kind of mistake; the loader must report exactly these sentences, in this order.
  it.each([
    ['negative-rating', ['data/jets/kelpspindle-riffle.yaml:19:16 impellers[2].rating_kw must be a positive number, found -3.4']],
    ['non-finite', ['data/jets/kelpspindle-riffle.yaml:19:16 impellers[2].rating_kw must be a finite number, found .inf']],
    [
      'missing-field',
      ['data/boats/reedshank.yaml:3:1 water is required, found nothing — add water: with a value that must be fresh, salt, or a mapping with density_kg_m3 (950–1100)'],
    ],
    [
      'unknown-reference',
      ['data/boats/reedshank.yaml:11:9 engine must name one of the engine families in data/engines/, found "coperwhistle-strider" — did you mean copperwhistle-strider? known: anvilmoth-hauler, copperwhistle-strider, thimblefinch-trotter'],
    ],
    [
      'out-of-range',
      [
        'data/engines/copperwhistle-strider.yaml:10:24 wot_window_rpm[1] must be at most max_rpm (5200 rpm): the WOT window lies inside [idle, max], found 5400',
        'data/engines/copperwhistle-strider.yaml:24:8 curve.points[7][0] must be greater than the row before (4000 rpm): rpm must increase down the table, found 4000',
        'data/jets/kelpspindle-riffle.yaml:8:11 exponent must be between 2 and 4, found 5',
      ],
    ],
    [
      'duplicate-key',
      ['data/boats/reedshank.yaml:11:3 hull.displacement_kg must appear only once in its mapping (duplicate key), found a second "displacement_kg" — remove or merge one of them'],
    ],
    [
      'duplicate-id',
      ['data/jets/kelpspindle-riffle.yaml:20:9 impellers[3].id must be unique in impellers (already used by impellers[2]), found "gust" — give each entry its own id'],
    ],
    [
      'id-mismatch',
      ['data/boats/reedshank.yaml:3:5 id must match the file name (reedshank.yaml), found "ember" — change id to reedshank, or rename the file to ember.yaml'],
    ],
    [
      'unknown-field',
      [
        'data/jets/kelpspindle-riffle.yaml:17:5 impellers[2] must give one of rating_kw, rating_hp, found none of them',
        'data/jets/kelpspindle-riffle.yaml:19:5 impellers[2].ratting_kw is not a field here, found a field named "ratting_kw" — did you mean rating_kw? fields allowed here: id, label, rating_kw, rating_hp, notes',
      ],
    ],
    ['unit-choice', ['data/jets/kelpspindle-riffle.yaml:20:16 impellers[2].rating_hp must not be given together with rating_kw: give only one of rating_kw, rating_hp, found 2.9']],
  ])('reports the %s fixture in full, sorted by file, line, column', (fixture, expected) => {
    expect(errorsOf(fixture).map((e) => e.message)).toEqual(expected);
  });

  it('reports a missing field at the mapping that should hold it', () => {
    const [e] = errorsOf('missing-field');
    expect([where(e), e.field, e.found]).toEqual(['data/boats/reedshank.yaml:3:1', 'water', 'nothing']);
  });

  it('never returns a half-built project: any error means no project', () => {
    const result = loadProjectFromFiles(demoWithFixture('negative-rating'));
    expect(result.ok).toBe(false);
    expect('project' in result).toBe(false);
  });
});
