/**
 * Command line: analyse a design file and print findings, BOM, cut list, stock plan or tools.
 *   npm run -s analyze -- <design.json> [--format json|csv] [--only bom|cutlist|stock|tools|findings]
 * Exits 1 with a message on stderr when the file cannot be read or is not a valid design.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { toCsv } from './outputs/csv';
import { analyzeDesign } from './analysis/analyze';
import type { DesignAnalysis } from './analysis/types';
import { parseDesignDocument } from './design/parse';

export type CliSection = 'bom' | 'cutlist' | 'stock' | 'tools' | 'findings';
const SECTIONS: readonly CliSection[] = ['bom', 'cutlist', 'stock', 'tools', 'findings'];

export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
  readFile: (path: string) => string;
}

const USAGE = 'Usage: npm run -s analyze -- <design.json> [--format json|csv] [--only bom|cutlist|stock|tools|findings]';

/** Runs the command; returns the exit code. */
export function runCli(argv: string[], io: CliIo): number {
  let file: string | undefined;
  let format: 'json' | 'csv' = 'json';
  let only: CliSection | undefined;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--format' || arg.startsWith('--format=')) {
      const value = arg.includes('=') ? arg.split('=')[1] : argv[++i];
      if (value !== 'json' && value !== 'csv') return fail(io, `--format must be json or csv, not "${value ?? ''}".`);
      format = value;
    } else if (arg === '--only' || arg.startsWith('--only=')) {
      const value = arg.includes('=') ? arg.split('=')[1] : argv[++i];
      if (!SECTIONS.includes(value as CliSection)) return fail(io, `--only must be one of ${SECTIONS.join(', ')}, not "${value ?? ''}".`);
      only = value as CliSection;
    } else if (arg === '--help' || arg === '-h') {
      io.stdout(`${USAGE}\n`);
      return 0;
    } else if (arg.startsWith('--')) {
      return fail(io, `Unknown option ${arg}.`);
    } else if (file === undefined) {
      file = arg;
    } else {
      return fail(io, `Only one design file at a time (got "${file}" and "${arg}").`);
    }
  }
  if (!file) return fail(io, 'Name a design file to analyse.');
  if (format === 'csv' && !only) return fail(io, 'CSV needs one table: add --only bom|cutlist|stock|tools|findings.');

  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    return fail(io, `Cannot read ${file}: ${(error as Error).message}`, false);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return fail(io, `${file} is not valid JSON.`, false);
  }
  const parsed = parseDesignDocument(json);
  if (!parsed.ok) {
    const lines = parsed.errors.slice(0, 20).map((e) => `  ${e.path || '(document)'}: ${e.message}`);
    return fail(io, `${file} is not a valid Slotwise design:\n${lines.join('\n')}${parsed.errors.length > 20 ? `\n  … and ${parsed.errors.length - 20} more` : ''}`, false);
  }
  const analysis = analyzeDesign(parsed.design, undefined, { timings: false });
  if (format === 'json') {
    io.stdout(`${JSON.stringify(only ? sectionData(analysis, only) : analysis, null, 2)}\n`);
  } else {
    io.stdout(`${toCsv(sectionRows(analysis, only!), { newline: '\n' })}\n`);
  }
  return 0;
}

function fail(io: CliIo, message: string, showUsage = true): number {
  io.stderr(`${message}\n${showUsage ? `${USAGE}\n` : ''}`);
  return 1;
}

function sectionData(a: DesignAnalysis, only: CliSection): unknown {
  switch (only) {
    case 'bom':
      return a.bom;
    case 'cutlist':
      return { pieces: a.cutList, groups: a.cutGroups };
    case 'stock':
      return a.stockPlans;
    case 'tools':
      return a.tools;
    case 'findings':
      return { counts: a.counts, findings: a.findings };
  }
}

/** Flat rows for CSV, one table per section. */
export function sectionRows(a: DesignAnalysis, only: CliSection): Record<string, string | number>[] {
  switch (only) {
    case 'bom':
      return a.bom.map((b) => ({
        code: b.code,
        description: b.description,
        category: b.category,
        quantity: b.quantity,
        unit: b.unit,
        pieces: b.pieces ?? '',
        unit_mass_kg: b.unitMass,
        unit_price: b.unitPrice,
        line_price: b.linePrice,
      }));
    case 'cutlist':
      return a.cutGroups.map((g) => ({
        variant: g.variantId,
        length_mm: g.length,
        tolerance_mm: g.tolerance,
        quantity: g.quantity,
        start_end: g.ends.start.description,
        end_end: g.ends.end.description,
        machining: g.machining.map((m) => m.description).join('; '),
        profiles: g.profileIds.join(' '),
      }));
    case 'stock':
      return a.stockPlans.flatMap((s) =>
        s.plan.bars.map((bar) => ({
          variant: s.variantId,
          bar: bar.index + 1,
          cuts_mm: bar.cuts.map((c) => c.length).join(' + '),
          pieces: bar.cuts.map((c) => c.id).join(' '),
          used_mm: Math.round(bar.usedLength * 10) / 10,
          offcut_mm: Math.round(bar.offcut * 10) / 10,
          reusable: bar.reusable ? 'yes' : 'no',
        })),
      );
    case 'tools':
      return a.tools.map((t) => ({ tool: t.name, size: t.size ?? '', standard: t.standard ?? '', reason: t.reason }));
    case 'findings':
      return a.findings.map((f) => ({ severity: f.severity, check: f.check, parts: f.partIds.join(' '), message: f.message, fix: f.fix?.label ?? '' }));
  }
}

const isMain = typeof process !== 'undefined' && process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;
if (isMain) {
  const code = runCli(process.argv.slice(2), {
    stdout: (t) => process.stdout.write(t),
    stderr: (t) => process.stderr.write(t),
    readFile: (p) => readFileSync(p, 'utf8'),
  });
  process.exitCode = code;
}
