/**
 * The published JSON Schema of the design document, generated from the zod schema.
 * `npm run schema:write` rewrites docs/design-format.schema.json; a test keeps the file current.
 */
import { z } from 'zod';
import { CURRENT_SCHEMA_VERSION, designDocumentSchema } from './schema';

/** The schema of what Slotwise accepts: fields with defaults may be left out. */
export function designDocumentJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(designDocumentSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return {
    ...generated,
    $id: 'https://slotwise.example/schemas/design-document.schema.json',
    title: `Slotwise design document, version ${CURRENT_SCHEMA_VERSION}`,
    description:
      'An aluminium T-slot frame design. Lengths in millimetres; right-handed space with Y up. ' +
      'See design-format.md. Ids, references and catalogue ids are checked beyond this schema.',
  };
}

export function designDocumentJsonSchemaText(): string {
  return `${JSON.stringify(designDocumentJsonSchema(), null, 2)}\n`;
}

const isMain = typeof process !== 'undefined' && process.argv[1] !== undefined && import.meta.url.endsWith(process.argv[1].split(/[\\/]/).pop() ?? '\0');
if (isMain) {
  const { writeFileSync } = await import('node:fs');
  const { fileURLToPath } = await import('node:url');
  const target = fileURLToPath(new URL('../../../docs/design-format.schema.json', import.meta.url));
  writeFileSync(target, designDocumentJsonSchemaText());
  console.log(`wrote ${target}`);
}
