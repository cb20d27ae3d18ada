/** Engine family file → EngineFamily: variants merged over the family's fields, curves converted to kW. */
import type { CurvePoint, CurveSource, EngineLimits } from '../../model/types.ts';
import { powerKwFromTorque, powerToKw, torqueToNm, type TorqueUnit } from '../../units.ts';
import type { DataError, EngineFamily, EngineVariant } from '../types.ts';
import type { RawCurveTable, RawEngineFile, RawKnownPoint, RawVariant } from '../schema/engine.ts';
import { RANGES } from '../schema/common.ts';
import { KNOWN_POINT_KEYS, POWER_UNITS } from '../schema/engine.ts';
import { at } from '../validate.ts';
import type { PathSegment, YamlSource } from '../yamlSource.ts';
import { STANDARD_REFERENCE } from './conditions.ts';
import { duplicateIds, type Normalised } from './shared.ts';

/** Power tolerance when the file gives none, ± % (common practice, no source). */
export const DEFAULT_POWER_TOLERANCE_PCT = 5;

type Tune = Omit<RawVariant, 'id' | 'label' | 'notes'>;
type TuneKey = keyof Tune;
/** A merged tune value and the path it was written at (for messages). */
type Sourced<T> = { value: T; path: PathSegment[] } | undefined;

/** Normalise a validated engine file; errors located in its source. */
export function normaliseEngine(source: YamlSource, raw: RawEngineFile): Normalised<EngineFamily> {
  const errors: DataError[] = [...duplicateIds(source, raw.variants, ['variants'])];
  const warnings: DataError[] = [];
  const variants: EngineVariant[] = [];
  raw.variants.forEach((v, i) => {
    const pick = <K extends TuneKey>(key: K): Sourced<NonNullable<Tune[K]>> =>
      pickTune({ family: raw, variant: v, index: i, key });
    // A variant's own curve or known point replaces whichever the family gave.
    const ownCurve = v.curve !== undefined || v.known_point !== undefined;
    const curve = ownCurve ? pickOwn(v, i, 'curve') : pick('curve');
    const known = ownCurve ? pickOwn(v, i, 'known_point') : pick('known_point');
    // The schema (engineLimits.ts) has already checked that all of these exist and are in order.
    const [idle, window, max] = [pick('idle_rpm'), pick('wot_window_rpm'), pick('max_rpm')];
    if (!idle || !window || !max || (!curve && !known)) return;
    const limits: EngineLimits = { idleRpm: idle.value, windowLowRpm: window.value[0], windowHighRpm: window.value[1], maxRpm: max.value };
    const scale = pick('curve_scale')?.value ?? 1;
    const source_ = curve ? tableSource(curve.value, scale) : knownSource(known!.value, scale);
    // One report per row: variants sharing the family's table say it once (the first variant's figures).
    for (const e of powerOutOfRange({ source, curve, known, source_, scaled: pick('curve_scale') !== undefined })) {
      if (!errors.some((x) => x.line === e.line && x.column === e.column)) errors.push(e);
    }
    if (curve) warnShortTable({ source, warnings, curve, limits });
    const ref = pick('reference_conditions')?.value;
    const bsfc = pick('bsfc_g_per_kwh')?.value;
    const correction = pick('power_correction')?.value;
    variants.push({
      id: `${raw.id}/${v.id}`,
      familyId: raw.id,
      variantId: v.id,
      variantLabel: v.label,
      label: `${raw.label} ${v.label}`,
      fuel: raw.fuel === 'gasoline' ? 'petrol' : raw.fuel,
      aspiration: raw.aspiration,
      curve: source_,
      limits,
      powerTolerancePct: pick('power_tolerance_pct')?.value ?? DEFAULT_POWER_TOLERANCE_PCT,
      referenceAmbient: {
        pressureKpa: ref?.pressure_kpa ?? STANDARD_REFERENCE.pressureKpa,
        airTempC: ref?.air_temp_c ?? STANDARD_REFERENCE.airTempC,
        relativeHumidityPct: ref?.humidity_pct ?? STANDARD_REFERENCE.relativeHumidityPct,
      },
      conditionFactor: pick('condition_factor')?.value ?? 1,
      ...(correction !== undefined
        ? { correction: { standard: correction.standard, ...(correction.engine_factor_fm !== undefined ? { engineFactorFm: correction.engine_factor_fm } : {}) } }
        : {}),
      ...(bsfc !== undefined ? { bsfcGPerKwh: bsfc } : {}),
      ...(v.notes !== undefined ? { notes: v.notes } : {}),
    });
  });
  if (errors.length > 0) return { ok: false, errors, warnings };
  const family: EngineFamily = {
    id: raw.id,
    label: raw.label,
    maker: raw.maker,
    fuel: raw.fuel === 'gasoline' ? 'petrol' : raw.fuel,
    ...(raw.notes !== undefined ? { notes: raw.notes } : {}),
    variants,
    source: { file: source.file },
  };
  return { ok: true, value: family, warnings };
}

