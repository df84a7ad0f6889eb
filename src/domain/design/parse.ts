/**
 * Reads a design document from untrusted JSON: migrates older versions, validates the shape
 * with the zod schema, then checks ids, references and catalogue ids. Errors carry a dotted
 * path ("profiles.0.length") and a message a person can act on.
 */
import { defaultCatalogue } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { migrateToCurrent } from './migrations';
import { documentReferenceErrors, type DocumentError } from './references';
import { designDocumentSchema, type DesignDocument } from './schema';

export type { DocumentError } from './references';
export type ParseDesignResult = { ok: true; design: DesignDocument } | { ok: false; errors: DocumentError[] };

export function parseDesignDocument(json: unknown, catalogue: Catalogue = defaultCatalogue): ParseDesignResult {
  if (typeof json === 'string') {
    try {
      json = JSON.parse(json);
    } catch {
      return { ok: false, errors: [{ path: '', message: 'The file is not valid JSON' }] };
    }
  }
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    return { ok: false, errors: [{ path: '', message: 'A design document is a JSON object' }] };
  }
  const migrated = migrateToCurrent(json as Record<string, unknown>);
  if (migrated.issues.length > 0) return { ok: false, errors: migrated.issues };

  const result = designDocumentSchema.safeParse(migrated.doc);
  if (!result.success) {
    return {
      ok: false,
      errors: result.error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
    };
  }
  const errors = documentReferenceErrors(result.data, catalogue);
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, design: result.data };
}

/** Like parseDesignDocument but throws one Error listing the problems (for fixtures and scripts). */
export function parseDesignOrThrow(json: unknown, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const result = parseDesignDocument(json, catalogue);
  if (!result.ok) throw new Error(`Invalid design: ${result.errors.map((e) => `${e.path || '(document)'}: ${e.message}`).join('; ')}`);
  return result.design;
}
