/** Schema of data/engines/<id>.yaml: an engine family and its variants (tunes). */
import * as z from 'zod';
import { checkEngineLimits } from './engineLimits.ts';
import { atMost, between, label, LIMITS, name, optionalShape, positiveBetween, powerHp, powerKw, RANGES, rpm, slug, text, tolerancePct, unitChoices } from './common.ts';

export const POWER_UNITS = ['kW', 'hp', 'PS'] as const;
export const TORQUE_UNITS = ['N·m', 'Nm', 'lbf·ft', 'lbf-ft'] as const;
export const CURVE_UNITS = [...POWER_UNITS, ...TORQUE_UNITS] as const;
export type CurveUnit = (typeof CURVE_UNITS)[number];

/** A table row's or known point's power or torque, in its own unit. */
const curveValue = () => positiveBetween(RANGES.curveValue[0], RANGES.curveValue[1], 'in the unit given');

/** Full-throttle table: rows of [engine rpm, power or torque in `unit`], rpm strictly increasing. */
export const curveTable = () =>
  z
    .strictObject({
      unit: z.enum(CURVE_UNITS, { error: `must be one of ${CURVE_UNITS.join(', ')}` }),
      points: z
        .array(z.tuple([rpm(), curveValue()], { error: 'must be a row [rpm, value], e.g. [4800, 350]' }), { error: 'must be a list of rows [rpm, value]' })
        .min(2, { error: 'must have at least 2 rows [rpm, value]' })
        .max(200, { error: 'must have at most 200 rows' }),
    })
    .superRefine(
      (value, ctx) => {
        const points = Array.isArray(value?.points) ? value.points : [];
        for (let i = 1; i < points.length; i++) {
          const [prev, cur] = [points[i - 1]?.[0], points[i]?.[0]];
          if (typeof prev === 'number' && typeof cur === 'number' && !(cur > prev)) {
            ctx.addIssue({ code: 'custom', path: ['points', i, 0], message: `must be greater than the row before (${prev} rpm): rpm must increase down the table` });
          }
        }
      },
      { when: () => true },
    );

export const KNOWN_POINT_KEYS = ['power_kw', 'power_hp', 'power_ps', 'torque_nm', 'torque_lbf_ft'] as const;

/** One measured WOT point instead of a table; the model assumes constant torque through it. */
export const knownPoint = () =>
  unitChoices(
    z.strictObject({
      rpm: rpm(),
      ...optionalShape({
        power_kw: powerKw(),
        power_hp: powerHp(),
        power_ps: positiveBetween(RANGES.powerHp[0], RANGES.powerHp[1], 'PS'),
        torque_nm: positiveBetween(RANGES.curveValue[0], RANGES.curveValue[1], 'N·m'),
        torque_lbf_ft: positiveBetween(RANGES.curveValue[0], RANGES.curveValue[1], 'lbf·ft'),
      } satisfies Record<(typeof KNOWN_POINT_KEYS)[number], z.ZodType>),
    }),
    [{ keys: KNOWN_POINT_KEYS, required: true }],
  );

export const CORRECTION_STANDARDS = ['sae-j1349', 'iso-1585-si', 'iso-1585-ci'] as const;
const SPARK_STANDARDS: readonly string[] = ['sae-j1349', 'iso-1585-si'];

/** Which standard corrects the curve for air conditions; fm only for the compression-ignition one. */
export const powerCorrection = () =>
  z
    .strictObject({
      standard: z.enum(CORRECTION_STANDARDS, { error: `must be one of ${CORRECTION_STANDARDS.join(', ')}` }),
      engine_factor_fm: between(0.3, 1.2).optional().describe('Engine factor fm of ISO 1585 compression ignition, 0.3–1.2 (default 1.2)'),
    })
    .superRefine(
      (value, ctx) => {
        if (value?.engine_factor_fm !== undefined && value.standard !== 'iso-1585-ci') {
          ctx.addIssue({ code: 'custom', path: ['engine_factor_fm'], message: 'only belongs to standard iso-1585-ci (the compression-ignition formula); remove it or change the standard' });
        }
      },
      { when: () => true },
    )
    .describe('Power-correction standard: sae-j1349 or iso-1585-si for petrol, iso-1585-ci for diesel');

