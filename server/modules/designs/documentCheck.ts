import type { DesignDocument } from '../../../src/domain/design/schema';
import { checkDesignDocument } from '../../domainBridge';
import { AppError } from '../../middleware/appError';

/** The parsed document, or a 400 whose fields point into it ("document.profiles.0.length"). */
export async function requireValidDocument(json: unknown, fieldPrefix = 'document'): Promise<DesignDocument> {
  const result = checkDesignDocument(json);
  if (result.ok) return result.design;
  const fields: Record<string, string> = {};
  for (const error of result.errors) {
    const key = [fieldPrefix, error.path].filter(Boolean).join('.');
    if (!(key in fields)) fields[key] = error.message;
  }
  const [firstKey, firstMessage] = Object.entries(fields)[0] ?? [fieldPrefix, 'is not a valid design document'];
  throw new AppError(400, 'invalid_document', `The design document has ${result.errors.length} problem${result.errors.length === 1 ? '' : 's'}, starting with ${firstKey}: ${firstMessage}.`, { fields });
}
