/** A new, empty design for a profile system, with the system's alloy and demo stock length. */
import { defaultCatalogue, getSystem } from '../catalogue';
import type { LengthUnit } from '../units';
import type { Catalogue } from '../catalogue/types';
import { CURRENT_SCHEMA_VERSION, designDocumentSchema, type DesignDocument } from './schema';

export function createEmptyDesign(
  opts: { name: string; systemId: string; units?: LengthUnit },
  catalogue: Catalogue = defaultCatalogue,
): DesignDocument {
  const system = getSystem(catalogue, opts.systemId);
  if (!system) {
    throw new Error(`Unknown profile system "${opts.systemId}"; use one of ${catalogue.systems.map((s) => s.id).join(', ')}`);
  }
  return designDocumentSchema.parse({
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: opts.name,
    units: opts.units ?? (system.unitFamily === 'inch' ? 'in' : 'mm'),
    systemId: system.id,
    settings: { alloyId: system.alloyId, stockLength: system.demoStockLength },
  });
}
