import { describe, expect, it } from 'vitest';
import { formatAgo } from '@/lib/format';

describe('relative times', () => {
  const now = Date.parse('2026-03-10T12:00:00Z');
  it.each([
    ['2026-03-10T11:59:30Z', 'just now'],
    ['2026-03-10T11:58:00Z', '2 minutes ago'],
    ['2026-03-10T11:00:00Z', '1 hour ago'],
    ['2026-03-07T12:00:00Z', '3 days ago'],
  ])('shows %s as "%s"', (iso, expected) => {
    expect(formatAgo(iso, now)).toBe(expected);
  });

  it('shows a date for anything older than a month', () => {
    expect(formatAgo('2026-01-02T12:00:00Z', now)).toBe('2 Jan 2026');
  });
});
