import { describe, expect, it } from 'vitest';
import { sqliteDateToIso } from '../../server/db/dates';

describe('sqliteDateToIso', () => {
  it('turns the text Sequelize stores in SQLite into the same ISO instant a Date would give', () => {
    const stored = '2026-01-02 03:04:05.678 +00:00';
    expect(sqliteDateToIso(stored)).toBe(new Date('2026-01-02T03:04:05.678Z').toISOString());
  });

  it('still converts other offsets and forms through a Date', () => {
    expect(sqliteDateToIso('2026-01-02 03:04:05.678 +02:00')).toBe('2026-01-02T01:04:05.678Z');
    expect(sqliteDateToIso('2026-01-02 03:04:05')).toBe(new Date('2026-01-02T03:04:05').toISOString());
  });

  it('leaves text that is not a date as it is', () => {
    expect(sqliteDateToIso('not a date')).toBe('not a date');
  });
});
