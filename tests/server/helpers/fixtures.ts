import { CURRENT_SCHEMA_VERSION, designDocumentSchema, type DesignDocument } from '../../../src/domain/design/schema';

/** A 1×1 transparent PNG. */
export const TINY_PNG_BASE64 = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';
export const TINY_PNG_DATA_URL = `data:image/png;base64,${TINY_PNG_BASE64}`;

/** A small valid document: a square of four 500 mm profiles on the floor (no joints; fine for storage tests). */
export function sampleDocument(name = 'Test frame', profileCount = 4): DesignDocument {
  const profiles = Array.from({ length: profileCount }, (_, index) => ({
    id: `p${index + 1}`,
    variantId: 'm40-40x40',
    length: 500,
    // Rows of 1,000 so large samples stay within the ±100 m coordinate bound.
    start: [0, Math.floor(index / 1000) * 100, (index % 1000) * 100] as [number, number, number],
    direction: [1, 0, 0] as [number, number, number],
  }));
  return designDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name, systemId: 'metric-40', units: 'mm', profiles });
}
