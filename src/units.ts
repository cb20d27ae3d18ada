/**
 * Unit conversions. Every factor is built from the exact definitions listed in NIST SP 811 (2008),
 * Appendix B (foot, pound, standard gravity, gallon, mile, nautical mile), never from rounded
 * printed factors, so relations such as hp = lbf·ft × rpm / 5252.113… come out by arithmetic.
 */

/** Foot in metres (exact, international foot). */
const M_PER_FT = 0.3048;
/** Inch in metres (exact). */
const M_PER_IN = 0.0254;
/** Avoirdupois pound in kilograms (exact). */
const KG_PER_LB = 0.45359237;
/** Standard acceleration of gravity, m/s² (exact, conventional). */
export const STANDARD_GRAVITY_M_S2 = 9.80665;
/** Pound-force in newtons: lb × g_n (exact). */
const N_PER_LBF = KG_PER_LB * STANDARD_GRAVITY_M_S2;
/** Conventional mercury density for the conventional inch of mercury, kg/m³ (NIST SP 811 B.8 footnote). */
const MERCURY_CONVENTIONAL_KG_M3 = 13595.1;
/** Statute mile in metres (exact). */
const M_PER_MILE = 1609.344;
/** International nautical mile in metres (exact). */
const M_PER_NMI = 1852;
/** US liquid gallon in litres (231 in³, exact). */
const LITRES_PER_US_GAL = 3.785411784;
/** Imperial gallon in litres (4.546 09 L, exact by definition; NIST SP 811 appendix B). */
const LITRES_PER_IMP_GAL = 4.54609;

/** Horsepower (550 ft·lbf/s) in watts: 745.699 871 582 270 2 W. */
export const WATTS_PER_HP = 550 * M_PER_FT * N_PER_LBF;
/** Metric horsepower (PS, 75 kgf·m/s) in watts: 735.498 75 W. */
export const WATTS_PER_PS = 75 * STANDARD_GRAVITY_M_S2;
/** Pound-force foot in newton metres: 1.355 817 948 … N·m. */
export const NM_PER_LBF_FT = M_PER_FT * N_PER_LBF;
/** Conventional inch of mercury in kilopascals: 3.386 388 6 kPa. */
export const KPA_PER_IN_HG = (MERCURY_CONVENTIONAL_KG_M3 * STANDARD_GRAVITY_M_S2 * M_PER_IN) / 1000;
/** Pound per cubic foot in kg/m³: 16.018 46 … */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / (M_PER_FT * M_PER_FT * M_PER_FT);
/** Radians per second in one rev/min. */
const RAD_S_PER_RPM = (2 * Math.PI) / 60;

export type PowerUnit = 'kW' | 'W' | 'hp' | 'PS';
export type TorqueUnit = 'N·m' | 'Nm' | 'lbf·ft' | 'lbf-ft';

/** Horsepower (550 ft·lbf/s) to kilowatts. */
export function hpToKw(hp: number): number {
  return (hp * WATTS_PER_HP) / 1000;
}
/** Kilowatts to horsepower (550 ft·lbf/s). */
export function kwToHp(kw: number): number {
  return (kw * 1000) / WATTS_PER_HP;
}
/** Metric horsepower (PS) to kilowatts. */
export function psToKw(ps: number): number {
  return (ps * WATTS_PER_PS) / 1000;
}
/** Kilowatts to metric horsepower (PS). */
export function kwToPs(kw: number): number {
  return (kw * 1000) / WATTS_PER_PS;
}

/** Shaft power in kW from torque (N·m) and speed (rpm): P = T·ω. */
export function powerKwFromTorque(args: { torqueNm: number; speedRpm: number }): number {
  return (args.torqueNm * rpmToRadPerS(args.speedRpm)) / 1000;
}
/** Shaft torque in N·m from power (kW) and speed (rpm): T = P/ω. */
export function torqueNmFromPower(args: { powerKw: number; speedRpm: number }): number {
  return (args.powerKw * 1000) / rpmToRadPerS(args.speedRpm);
}

/** Pound-force feet to newton metres. */
export function lbfFtToNm(x: number): number {
  return x * NM_PER_LBF_FT;
}
/** Newton metres to pound-force feet. */
export function nmToLbfFt(x: number): number {
  return x / NM_PER_LBF_FT;
}

