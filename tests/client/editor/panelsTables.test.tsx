// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import Papa from 'papaparse';
import { PartsTab } from '@/components/outputs/PartsTab';
import { CutsTab } from '@/components/outputs/CutsTab';
import { BOM_CSV_HEADER, bomToCsv, cutListCsvHeader, cutListToCsv } from '@/components/outputs/csv';
import { csvFileName } from '@/components/outputs/format';
import { handMadeAnalysis } from './panelsFixtures';

afterEach(cleanup);

function bodyRows(table: HTMLElement) {
  return within(table)
    .getAllByRole('row')
    .filter((row) => row.closest('tbody') && within(row).queryAllByRole('cell').length > 0);
}

describe('Parts tab (bill of materials)', () => {
  it('renders each line with its quantity and unit, and a totals row', () => {
    const analysis = handMadeAnalysis();
    render(<PartsTab lines={analysis.bom} units="mm" designName="Bench shelf" />);
    const table = screen.getByRole('table', { name: 'Bill of materials' });
    const bracketRow = within(table).getByText('Inside corner bracket, 40').closest('tr')!;
    expect(within(bracketRow).getByText('8 pcs')).toBeInTheDocument();
    expect(within(bracketRow).getByText('$10.00')).toBeInTheDocument();
    const profileRow = within(table).getByText('Profile 40 x 40 mm').closest('tr')!;
    expect(within(profileRow).getByText('2.000 m')).toBeInTheDocument();
    expect(within(profileRow).getByText('4 pieces')).toBeInTheDocument();
    expect(within(profileRow).getByText('$12.00/m')).toBeInTheDocument();
    const footer = table.querySelector('tfoot')!;
    expect(footer).toHaveTextContent('$40.70');
  });

  it('groups lines in sections by category, profiles first', () => {
    const analysis = handMadeAnalysis();
    render(<PartsTab lines={analysis.bom} units="mm" designName="Bench shelf" />);
    const sectionHeaders = screen.getAllByRole('rowheader').map((cell) => cell.textContent);
    expect(sectionHeaders[0]).toMatch(/^Profiles/);
    expect(sectionHeaders).toEqual(expect.arrayContaining([expect.stringMatching(/^Screws/), expect.stringMatching(/^T-nuts/)]));
  });

  it('sorts by line price when the header is pressed and says so with aria-sort', async () => {
    const user = userEvent.setup();
    const analysis = handMadeAnalysis();
    // One category so the sort order is visible across all rows.
    const lines = analysis.bom.map((line) => ({ ...line, category: 'accessory' as const }));
    render(<PartsTab lines={lines} units="mm" designName="Bench shelf" />);
    const table = screen.getByRole('table', { name: 'Bill of materials' });
    const header = within(table).getByRole('columnheader', { name: /Line price/ });
    expect(header).toHaveAttribute('aria-sort', 'none');
    await user.click(within(header).getByRole('button'));
    const first = header.getAttribute('aria-sort');
    expect(first === 'ascending' || first === 'descending').toBe(true);
    const prices = () => bodyRows(table).map((row) => within(row).getAllByRole('cell').at(-1)!.textContent);
    const expectedAscending = ['$1.50', '$2.00', '$3.20', '$10.00', '$24.00'];
    expect(prices()).toEqual(first === 'ascending' ? expectedAscending : [...expectedAscending].reverse());
    await user.click(within(header).getByRole('button'));
    expect(header).toHaveAttribute('aria-sort', first === 'ascending' ? 'descending' : 'ascending');
    expect(prices()).toEqual(first === 'ascending' ? [...expectedAscending].reverse() : expectedAscending);
  });

  it('shows inch users feet and per-foot prices', () => {
    const analysis = handMadeAnalysis();
    render(<PartsTab lines={analysis.bom} units="in" designName="Bench shelf" />);
    const profileRow = screen.getByText('Profile 40 x 40 mm').closest('tr')!;
    expect(within(profileRow).getByText('6.56 ft')).toBeInTheDocument(); // 2 m / 0.3048 m per ft
    expect(within(profileRow).getByText('$3.66/ft')).toBeInTheDocument(); // $12/m x 0.3048
    expect(within(profileRow).getByText('ft')).toBeInTheDocument();
    expect(within(profileRow).queryByText('m')).not.toBeInTheDocument();
  });
});

