import { describe, expect, it } from 'vitest';
import { BuildDateError, buildDateIso } from '../../src/site/dateIso.ts';

describe('buildDateIso()', () => {
  it('takes the date from SOURCE_DATE_EPOCH in UTC', () => {
    // 1767225600 s = 2026-01-01T00:00:00Z (20454 days × 86400 s).
    expect(buildDateIso({ sourceDateEpoch: '1767225600', issueDate: '2020-05-05' })).toBe('2026-01-01');
    expect(buildDateIso({ sourceDateEpoch: '1767225599', issueDate: '2020-05-05' })).toBe('2025-12-31');
  });

  it('falls back to the configured issue date when SOURCE_DATE_EPOCH is unset or empty', () => {
    expect(buildDateIso({ issueDate: '2026-11-02' })).toBe('2026-11-02');
    expect(buildDateIso({ sourceDateEpoch: '', issueDate: '2026-11-02' })).toBe('2026-11-02');
  });

  it('refuses a SOURCE_DATE_EPOCH that is not whole seconds, naming the value', () => {
    expect(() => buildDateIso({ sourceDateEpoch: '2026-01-01', issueDate: '2026-11-02' })).toThrow(BuildDateError);
    expect(() => buildDateIso({ sourceDateEpoch: '12.5', issueDate: '2026-11-02' })).toThrow(/found "12.5"/);
  });
});
