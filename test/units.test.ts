import { describe, expect, it } from 'vitest';
import * as u from '../src/units.ts';

// NIST SP 811 (2008) Appendix B.8/B.9 prints factors to 7 significant digits; we check ours against the
// printed values at that precision, and the derived ones against the exact definitions.
describe('units', () => {
  it('horsepower and metric horsepower match NIST SP 811', () => {
    expect(u.WATTS_PER_HP).toBeCloseTo(745.6998715822702, 10); // NIST SP 811 B.8: hp (550 ft·lbf/s) = 745.699 871 582 270 2 W
    expect(u.WATTS_PER_PS).toBe(735.49875); // NIST SP 811 B.8: horsepower, metric = 735.498 75 W (exact)
    expect(u.hpToKw(100)).toBeCloseTo(74.56999, 5);
    expect(u.psToKw(100)).toBeCloseTo(73.549875, 9);
    expect(u.kwToHp(u.hpToKw(317))).toBeCloseTo(317, 12);
    expect(u.kwToPs(u.psToKw(42))).toBeCloseTo(42, 12);
  });

  it('torque factor matches NIST SP 811 and the derived shop constants 5252.113 and 9549.297', () => {
    expect(u.NM_PER_LBF_FT).toBeCloseTo(1.355818, 6); // NIST SP 811 B.8: lbf·ft = 1.355 818 N·m
    expect(u.lbfFtToNm(100)).toBeCloseTo(135.5818, 4);
    expect(u.nmToLbfFt(u.lbfFtToNm(250))).toBeCloseTo(250, 12);
    // REFERENCES.md (derived from NIST SP 811): hp = lbf·ft × rpm / 5252.113 (= 33 000 / 2π).
    const hp = u.kwToHp(u.powerKwFromTorque({ torqueNm: u.lbfFtToNm(300), speedRpm: 4000 }));
    expect(hp).toBeCloseTo((300 * 4000) / 5252.113, 3);
    // kW = N·m × rpm / 9549.297 (= 60 000 / 2π).
    expect(u.powerKwFromTorque({ torqueNm: 400, speedRpm: 3000 })).toBeCloseTo((400 * 3000) / 9549.297, 4);
    expect(u.torqueNmFromPower({ powerKw: 125.664, speedRpm: 3000 })).toBeCloseTo(400, 2);
  });

  it('shaft speed: 60 rpm is 2π rad/s', () => {
    expect(u.rpmToRadPerS(60)).toBeCloseTo(2 * Math.PI, 14);
    expect(u.radPerSToRpm(u.rpmToRadPerS(5500))).toBeCloseTo(5500, 10);
  });

  it('pressure: the conventional inch of mercury matches NIST SP 811, hPa is a tenth of a kPa', () => {
    expect(u.inHgToKpa(1)).toBeCloseTo(3.386389, 6); // NIST SP 811 B.8: inch of mercury, conventional = 3.386 389 E+03 Pa
    expect(u.inHgToKpa(29.92)).toBeCloseTo(101.3207, 3); // 29.92 inHg is the familiar sea-level altimeter setting ≈ 101.32 kPa
    expect(u.kpaToInHg(u.inHgToKpa(30.1))).toBeCloseTo(30.1, 12);
    expect(u.hpaToKpa(1013.25)).toBeCloseTo(101.325, 12);
    expect(u.kpaToHpa(99)).toBeCloseTo(990, 12);
  });

  it('temperature: °F, °C and K', () => {
    expect(u.fToC(212)).toBeCloseTo(100, 12); // boiling point of water at one atmosphere, by definition of the scales
    expect(u.cToF(-40)).toBeCloseTo(-40, 12);
    expect(u.cToK(25)).toBeCloseTo(298.15, 12); // NIST SP 811 §4.2.1.1: T/K = t/°C + 273.15
    expect(u.kToC(273.15)).toBe(0);
  });

  it('mass and density match NIST SP 811', () => {
    expect(u.lbToKg(1)).toBe(0.45359237); // NIST SP 811 B.8: pound (avoirdupois) = 0.453 592 37 kg exactly
    expect(u.kgToLb(u.lbToKg(3500))).toBeCloseTo(3500, 10);
    expect(u.lbFt3ToKgM3(1)).toBeCloseTo(16.01846, 5); // NIST SP 811 B.8: lb/ft³ = 1.601 846 E+01 kg/m³
    expect(u.kgM3ToLbFt3(1025)).toBeCloseTo(63.99, 2);
  });

  it('boat speed: knots, mph and km/h match NIST SP 811', () => {
    expect(u.knToKmh(1)).toBe(1.852); // NIST SP 811 B.8: knot = 1852 m/h exactly
    expect(u.knToMph(1)).toBeCloseTo(1.150779, 6); // 1852 m / 1609.344 m (mile, exact)
    expect(u.mphToKn(u.knToMph(38))).toBeCloseTo(38, 12);
    expect(u.kmhToKn(u.knToKmh(21))).toBeCloseTo(21, 12);
  });

  it('fuel volume flow: US gallon is 3.785 411 784 L', () => {
    expect(u.usGalToLitres(1)).toBe(3.785411784); // NIST SP 811 B.8: gallon (US) = 3.785 412 E-03 m³ (231 in³ exact)
    expect(u.litresToUsGal(37.85411784)).toBeCloseTo(10, 12);
  });

  it('powerToKw and torqueToNm read every unit the data files may use', () => {
    expect(u.powerToKw(250, 'kW')).toBe(250);
    expect(u.powerToKw(250000, 'W')).toBe(250);
    expect(u.powerToKw(300, 'hp')).toBeCloseTo(u.hpToKw(300), 12);
    expect(u.powerToKw(300, 'PS')).toBeCloseTo(u.psToKw(300), 12);
    for (const unit of ['kW', 'W', 'hp', 'PS'] as const) expect(u.kwToPower(u.powerToKw(123.4, unit), unit)).toBeCloseTo(123.4, 10);
    expect(u.torqueToNm(100, 'N·m')).toBe(100);
    expect(u.torqueToNm(100, 'Nm')).toBe(100);
    expect(u.torqueToNm(100, 'lbf·ft')).toBeCloseTo(135.5818, 4);
    expect(u.torqueToNm(100, 'lbf-ft')).toBeCloseTo(135.5818, 4);
    expect(u.nmToTorque(135.5818, 'lbf-ft')).toBeCloseTo(100, 4);
  });
});
