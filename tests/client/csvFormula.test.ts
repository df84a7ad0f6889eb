import { describe, expect, it } from 'vitest';
import { cutListToCsv } from '@/components/outputs/csv';
import { escapeCsvFormula, toCsv } from '@/domain/outputs/csv';
import type { CutListGroup } from '@/domain/analysis/types';

// Formula injection (defect 6): OWASP "CSV Injection" lists =, +, -, @, tab and carriage return as
// the characters that make a spreadsheet evaluate a cell.
describe('CSV downloads and formula injection', () => {
  it.each(['=HYPERLINK("http://evil.example","click")', '+1+1', '-2+3', '@SUM(A1)', '\t=1', '\r=1'])('escapes a text cell starting like a formula: %j', (cell) => {
    expect(escapeCsvFormula(cell)).toBe(`'${cell}`);
  });

  it('leaves numbers, negative numbers and ordinary text alone', () => {
    expect(escapeCsvFormula(-12.5)).toBe(-12.5);
    expect(escapeCsvFormula('Left leg')).toBe('Left leg');
    expect(toCsv([[-3, 'a=b']], { fields: ['n', 't'] })).toBe('n,t\r\n-3,a=b');
  });

  it('escapes a profile label that reaches the cut-list CSV', () => {
    const group = {
      profileIds: ['p1'],
      variantId: 'm40-40x40',
      length: 500,
      quantity: 1,
      tolerance: 0.5,
      ends: { start: { description: 'Square cut' }, end: { description: 'Square cut' } },
      machining: [],
    } as unknown as CutListGroup;
    const csv = cutListToCsv([group], { p1: '=HYPERLINK("http://evil.example")' }, 'mm');
    expect(csv.split('\r\n')[1].startsWith(`"'=HYPERLINK(""http://evil.example"")"`)).toBe(true);
  });

  it('escapes object rows too (the command line)', () => {
    expect(toCsv([{ code: '@cmd', qty: 2 }], { newline: '\n' })).toBe("code,qty\n'@cmd,2");
  });
});
