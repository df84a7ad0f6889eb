import { analyzeDesign, type DesignAnalysis } from '../src/domain/analysis/analyze';
import { createEmptyDesign } from '../src/domain/design/create';
import { parseDesignDocument } from '../src/domain/design/parse';
import type { DesignDocument } from '../src/domain/design/schema';
import type { LengthUnit } from '../src/domain/units';

/**
 * The server's door to the shared domain core (relative paths: tsx does not read tsconfig
 * aliases). The demo fixtures are written in parallel with the server, so they are imported
 * lazily and replaced by empty designs of the same names while they are missing.
 */

export type DocumentCheck =
  | { ok: true; design: DesignDocument }
  | { ok: false; errors: { path: string; message: string }[] };

/** Checks untrusted JSON as a design document: migrates older versions, validates shape, ids and references. */
export function checkDesignDocument(json: unknown): DocumentCheck {
  return parseDesignDocument(json);
}

/** A new, empty design document. */
export function createEmptyDesignDocument(options: { name: string; systemId: string; units?: LengthUnit }): DesignDocument {
  return createEmptyDesign(options);
}

export function analyze(design: DesignDocument): DesignAnalysis {
  return analyzeDesign(design);
}

interface FixturesModule {
  demoDesigns?: DesignDocument[];
}

function isMissingModule(error: unknown, file: string): boolean {
  const code = (error as { code?: string } | null)?.code;
  const message = String((error as Error | null)?.message ?? '');
  const missing = code === 'ERR_MODULE_NOT_FOUND' || code === 'MODULE_NOT_FOUND' || /Cannot find module|Failed to load url|does not exist/i.test(message);
  return missing && message.includes(file.replace(/\.ts$/, ''));
}

/** The domain's demo fixtures, or null while src/domain/fixtures/index.ts does not exist. */
async function loadFixtures(): Promise<FixturesModule | null> {
  const url = new URL('../src/domain/fixtures/index.ts', import.meta.url);
  try {
    return (await import(/* @vite-ignore */ url.href)) as FixturesModule;
  } catch (error) {
    if (isMissingModule(error, 'fixtures/index')) return null;
    throw error;
  }
}

export interface DemoDesignSource {
  designs: DesignDocument[];
  /** 'fixtures' when the domain's demo designs were used, 'empty' when placeholders were created. */
  origin: 'fixtures' | 'empty';
}

const DEMO_PLACEHOLDERS = [
  { name: 'Two-level printer enclosure', systemId: 'metric-40', units: 'mm' },
  { name: 'Standing workbench', systemId: 'inch-1.5', units: 'in' },
  { name: 'Plant rack', systemId: 'metric-20', units: 'mm' },
] as const;

/** The demo shop's three designs: the domain fixtures when they exist, else empty designs with the same names. */
export async function loadDemoDesigns(): Promise<DemoDesignSource> {
  const fixtures = await loadFixtures();
  if (fixtures?.demoDesigns?.length) return { designs: fixtures.demoDesigns, origin: 'fixtures' };
  return { designs: DEMO_PLACEHOLDERS.map((placeholder) => createEmptyDesign(placeholder)), origin: 'empty' };
}