describe('CSV downloads', () => {
  it('writes the bill of materials with the agreed header, one row per line and a total', () => {
    const analysis = handMadeAnalysis();
    const parsed = Papa.parse<string[]>(bomToCsv(analysis.bom), { skipEmptyLines: true });
    expect(parsed.data[0]).toEqual([...BOM_CSV_HEADER]);
    expect(parsed.data[0]).toEqual(['Code', 'Description', 'Category', 'Quantity', 'Unit', 'Unit mass (kg)', 'Unit price (USD, demo)', 'Line price (USD, demo)']);
    expect(parsed.data).toHaveLength(1 + analysis.bom.length + 1);
    expect(parsed.data[2]).toEqual(['BR-40', 'Inside corner bracket, 40', 'connector', '8', 'pcs', '0.05', '1.25', '10']);
    expect(parsed.data.at(-1)).toEqual(['Total', '', '', '', '', '', '', '40.7']);
  });

  it('writes the cut list with lengths in the chosen units and machining positions from a named end', () => {
    const analysis = handMadeAnalysis();
    const labels = Object.fromEntries(analysis.cutList.map((item) => [item.id, item.label]));
    const mm = Papa.parse<string[]>(cutListToCsv(analysis.cutGroups, labels, 'mm'), { skipEmptyLines: true }).data;
    expect(mm[0]).toEqual(cutListCsvHeader('mm'));
    expect(mm[0]).toContain('Length (mm)');
    expect(mm).toHaveLength(3);
    expect(mm[1].slice(0, 4)).toEqual(['Front rail Back rail', 'm40-40x40', '600', '2']);
    expect(mm[1].at(-1)).toBe('Access counterbore Ø 7.5 mm, 20 mm from start, face 0');
    const inch = Papa.parse<string[]>(cutListToCsv(analysis.cutGroups, labels, 'in'), { skipEmptyLines: true }).data;
    expect(inch[0]).toContain('Length (in)');
    // 600 mm = 23.622 in, nearest 1/32 is 23-5/8 in (exact conversion 25.4 mm per inch)
    expect(inch[1].slice(2, 4)).toEqual(['23.622', '23-5/8 in']);
  });

  it('names the file after the design', () => {
    expect(csvFileName('Two-level printer enclosure', 'parts')).toBe('two-level-printer-enclosure-parts.csv');
    expect(csvFileName('  ***  ', 'cuts')).toBe('design-cuts.csv');
  });
});

describe('Cuts tab', () => {
  it('lists interchangeable pieces together with quantity, tolerance, ends and machining', () => {
    const analysis = handMadeAnalysis();
    render(<CutsTab groups={analysis.cutGroups} items={analysis.cutList} units="mm" designName="Bench shelf" />);
    const row = screen.getByText('Front rail, Back rail').closest('tr')!;
    expect(within(row).getByText('600 mm')).toBeInTheDocument();
    expect(within(row).getByText('2 pcs')).toBeInTheDocument();
    expect(within(row).getByText('± 0.5 mm')).toBeInTheDocument();
    expect(within(row).getByText(/Tap \(M8 x 1.25\)/)).toBeInTheDocument();
    expect(within(row).getByText('Access counterbore Ø 7.5 mm, 20 mm from start, face 0')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Cut list' }).querySelector('tfoot')).toHaveTextContent('4 pcs');
  });

  it('names the profile by its size, never by its catalogue id', () => {
    const analysis = handMadeAnalysis();
    render(<CutsTab groups={analysis.cutGroups} items={analysis.cutList} units="mm" designName="Bench shelf" />);
    const row = screen.getByText('Front rail, Back rail').closest('tr')!;
    expect(within(row).getByText('40 x 40 mm')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Cut list' })).not.toHaveTextContent(/m40-|in-1/);
  });

  it('shows inch lengths as shop fractions', () => {
    const analysis = handMadeAnalysis();
    render(<CutsTab groups={analysis.cutGroups} items={analysis.cutList} units="in" designName="Bench shelf" />);
    // 400 mm = 15.748 in, nearest 1/32 is 15-3/4 in
    expect(screen.getByText('Leg 1, Leg 2').closest('tr')).toHaveTextContent('15-3/4 in');
  });
});
