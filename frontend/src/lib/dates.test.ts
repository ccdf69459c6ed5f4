import { formatDate, formatDateTime } from '@tiermode/shared-types';
import { describe, expect, it } from 'vitest';

describe('the one date format', () => {
  it('writes a moment as YYYY-MM-DD HH:MM UTC and a day as YYYY-MM-DD, whatever the locale', () => {
    expect(formatDateTime('2026-12-03T14:05:59.900Z')).toBe('2026-12-03 14:05 UTC');
    expect(formatDateTime('2026-12-03T23:30:00+02:00')).toBe('2026-12-03 21:30 UTC');
    expect(formatDate('2027-06-30')).toBe('2027-06-30');
    expect(formatDate('2026-12-03T14:05:00Z')).toBe('2026-12-03');
    expect(formatDateTime(null)).toBe('—');
    expect(formatDateTime('not a date', '')).toBe('');
  });
});
