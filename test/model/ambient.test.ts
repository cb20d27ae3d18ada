import { describe, expect, it } from 'vitest';
import {
  ambientPowerFactor,
  compressionIgnitionCorrection,
  correctionFactor,
  defaultCorrection,
  dryAirPressureKpa,
  isoSparkIgnitionCorrection,
  isaPressureKpa,
  sparkIgnitionCorrection,
  waterVapourPressureKpa,
} from '../../src/model/ambient.ts';
import type { Ambient } from '../../src/model/types.ts';

const SAE_REFERENCE: Ambient = { pressureKpa: 99, airTempC: 25, relativeHumidityPct: 0 };
const HOT_DRY_LAKE: Ambient = { pressureKpa: 95, airTempC: 35, relativeHumidityPct: 0 };

describe('isaPressureKpa()', () => {
  it('matches the U.S. Standard Atmosphere 1976 tables at 0, 1000, 2000 and 3000 m within a few pascals', () => {
    // U.S. Standard Atmosphere 1976, tables by geometric altitude (REFERENCES.md, confirmed).
    expect(Math.abs(isaPressureKpa(0) - 101.325)).toBeLessThan(0.003);
    expect(Math.abs(isaPressureKpa(1000) - 89.876)).toBeLessThan(0.003);
    expect(Math.abs(isaPressureKpa(2000) - 79.501)).toBeLessThan(0.003);
    expect(Math.abs(isaPressureKpa(3000) - 70.121)).toBeLessThan(0.003);
  });

  it('refuses altitudes outside the lowest layer with a message that names the fix', () => {
    expect(() => isaPressureKpa(12000)).toThrow(/give the site pressure instead/);
    expect(() => isaPressureKpa(Number.NaN)).toThrow(RangeError);
  });
});

describe('waterVapourPressureKpa()', () => {
  it('matches the ITTC 7.5-02-01-03 vapour pressures of fresh water', () => {
    // ITTC Recommended Procedure 7.5-02-01-03 (Rev 02, 2011), REFERENCES.md (confirmed).
    expect(waterVapourPressureKpa(10)).toBeCloseTo(1.2282, 3);
    expect(waterVapourPressureKpa(15)).toBeCloseTo(1.7058, 3);
    expect(waterVapourPressureKpa(20)).toBeCloseTo(2.3393, 3);
    expect(waterVapourPressureKpa(25)).toBeCloseTo(3.1699, 3);
  });

  it('is one standard atmosphere at the normal boiling point', () => {
    // IAPWS-IF97 saturation line: 0.101 418 MPa at 373.15 K (from memory; 100 °C boils at 101.325 kPa on ITS-90 ≈ 99.97 °C).
    expect(waterVapourPressureKpa(100)).toBeCloseTo(101.418, 2);
  });
});

describe('dryAirPressureKpa()', () => {
  it('subtracts the vapour share from the barometric pressure', () => {
    const air: Ambient = { pressureKpa: 100, airTempC: 25, relativeHumidityPct: 50 };
    expect(dryAirPressureKpa(air)).toBeCloseTo(100 - 0.5 * 3.1697, 3);
  });
});

describe('sparkIgnitionCorrection() (SAE J1349 AUG2004)', () => {
  it('is exactly 1 at the standard’s own reference air, 99 kPa dry and 25 °C', () => {
    expect(sparkIgnitionCorrection(SAE_REFERENCE)).toBeCloseTo(1, 14);
  });

  it('gives the standard formula’s value in hot, thin air (hand-worked)', () => {
    // CF = 1.176 · (99/95) · sqrt((35 + 273)/298) − 0.176 = 1.176 · 1.042105 · 1.016640 − 0.176 = 1.069908.
    expect(sparkIgnitionCorrection(HOT_DRY_LAKE)).toBeCloseTo(1.069908, 6);
  });
});

