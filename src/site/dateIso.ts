/**
 * The one date printed on sheets and pages. Builds must be reproducible, so the clock is never read:
 * SOURCE_DATE_EPOCH (seconds since 1970-01-01 UTC, the reproducible-builds convention) wins,
 * else the project's configured issue date.
 */

export class BuildDateError extends Error {}

/** ISO date (YYYY-MM-DD, UTC) from SOURCE_DATE_EPOCH, else the given issue date. */
export function buildDateIso(args: { sourceDateEpoch?: string; issueDate: string }): string {
  const raw = args.sourceDateEpoch?.trim();
  if (raw === undefined || raw === '') return args.issueDate;
  if (!/^\d+$/.test(raw)) {
    throw new BuildDateError(
      `SOURCE_DATE_EPOCH must be a whole number of seconds since 1970-01-01 UTC, found "${raw}"; ` +
        'unset it or set it to, for example, 1767225600',
    );
  }
  return new Date(Number(raw) * 1000).toISOString().slice(0, 10);
}
