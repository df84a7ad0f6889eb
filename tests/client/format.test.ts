import { describe, expect, it } from 'vitest';
import { firstName, formatRelativeTime, pluralize } from '@/lib/format';

const now = new Date('2026-03-12T12:00:00.000Z');
const ago = (ms: number) => new Date(now.getTime() - ms).toISOString();

describe('formatRelativeTime', () => {
  it('says "just now" under a minute', () => expect(formatRelativeTime(ago(30_000), now)).toBe('just now'));
  it('counts whole minutes under an hour', () => expect(formatRelativeTime(ago(3 * 60_000 + 20_000), now)).toBe('3 min ago'));
  it('counts whole hours under a day', () => expect(formatRelativeTime(ago(5 * 3_600_000), now)).toBe('5 h ago'));
  it('says "yesterday" for one day', () => expect(formatRelativeTime(ago(30 * 3_600_000), now)).toBe('yesterday'));
  it('counts days under a week', () => expect(formatRelativeTime(ago(4 * 86_400_000), now)).toBe('4 days ago'));
  it('gives the calendar date after a week', () => expect(formatRelativeTime('2026-01-05T10:00:00.000Z', now)).toBe('5 Jan 2026'));
  it('does not pretend to know the time of a malformed date', () => expect(formatRelativeTime('soon', now)).toBe('at an unknown time'));
});

describe('names and counts', () => {
  it('takes the first word of a display name', () => expect(firstName('Tomasz Reyes')).toBe('Tomasz'));
  it('uses the singular for one', () => expect(pluralize(1, 'profile')).toBe('1 profile'));
  it('uses the plural otherwise', () => expect(pluralize(0, 'profile')).toBe('0 profiles'));
});
