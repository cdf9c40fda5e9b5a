import { describe, expect, it } from 'vitest';
import { formatDateTime, formatTimeSpan } from '@/lib/format/format-date';

/** Dates and spans as the history panel prints them: UTC, the zone named, ISO 8601 day order. */
describe('formatTimeSpan', () => {
  it('within one UTC day: the day once, then the two times', () => {
    expect(formatTimeSpan('2026-12-02T09:02:40Z', '2026-12-02T09:18:05Z')).toBe('2026-12-02 09:02–09:18 UTC');
  });
  it('across midnight UTC: both dates and times', () => {
    expect(formatTimeSpan('2026-12-02T23:55:00Z', '2026-12-03T00:04:00Z')).toBe(
      '2026-12-02 23:55 UTC – 2026-12-03 00:04 UTC',
    );
  });
  it('keeps what it cannot read as it was', () => {
    expect(formatTimeSpan('soon', '2026-12-02T09:00:00Z')).toBe('soon–2026-12-02T09:00:00Z');
    expect(formatDateTime('later')).toBe('later');
  });
});
