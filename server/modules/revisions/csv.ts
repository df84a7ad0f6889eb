import Papa from 'papaparse';
import type { DesignAnalysis } from '../../../src/domain/analysis/analyze';
import { sectionRows } from '../../../src/domain/cli';

/** The bill of materials or the cut list as CSV (the same columns as the analysis command line). */
export function analysisCsv(analysis: DesignAnalysis, table: 'bom' | 'cutlist'): string {
  return Papa.unparse(sectionRows(analysis, table), { newline: '\r\n' });
}
