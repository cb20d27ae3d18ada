// The power_correction field of an engine file: which standard corrects the curve for the site's air.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { ambientPowerFactor, correctionFactor } from '../../src/model/index.ts';
import { demoWith } from './helpers.ts';

const PETROL_ENGINE = 'data/engines/copperwhistle-strider.yaml';
const DIESEL = 'data/engines/anvilmoth-hauler.yaml';
const withField = (path: string, yaml: string) => {
  const text = readFileSync(path, 'utf8').replace(/\nvariants:/, `\n${yaml}\nvariants:`);
  return loadProjectFromFiles(demoWith(path, text));
};

describe('power_correction in an engine file', () => {
  it('names the standard the model then uses (ISO 1585 spark ignition on a petrol engine)', () => {
    const r = withField(PETROL_ENGINE, 'power_correction:\n  standard: iso-1585-si');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const v = r.project.engines.find((e) => e.id === 'copperwhistle-strider')!.variants[0];
    expect(v.correction).toEqual({ standard: 'iso-1585-si' });
    const hot = { pressureKpa: 95, airTempC: 35, relativeHumidityPct: 0 };
    // CF(reference) / CF(site) with αa = (99/pd)^1.2 · (T/298)^0.6 (ISO 1585 SI, shared/REFERENCES.md).
    expect(ambientPowerFactor({ fuel: v.fuel, aspiration: v.aspiration, site: hot, reference: v.referenceAmbient, correction: v.correction }))
      .toBeCloseTo(correctionFactor({ standard: 'iso-1585-si' }, v.referenceAmbient, 'natural') / 1.072066, 5);
  });

  it('takes the compression-ignition engine factor fm of a diesel', () => {
    const r = withField(DIESEL, 'power_correction:\n  standard: iso-1585-ci\n  engine_factor_fm: 0.8');
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.project.engines.find((e) => e.id === 'anvilmoth-hauler')!.variants[0].correction).toEqual({ standard: 'iso-1585-ci', engineFactorFm: 0.8 });
  });

  it('refuses a spark-ignition standard on a diesel, at the line of the standard, naming the fix', () => {
    const r = withField(DIESEL, 'power_correction:\n  standard: sae-j1349');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const e = r.errors.find((x) => x.field === 'power_correction.standard')!;
    const line = readFileSync(DIESEL, 'utf8').split('\n').findIndex((l) => l.startsWith('variants:')) + 2;
    expect(e.file).toBe(DIESEL);
    expect(e.line).toBe(line);
    expect(e.message).toMatch(/spark-ignition standard, but the engine is a diesel; use iso-1585-ci/);
  });

  it('refuses the diesel formula on a petrol engine, and fm outside 0.3–1.2 or with another standard', () => {
    const petrol = withField(PETROL_ENGINE, 'power_correction:\n  standard: iso-1585-ci');
    expect(petrol.ok || petrol.errors.map((e) => e.message).join('\n')).toMatch(/compression-ignition standard, but the engine is petrol/);
    const far = withField(DIESEL, 'power_correction:\n  standard: iso-1585-ci\n  engine_factor_fm: 1.5');
    expect(far.ok || far.errors.map((e) => e.field).join(',')).toMatch(/power_correction\.engine_factor_fm/);
    const stray = withField(PETROL_ENGINE, 'power_correction:\n  standard: sae-j1349\n  engine_factor_fm: 1');
    expect(stray.ok || stray.errors.map((e) => e.message).join('\n')).toMatch(/only belongs to standard iso-1585-ci/);
  });

  it('defaults by fuel when the file names no standard (the demo engines)', () => {
    const r = loadProjectFromFiles(demoWith(PETROL_ENGINE, readFileSync(PETROL_ENGINE, 'utf8')));
    expect(r.ok).toBe(true);
    if (r.ok) for (const e of r.project.engines) for (const v of e.variants) expect(v.correction).toBeUndefined();
  });
});
