import type { DesignDocument } from '../../../src/domain/design/schema';
import { checkDesignDocument } from '../../domainBridge';
import { AppError } from '../../middleware/appError';

/** A 400 whose fields point into the document ("document.profiles.0.length"). */
export function documentErrorsToAppError(errors: { path: string; message: string }[], fieldPrefix = 'document'): AppError {
  const fields: Record<string, string> = {};
  for (const error of errors) {
    const key = [fieldPrefix, error.path].filter(Boolean).join('.');
    if (!(key in fields)) fields[key] = error.message;
  }
  const [firstKey, firstMessage] = Object.entries(fields)[0] ?? [fieldPrefix, 'is not a valid design document'];
  return new AppError(400, 'invalid_document', `The design document has ${errors.length} problem${errors.length === 1 ? '' : 's'}, starting with ${firstKey}: ${firstMessage}.`, { fields });
}

/**
 * The parsed document, or a 400 whose fields point into it ("document.profiles.0.length").
 * `previous`: the parsed revision the document was edited from, if at hand (see checkDesignDocument).
 */
export async function requireValidDocument(json: unknown, fieldPrefix = 'document', previous?: DesignDocument): Promise<DesignDocument> {
  const result = checkDesignDocument(json, previous);
  if (result.ok) return result.design;
  throw documentErrorsToAppError(result.errors, fieldPrefix);
}