/** A spark-ignition standard on a diesel, or the diesel one on a petrol engine, is a mistake in the file. */
export function checkCorrectionFuel(family: unknown, ctx: z.core.$RefinementCtx): void {
  if (typeof family !== 'object' || family === null) return;
  const f = family as { fuel?: unknown; power_correction?: { standard?: unknown }; variants?: unknown };
  const petrol = f.fuel === 'petrol' || f.fuel === 'gasoline';
  const diesel = f.fuel === 'diesel';
  const check = (pc: { standard?: unknown } | undefined, path: (string | number)[]) => {
    if (typeof pc !== 'object' || pc === null || typeof pc.standard !== 'string') return;
    const spark = SPARK_STANDARDS.includes(pc.standard);
    if (diesel && spark) ctx.addIssue({ code: 'custom', path: [...path, 'standard'], message: 'is a spark-ignition standard, but the engine is a diesel; use iso-1585-ci' });
    if (petrol && pc.standard === 'iso-1585-ci') ctx.addIssue({ code: 'custom', path: [...path, 'standard'], message: 'is the compression-ignition standard, but the engine is petrol; use sae-j1349 or iso-1585-si' });
  };
  check(f.power_correction, ['power_correction']);
  if (Array.isArray(f.variants)) f.variants.forEach((v, i) => check((v as { power_correction?: { standard?: unknown } })?.power_correction, ['variants', i, 'power_correction']));
}

/** Fields a family states for all its variants and a variant may override. */
const tuneShape = {
  curve: curveTable(),
  known_point: knownPoint(),
  /** Multiplies the curve (or known point) power: 1.08 = an 8 % stronger tune. */
  curve_scale: between(0.2, 5).describe('Multiplies the curve power: 0.915 turns 250 kW into 229 kW'),
  idle_rpm: rpm().describe('Idle speed, rpm'),
  wot_window_rpm: z.tuple([rpm(), rpm()], { error: 'must be a pair [low, high] in rpm, e.g. [4600, 5000]' }).describe('Recommended wide-open-throttle window [low, high], rpm'),
  max_rpm: rpm().describe('Maximum (rev-limit) speed, rpm'),
  power_tolerance_pct: tolerancePct().describe('± % spread of real power about the curve (default 5)'),
  /** 1 = as published; 0.9 = a tired engine. */
  condition_factor: between(0.3, 1.5),
  bsfc_g_per_kwh: between(150, 600, 'g/kWh'),
  power_correction: powerCorrection(),
  reference_conditions: z.strictObject({
    pressure_kpa: between(80, 110, 'kPa').optional(),
    air_temp_c: between(-10, 50, '°C').optional(),
    humidity_pct: between(0, 100, '%').optional(),
  }),
};

const curveChoice = [{ keys: ['curve', 'known_point'], required: false }] as const;

export const engineVariant = () =>
  unitChoices(z.strictObject({ id: slug(), label: label(), notes: text().optional(), ...optionalShape(tuneShape) }), curveChoice);

export const engineFile = () =>
  unitChoices(
    z.strictObject({
      id: slug(),
      label: name(),
      maker: name(),
      fuel: z.enum(['petrol', 'gasoline', 'diesel'], { error: 'must be petrol, gasoline or diesel' }),
      aspiration: z.enum(['natural', 'turbocharged'], { error: 'must be natural or turbocharged' }),
      notes: text().optional(),
      ...optionalShape(tuneShape),
      variants: atMost(
        z.array(engineVariant(), { error: 'must be a list of variants, each with id and label' }).min(1, { error: 'must list at least one variant' }),
        LIMITS.variantsPerFamily,
        'a wall chart gives each variant a column; put further variants in a second engine family file',
      ),
    }),
    curveChoice,
  )
    .superRefine(checkEngineLimits, { when: () => true })
    .superRefine(checkCorrectionFuel, { when: () => true })
    .meta({ title: 'matchbook engine family', description: 'An engine family with its variants (tunes): data/engines/<id>.yaml' });

export type RawEngineFile = z.infer<ReturnType<typeof engineFile>>;
export type RawVariant = z.infer<ReturnType<typeof engineVariant>>;
export type RawCurveTable = z.infer<ReturnType<typeof curveTable>>;
export type RawKnownPoint = z.infer<ReturnType<typeof knownPoint>>;