/** Rev/min to rad/s. */
export function rpmToRadPerS(x: number): number {
  return x * RAD_S_PER_RPM;
}
/** Rad/s to rev/min. */
export function radPerSToRpm(x: number): number {
  return x / RAD_S_PER_RPM;
}

/** Inches of mercury (conventional) to kPa. */
export function inHgToKpa(x: number): number {
  return x * KPA_PER_IN_HG;
}
/** kPa to inches of mercury (conventional). */
export function kpaToInHg(x: number): number {
  return x / KPA_PER_IN_HG;
}
/** Hectopascals (millibar) to kPa. */
export function hpaToKpa(x: number): number {
  return x / 10;
}
/** kPa to hectopascals (millibar). */
export function kpaToHpa(x: number): number {
  return x * 10;
}

/** Degrees Fahrenheit to degrees Celsius. */
export function fToC(x: number): number {
  return (x - 32) / 1.8;
}
/** Degrees Celsius to degrees Fahrenheit. */
export function cToF(x: number): number {
  return x * 1.8 + 32;
}
/** Degrees Celsius to kelvin. */
export function cToK(x: number): number {
  return x + 273.15;
}
/** Kelvin to degrees Celsius. */
export function kToC(x: number): number {
  return x - 273.15;
}

/** Pounds (mass) to kilograms. */
export function lbToKg(x: number): number {
  return x * KG_PER_LB;
}
/** Kilograms to pounds (mass). */
export function kgToLb(x: number): number {
  return x / KG_PER_LB;
}

/** Density: lb/ft³ to kg/m³. */
export function lbFt3ToKgM3(x: number): number {
  return x * KG_M3_PER_LB_FT3;
}
/** Density: kg/m³ to lb/ft³. */
export function kgM3ToLbFt3(x: number): number {
  return x / KG_M3_PER_LB_FT3;
}

/** Knots to statute miles per hour. */
export function knToMph(x: number): number {
  return (x * M_PER_NMI) / M_PER_MILE;
}
/** Statute miles per hour to knots. */
export function mphToKn(x: number): number {
  return (x * M_PER_MILE) / M_PER_NMI;
}
/** Knots to km/h. */
export function knToKmh(x: number): number {
  return (x * M_PER_NMI) / 1000;
}
/** Knots to metres per second. */
export function knToMs(x: number): number {
  return (x * M_PER_NMI) / 3600;
}
/** Metres per second to knots. */
export function msToKn(x: number): number {
  return (x * 3600) / M_PER_NMI;
}
/** km/h to knots. */
export function kmhToKn(x: number): number {
  return (x * 1000) / M_PER_NMI;
}

/** Litres to US gallons (also L/h to US gal/h). */
export function litresToUsGal(x: number): number {
  return x / LITRES_PER_US_GAL;
}
/** Litres to imperial gallons (also L/h to imp gal/h). */
export function litresToImpGal(x: number): number {
  return x / LITRES_PER_IMP_GAL;
}
/** US gallons to litres (also US gal/h to L/h). */
export function usGalToLitres(x: number): number {
  return x * LITRES_PER_US_GAL;
}

const WATTS_PER_UNIT: Readonly<Record<PowerUnit, number>> = { kW: 1000, W: 1, hp: WATTS_PER_HP, PS: WATTS_PER_PS };
const NM_PER_UNIT: Readonly<Record<TorqueUnit, number>> = {
  'N·m': 1,
  Nm: 1,
  'lbf·ft': NM_PER_LBF_FT,
  'lbf-ft': NM_PER_LBF_FT,
};

/** A power in the given unit, in kW. */
export function powerToKw(value: number, unit: PowerUnit): number {
  return unit === 'kW' ? value : (value * WATTS_PER_UNIT[unit]) / 1000;
}
/** A power in kW, in the given unit. */
export function kwToPower(kw: number, unit: PowerUnit): number {
  return unit === 'kW' ? kw : (kw * 1000) / WATTS_PER_UNIT[unit];
}
/** A torque in the given unit, in N·m. */
export function torqueToNm(value: number, unit: TorqueUnit): number {
  return value * NM_PER_UNIT[unit];
}
/** A torque in N·m, in the given unit. */
export function nmToTorque(nm: number, unit: TorqueUnit): number {
  return nm / NM_PER_UNIT[unit];
}