function pickTune<K extends TuneKey>(args: { family: Tune; variant: RawVariant; index: number; key: K }): Sourced<NonNullable<Tune[K]>> {
  const own = args.variant[args.key];
  if (own !== undefined) return { value: own as NonNullable<Tune[K]>, path: ['variants', args.index, args.key] };
  const fam = args.family[args.key];
  return fam !== undefined ? { value: fam as NonNullable<Tune[K]>, path: [args.key] } : undefined;
}

function pickOwn<K extends 'curve' | 'known_point'>(v: RawVariant, i: number, key: K): Sourced<NonNullable<RawVariant[K]>> {
  const own = v[key];
  return own !== undefined ? { value: own as NonNullable<RawVariant[K]>, path: ['variants', i, key] } : undefined;
}

/** Power in kW from a table value: a power directly, a torque through P = T·ω. */
export function valueToKw(args: { value: number; unit: RawCurveTable['unit']; speedRpm: number }): number {
  const { value, unit, speedRpm } = args;
  if ((POWER_UNITS as readonly string[]).includes(unit)) return powerToKw(value, unit as (typeof POWER_UNITS)[number]);
  return powerKwFromTorque({ torqueNm: torqueToNm(value, unit as TorqueUnit), speedRpm });
}

function tableSource(table: RawCurveTable, scale: number): CurveSource {
  const points: CurvePoint[] = table.points.map(([speedRpm, value]) => ({ speedRpm, powerKw: scale * valueToKw({ value, unit: table.unit, speedRpm }) }));
  return { kind: 'table', points };
}

function knownSource(k: RawKnownPoint, scale: number): CurveSource {
  const powerKw =
    k.power_kw ?? (k.power_hp !== undefined ? powerToKw(k.power_hp, 'hp') : k.power_ps !== undefined ? powerToKw(k.power_ps, 'PS')
      : k.torque_nm !== undefined ? powerKwFromTorque({ torqueNm: k.torque_nm, speedRpm: k.rpm })
      : powerKwFromTorque({ torqueNm: torqueToNm(k.torque_lbf_ft ?? Number.NaN, 'lbf·ft'), speedRpm: k.rpm }));
  return { kind: 'knownPoint', point: { speedRpm: k.rpm, powerKw: scale * powerKw } };
}

/**
 * Each row (or the known point) as power, after curve_scale, within the power range of every other
 * field (RANGES.powerKw): a torque row of 100000 N·m is in its own range but makes 52 MW at 5000 rpm.
 */
function powerOutOfRange(args: {
  source: YamlSource;
  curve: Sourced<RawCurveTable>;
  known: Sourced<RawKnownPoint>;
  source_: CurveSource;
  scaled: boolean;
}): DataError[] {
  const [lo, hi] = RANGES.powerKw;
  const points = args.source_.kind === 'table' ? args.source_.points : [args.source_.point];
  const knownKey = args.known ? KNOWN_POINT_KEYS.find((k) => args.known!.value[k] !== undefined) : undefined;
  return points.flatMap((p, i) => {
    if (p.powerKw >= lo && p.powerKw <= hi) return [];
    const path = args.curve ? [...args.curve.path, 'points', i, 1] : [...args.known!.path, knownKey ?? 'rpm'];
    const kw = p.powerKw < 1 ? p.powerKw.toPrecision(2) : String(Math.round(p.powerKw));
    return [
      at(args.source, path, {
        expected: `must give a power between ${lo} and ${hi} kW${args.scaled ? ' (after curve_scale)' : ''}, the powers of engines a waterjet is fitted to; it gives ${kw} kW at ${p.speedRpm} rpm`,
        fix: 'check the unit of the table and the value',
      }),
    ];
  });
}

/** The model never extrapolates a table: say so when the table stops short of the WOT window. */
function warnShortTable(args: { source: YamlSource; warnings: DataError[]; curve: { value: RawCurveTable; path: PathSegment[] }; limits: EngineLimits }): void {
  const rows = args.curve.value.points;
  const lastRpm = rows[rows.length - 1][0];
  if (lastRpm < args.limits.windowHighRpm) {
    args.warnings.push(
      at(args.source, [...args.curve.path, 'points', rows.length - 1, 0], {
        expected: `should reach the top of the WOT window (${args.limits.windowHighRpm} rpm); no prediction is made above the table's last row`,
      }),
    );
  }
}
