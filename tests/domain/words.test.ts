import { describe, expect, it } from 'vitest';
import { countOf } from '@/domain/words';

describe('plural forms', () => {
  it('uses the singular for exactly one and the plural otherwise', () => {
    expect(countOf(1, 'note')).toBe('1 note');
    expect(countOf(2, 'note')).toBe('2 notes');
    expect(countOf(0, 'error')).toBe('0 errors');
    expect(countOf(1, 'error')).toBe('1 error');
  });

  it('takes an irregular plural and groups thousands', () => {
    expect(countOf(1, 'notch', 'notches')).toBe('1 notch');
    expect(countOf(4, 'notch', 'notches')).toBe('4 notches');
    expect(countOf(12000, 'part')).toBe('12,000 parts');
  });
});
