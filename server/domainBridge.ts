import { analyzeDesign, type DesignAnalysis } from '../src/domain/analysis/analyze';
import { createEmptyDesign } from '../src/domain/design/create';
import { parseDesignDocument, parseEditedDocument } from '../src/domain/design/parse';
import type { DesignDocument } from '../src/domain/design/schema';
import type { LengthUnit } from '../src/domain/units';

/** The server's door to the shared domain core (relative paths: tsx does not read tsconfig aliases). */

export type DocumentCheck =
  | { ok: true; design: DesignDocument }
  | { ok: false; errors: { path: string; message: string }[] };

/**
 * Checks untrusted JSON as a design document: migrates older versions, validates shape, ids and
 * references. With `previous` (the parsed revision it was edited from), parts equal to the
 * previous ones are not checked again; the answer is the same.
 */
export function checkDesignDocument(json: unknown, previous?: DesignDocument): DocumentCheck {
  return previous ? parseEditedDocument(json, previous) : parseDesignDocument(json);
}

/** A new, empty design document. */
export function createEmptyDesignDocument(options: { name: string; systemId: string; units?: LengthUnit }): DesignDocument {
  return createEmptyDesign(options);
}

export function analyze(design: DesignDocument): DesignAnalysis {
  return analyzeDesign(design);
}

/**
 * The demo shop's three designs, from the domain's fixtures. Loaded on first use (only seeding
 * needs them); a missing or broken fixture fails the seed instead of being replaced silently.
 */
export async function loadDemoDesigns(): Promise<DesignDocument[]> {
  const { demoDesigns } = await import('../src/domain/fixtures/index');
  return demoDesigns;
}
