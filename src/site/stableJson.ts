/**
 * Reproducible JSON for the results downloads: object keys sorted, numbers rounded to a fixed number
 * of decimals (so a last-bit floating-point difference between machines never changes a file),
 * -0 written as 0, non-finite numbers as null, two-space indent and a final newline.
 */

export interface StableJsonOptions {
  /** Decimal places kept for every number (default 4). */
  readonly decimals?: number;
}

/** A number as the results files write it: rounded to `decimals` places, -0 as 0, non-finite as null. */
export function stableNumber(value: number, decimals = 4): number | null {
  if (!Number.isFinite(value)) return null;
  const rounded = Number(value.toFixed(decimals));
  return Object.is(rounded, -0) ? 0 : rounded;
}

function normalise(value: unknown, decimals: number): unknown {
  if (typeof value === 'number') return stableNumber(value, decimals);
  if (Array.isArray(value)) return value.map((v) => normalise(v, decimals));
  if (value instanceof Map) return normalise(Object.fromEntries(value), decimals);
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort()) {
      const v = (value as Record<string, unknown>)[key];
      if (v !== undefined && typeof v !== 'function') out[key] = normalise(v, decimals);
    }
    return out;
  }
  return value;
}

/** Serialises a value with sorted keys and fixed number precision. */
export function stableJson(value: unknown, opts: StableJsonOptions = {}): string {
  return `${JSON.stringify(normalise(value, opts.decimals ?? 4), null, 2)}\n`;
}
