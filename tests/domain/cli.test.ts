import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { runCli } from '@/domain/cli';
import { boxFrame } from './checksDesigns';

const dir = mkdtempSync(join(tmpdir(), 'slotwise-cli-'));
const designFile = join(dir, 'frame.json');
writeFileSync(designFile, JSON.stringify(boxFrame({ backPanel: true })));
const badFile = join(dir, 'bad.json');
writeFileSync(badFile, JSON.stringify({ schemaVersion: 1, name: '', profiles: 'none' }));

function run(argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = runCli(argv, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), readFile: (p) => readFileSync(p, 'utf8') });
  return { code, stdout, stderr };
}

describe('analyze command', () => {
  it('prints the bill of materials as CSV with --only bom', () => {
    const { code, stdout } = run([designFile, '--format', 'csv', '--only', 'bom']);
    expect(code).toBe(0);
    const rows = Papa.parse<Record<string, string>>(stdout.trim(), { header: true }).data;
    expect(Object.keys(rows[0])).toEqual(['code', 'description', 'category', 'quantity', 'unit', 'pieces', 'unit_mass_kg', 'unit_price', 'line_price']);
    expect(rows.find((r) => r.category === 'profile')).toMatchObject({ unit: 'm', pieces: '12' });
    expect(rows.find((r) => r.category === 'connector')?.quantity).toBe('16');
  });

  it('prints JSON for one section', () => {
    const { code, stdout } = run([designFile, '--only', 'tools']);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).some((t: { kind: string }) => t.kind === 'hex-key')).toBe(true);
  });

  it('exits 1 with the reasons on an invalid document, and on a missing file', () => {
    const bad = run([badFile, '--only', 'bom']);
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/is not a valid Slotwise design/);
    expect(bad.stdout).toBe('');
    const missing = run([join(dir, 'nope.json')]);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/Cannot read/);
  });

  it('exits 1 on an unknown section', () => {
    expect(run([designFile, '--only', 'everything']).code).toBe(1);
  });

  it('sets the process exit code when run as a command', () => {
    const result = spawnSync(process.execPath, ['--import', 'tsx', 'src/domain/cli.ts', badFile], { encoding: 'utf8', timeout: 60_000 });
    expect(result.status).toBe(1);
    expect(result.stderr).toMatch(/is not a valid Slotwise design/);
    const ok = spawnSync(process.execPath, ['--import', 'tsx', 'src/domain/cli.ts', designFile, '--format', 'csv', '--only', 'cutlist'], { encoding: 'utf8', timeout: 60_000 });
    expect(ok.status).toBe(0);
    expect(ok.stdout.split('\n')[0]).toBe('variant,length_mm,tolerance_mm,quantity,start_end,end_end,machining,profiles');
  }, 90_000);
});