describe('compressionIgnitionCorrection() (ISO 1585 / ISO 15550 form, fm = 1.2)', () => {
  it('gives the standard formula’s value for natural and turbocharged aspiration (hand-worked)', () => {
    // fa (natural) = (99/95) · (308.15/298)^0.7 = 1.066826; αc = fa^1.2 = 1.080718.
    expect(compressionIgnitionCorrection(HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.080718, 6);
    // fa (turbocharged) = (99/95)^0.7 · (308.15/298)^1.5 = 1.082323; αc = fa^1.2 = 1.099584.
    expect(compressionIgnitionCorrection(HOT_DRY_LAKE, 'turbocharged')).toBeCloseTo(1.099584, 6);
  });
});

describe('ambientPowerFactor()', () => {
  const reference: Ambient = { pressureKpa: 100, airTempC: 25, relativeHumidityPct: 30 };
  const combos = [
    { fuel: 'petrol', aspiration: 'natural' },
    { fuel: 'diesel', aspiration: 'natural' },
    { fuel: 'diesel', aspiration: 'turbocharged' },
  ] as const;

  it('is 1 when the site air equals the curve’s reference air, whatever that reference is', () => {
    for (const c of combos) {
      expect(ambientPowerFactor({ ...c, site: reference, reference })).toBe(1);
      expect(ambientPowerFactor({ ...c, site: HOT_DRY_LAKE, reference: HOT_DRY_LAKE })).toBe(1);
    }
  });

  it('is the ratio of the standard’s factors: petrol curve rated to SAE reference air, run at a hot high lake', () => {
    // P_site = P_ref · CF(ref)/CF(site) = 1 / 1.069908 = 0.934659 (hand-worked from the numbers above).
    expect(ambientPowerFactor({ fuel: 'petrol', aspiration: 'natural', site: HOT_DRY_LAKE, reference: SAE_REFERENCE })).toBeCloseTo(0.934659, 6);
  });

  it('lowers power in hotter, thinner or more humid air and raises it in cold dense air', () => {
    for (const c of combos) {
      const f = (site: Ambient) => ambientPowerFactor({ ...c, site, reference });
      expect(f({ ...reference, airTempC: 40 })).toBeLessThan(1);
      expect(f({ ...reference, pressureKpa: isaPressureKpa(1500) })).toBeLessThan(1);
      expect(f({ ...reference, relativeHumidityPct: 90 })).toBeLessThan(1);
      expect(f({ ...reference, airTempC: 5, pressureKpa: 102 })).toBeGreaterThan(1);
    }
  });
});

describe('isoSparkIgnitionCorrection() (ISO 1585 spark ignition)', () => {
  it('is exactly 1 at the standard’s reference air, 99 kPa dry and 298 K', () => {
    // αa = (99/pd)^1.2 · (T/298)^0.6 (shared/REFERENCES.md, transcription of ISO 1585): both ratios are 1.
    expect(isoSparkIgnitionCorrection({ pressureKpa: 99, airTempC: 298 - 273.15, relativeHumidityPct: 0 })).toBeCloseTo(1, 14);
  });

  it('gives the published formula’s value in hot, thin air (hand-worked)', () => {
    // αa = (99/95)^1.2 · (308.15/298)^0.6 = 1.050737 · 1.020299 = 1.072066.
    expect(isoSparkIgnitionCorrection(HOT_DRY_LAKE)).toBeCloseTo(1.072066, 6);
  });

  it('differs from SAE J1349 in the same air, so the choice of standard matters', () => {
    // SAE J1349: 1.069908 (above); ISO 1585 SI: 1.072066; the difference is 0.2 % of power.
    expect(isoSparkIgnitionCorrection(HOT_DRY_LAKE) - sparkIgnitionCorrection(HOT_DRY_LAKE)).toBeCloseTo(0.002158, 5);
  });
});

describe('correctionFactor() and the engine factor fm', () => {
  it('uses the engine factor given for the compression-ignition formula (hand-worked)', () => {
    // fa (natural) = 1.066826 (above); fm = 0.8: αc = 1.066826^0.8 = 1.053113; fm = 0.3: 1.019596.
    expect(correctionFactor({ standard: 'iso-1585-ci', engineFactorFm: 0.8 }, HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.053113, 6);
    expect(correctionFactor({ standard: 'iso-1585-ci', engineFactorFm: 0.3 }, HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.019596, 6);
    expect(correctionFactor({ standard: 'iso-1585-ci' }, HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.080718, 6);
  });

  it('picks the standard named, and the fuel’s default when none is named', () => {
    expect(correctionFactor({ standard: 'sae-j1349' }, HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.069908, 6);
    expect(correctionFactor({ standard: 'iso-1585-si' }, HOT_DRY_LAKE, 'natural')).toBeCloseTo(1.072066, 6);
    expect(defaultCorrection('petrol')).toEqual({ standard: 'sae-j1349' });
    expect(defaultCorrection('diesel')).toEqual({ standard: 'iso-1585-ci', engineFactorFm: 1.2 });
  });

  it('ambientPowerFactor() with ISO 1585 SI is the ratio of the two correction factors', () => {
    const site = ambientPowerFactor({ fuel: 'petrol', aspiration: 'natural', site: HOT_DRY_LAKE, reference: SAE_REFERENCE, correction: { standard: 'iso-1585-si' } });
    // CF(reference) / CF(site) = 1 / 1.072066 = 0.932778 (SAE reference air is 298.15 K, αa = (298.15/298)^0.6 = 1.000302 there).
    expect(site).toBeCloseTo(1.000302 / 1.072066, 5);
  });
});
