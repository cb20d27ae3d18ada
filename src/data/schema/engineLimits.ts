/**
 * Checks across an engine file's fields, per variant after merging it over the family:
 * a curve or known point exists, idle < window low <= window high <= max, known point inside [idle, max].
 * Works on the unvalidated value (guards every type) so it reports even when other fields failed.
 */
import type * as z from 'zod';

type Path = (string | number)[];
type Ctx = z.core.$RefinementCtx;
type Picked = { value: unknown; path: Path } | undefined;

const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);
const isNum = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/** Add an issue for every limit problem of every variant (repeats of a family-level fault are merged later). */
export function checkEngineLimits(family: unknown, ctx: Ctx): void {
  if (!isRecord(family) || !Array.isArray(family.variants)) return;
  family.variants.forEach((variant, i) => {
    if (!isRecord(variant)) return;
    const pick = (key: string): Picked =>
      variant[key] !== undefined ? { value: variant[key], path: ['variants', i, key] } : family[key] !== undefined ? { value: family[key], path: [key] } : undefined;
    const needs = (message: string) => ctx.addIssue({ code: 'custom', path: ['variants', i], message, params: { found: 'none' } });
    const ownCurve = variant.curve !== undefined || variant.known_point !== undefined;
    const known = ownCurve ? (variant.known_point !== undefined ? { value: variant.known_point, path: ['variants', i, 'known_point'] } : undefined) : pick('known_point');
    if (!ownCurve && family.curve === undefined && family.known_point === undefined) needs('needs a curve or a known_point (on the variant or the family)');
    const [idle, window, max] = [pick('idle_rpm'), pick('wot_window_rpm'), pick('max_rpm')];
    if (!idle) needs('needs idle_rpm (on the variant or the family)');
    if (!window) needs('needs wot_window_rpm (on the variant or the family)');
    if (!max) needs('needs max_rpm (on the variant or the family)');
    checkOrder({ idle, window, max, known, ctx });
  });
}

function checkOrder(args: { idle: Picked; window: Picked; max: Picked; known: Picked; ctx: Ctx }): void {
  const { idle, window, max, known, ctx } = args;
  const issue = (path: Path, message: string) => ctx.addIssue({ code: 'custom', path, message });
  const pair = Array.isArray(window?.value) ? window.value : [];
  const [low, high] = [pair[0], pair[1]];
  if (window && isNum(low) && isNum(high) && !(low <= high)) issue([...window.path, 1], `must be at least the window's low end (${low} rpm): write [low, high]`);
  if (window && idle && isNum(low) && isNum(idle.value) && !(idle.value < low)) {
    issue([...window.path, 0], `must be above idle_rpm (${idle.value} rpm): the WOT window lies inside [idle, max]`);
  }
  if (window && max && isNum(high) && isNum(max.value) && !(high <= max.value)) {
    issue([...window.path, 1], `must be at most max_rpm (${max.value} rpm): the WOT window lies inside [idle, max]`);
  }
  const knownRpm = isRecord(known?.value) ? known.value.rpm : undefined;
  if (known && isNum(knownRpm) && idle && max && isNum(idle.value) && isNum(max.value) && !(knownRpm >= idle.value && knownRpm <= max.value)) {
    issue([...known.path, 'rpm'], `must lie between idle_rpm (${idle.value}) and max_rpm (${max.value})`);
  }
}
