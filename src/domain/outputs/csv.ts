/**
 * The one CSV writer for downloads and the command line. Cells that a spreadsheet would run as a
 * formula (text starting with =, +, -, @, tab or carriage return) get a leading apostrophe, so a
 * profile labelled `=HYPERLINK(...)` is shown as text (OWASP, "CSV Injection"). Numbers stay numbers.
 */
import Papa from 'papaparse';

/** Text cells starting with one of these are escaped with a leading `'`. */
export const CSV_FORMULA_START = /^[=+\-@\t\r]/;

export type CsvCell = string | number | boolean | null | undefined;

/** `'` + text when a spreadsheet would read the text as a formula; anything else unchanged. */
export function escapeCsvFormula<T extends CsvCell>(cell: T): T | string {
  return typeof cell === 'string' && CSV_FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/**
 * CSV text (RFC 4180 quoting by papaparse) with formula-looking text cells escaped. Rows are
 * arrays (with `fields` as the header) or objects (their keys are the header).
 */
export function toCsv(
  rows: readonly (readonly CsvCell[])[] | readonly Readonly<Record<string, CsvCell>>[],
  options: { fields?: readonly string[]; newline?: string } = {},
): string {
  const config = { escapeFormulae: false, newline: options.newline ?? '\r\n' };
  const data = rows.map((row) =>
    Array.isArray(row) ? row.map(escapeCsvFormula) : Object.fromEntries(Object.entries(row).map(([key, cell]) => [key, escapeCsvFormula(cell)])),
  );
  return options.fields ? Papa.unparse({ fields: [...options.fields], data: data as unknown[][] }, config) : Papa.unparse(data as object[], config);
}
