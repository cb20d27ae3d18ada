import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_RESERVE_FRACTION, fuelFlow, fuelRange, TYPICAL_BSFC_G_PER_KWH } from '../../src/model/fuel.ts';
import { litresToUsGal, usGalToLitres } from '../../src/units.ts';

describe('fuelFlow()', () => {
  it('gives 47.30 L/h and 12.49 US gal/h for 100 kW of petrol at the typical 350 g/kWh (hand-computed)', () => {
    // Hand-computed: 100 kW × 350 g/kWh = 35 kg/h; 35 / 0.74 kg/L = 47.2973 L/h; / 3.785411784 L/gal
    // (US gallon, NIST SP 811 B.8) = 12.4946 gal/h. 350 g/kWh and 0.74 kg/L: typical, common practice, no source.
    const f = fuelFlow({ powerKw: 100, fuel: 'petrol' });
    expect(f.bsfcSource).toBe('typical');
    expect(f.kgPerHour).toBeCloseTo(35, 12);
    expect(f.litresPerHour).toBeCloseTo(47.2973, 4);
    expect(f.usGalPerHour).toBeCloseTo(12.4946, 4);
  });

  it('uses the engine’s own BSFC when given: 150 kW of diesel at 230 g/kWh is 41.07 L/h (hand-computed)', () => {
    // 150 × 230 = 34.5 kg/h; / 0.84 kg/L (typical, common practice, no source) = 41.0714 L/h.
    const f = fuelFlow({ powerKw: 150, fuel: 'diesel', bsfcGPerKwh: 230 });
    expect(f.bsfcSource).toBe('engine');
    expect(f.litresPerHour).toBeCloseTo(41.0714, 4);
  });

  it('burns less diesel than petrol by volume for the same power with typical figures', () => {
    expect(TYPICAL_BSFC_G_PER_KWH.diesel).toBeLessThan(TYPICAL_BSFC_G_PER_KWH.petrol);
    expect(fuelFlow({ powerKw: 80, fuel: 'diesel' }).litresPerHour).toBeLessThan(fuelFlow({ powerKw: 80, fuel: 'petrol' }).litresPerHour);
  });

  it('round-trips litres and US gallons, and L/h and gal/h agree for any power', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 5000, noNaN: true }), (powerKw) => {
        const f = fuelFlow({ powerKw, fuel: 'petrol' });
        expect(usGalToLitres(f.usGalPerHour) / f.litresPerHour).toBeCloseTo(1, 12);
        expect(usGalToLitres(litresToUsGal(powerKw)) / powerKw).toBeCloseTo(1, 12);
      }),
      { seed: 3, numRuns: 200 },
    );
  });
});

describe('fuelRange()', () => {
  it('gives 4.23 h and 105.7 nm for 200 L at 47.30 L/h and 25 kn, and two thirds of that keeping a third back (hand-computed)', () => {
    // 200 / 47.2973 = 4.2286 h; × 25 kn = 105.71 nm; rule of thirds (common practice, no source) leaves 2/3.
    const r = fuelRange({ tankL: 200, litresPerHour: 47.2973, speedKn: 25, reserveFraction: 1 / 3 });
    expect(r.hoursToEmpty).toBeCloseTo(4.2286, 4);
    expect(r.rangeToEmptyNm).toBeCloseTo(105.71, 2);
    expect(r.rangeWithReserveNm).toBeCloseTo(105.71 * (2 / 3), 2);
  });

  it('keeps a tenth of the tank in reserve unless told otherwise (hand-computed)', () => {
    // 200 × 0.9 / 47.2973 = 3.8057 h; × 25 kn = 95.14 nm.
    const r = fuelRange({ tankL: 200, litresPerHour: 47.2973, speedKn: 25 });
    expect(DEFAULT_RESERVE_FRACTION).toBe(0.1);
    expect(r.reserveFraction).toBe(0.1);
    expect(r.hoursWithReserve).toBeCloseTo(3.8057, 4);
    expect(r.rangeWithReserveNm).toBeCloseTo(95.14, 2);
  });

  it('has no distance without a speed and refuses a reserve of the whole tank', () => {
    expect(fuelRange({ tankL: 100, litresPerHour: 10 }).rangeToEmptyNm).toBeNull();
    expect(() => fuelRange({ tankL: 100, litresPerHour: 10, reserveFraction: 1 })).toThrow(/fuel reserve must be a fraction/);
  });
});
