/**
 * Reads a design document from untrusted JSON: migrates older versions, validates the shape
 * with the zod schema, then checks ids, references and catalogue ids. Errors carry a dotted
 * path ("profiles.0.length") and a message a person can act on.
 */
import { defaultCatalogue } from '../catalogue';
import type { Catalogue } from '../catalogue/types';
import { migrateToCurrent } from './migrations';
import { documentReferenceErrors, type DocumentError } from './references';
import { accessorySchema, CURRENT_SCHEMA_VERSION, DESIGN_LIMITS, designDocumentSchema, jointSchema, panelSchema, profileSchema, type DesignDocument } from './schema';

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
  if (!result.success) return { ok: false, errors: result.error.issues.map(documentError) };
  return checkReferences(result.data, catalogue);
}

type Issue = { path: PropertyKey[]; message: string };
const documentError = (issue: Issue): DocumentError => ({ path: issue.path.map(String).join('.'), message: issue.message });

function checkReferences(design: DesignDocument, catalogue: Catalogue): ParseDesignResult {
  const errors = documentReferenceErrors(design, catalogue);
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, design };
}

/** The long lists of a document, whose items are checked one by one against the previous revision. */
const ITEM_LISTS = {
  profiles: { schema: profileSchema, max: DESIGN_LIMITS.maxProfiles },
  joints: { schema: jointSchema, max: DESIGN_LIMITS.maxJoints },
  panels: { schema: panelSchema, max: DESIGN_LIMITS.maxPanels },
  accessories: { schema: accessorySchema, max: DESIGN_LIMITS.maxAccessories },
} as const;
type ItemListKey = keyof typeof ITEM_LISTS;
const ITEM_LIST_KEYS = Object.keys(ITEM_LISTS) as ItemListKey[];
/** The document's keys in the schema's order: zod reports issues in this order. */
const KEY_ORDER = new Map(Object.keys(designDocumentSchema.shape).map((key, index) => [key, index]));

/**
 * The same answer as `parseDesignDocument(json)`, faster for a document edited from `previous`
 * (a document this function or `parseDesignDocument` returned): a profile, joint, panel or
 * accessory equal to the previous one with its id is taken as it was, and only the changed ones go
 * through the schema. A save of a 2,000-part design changes a few parts; checking all of them
 * again took most of the save's time. Reference checks (ids, catalogue) still cover everything.
 *
 * The result shares unchanged parts with `previous`: neither may be mutated afterwards.
 */
export function parseEditedDocument(json: unknown, previous: DesignDocument, catalogue: Catalogue = defaultCatalogue): ParseDesignResult {
  const raw = json as Record<string, unknown>;
  // Anything unusual (another version, a list that is not one or too long) takes the full path.
  if (typeof json !== 'object' || json === null || Array.isArray(json) || raw.schemaVersion !== CURRENT_SCHEMA_VERSION) return parseDesignDocument(json, catalogue);
  if (ITEM_LIST_KEYS.some((key) => raw[key] !== undefined && (!Array.isArray(raw[key]) || (raw[key] as unknown[]).length > ITEM_LISTS[key].max))) {
    return parseDesignDocument(json, catalogue);
  }
  const shell: Record<string, unknown> = { ...raw };
  for (const key of ITEM_LIST_KEYS) if (raw[key] !== undefined) shell[key] = [];
  const parsedShell = designDocumentSchema.safeParse(shell);
  const issues: Issue[] = parsedShell.success ? [] : [...parsedShell.error.issues];
  const lists: Partial<Record<ItemListKey, unknown[]>> = {};
  for (const key of ITEM_LIST_KEYS) {
    const items = raw[key] as unknown[] | undefined;
    if (items === undefined) continue;
    const before = new Map<unknown, unknown>();
    for (const item of previous[key]) before.set(item.id, item);
    const out = new Array<unknown>(items.length);
    for (let i = 0; i < items.length; i++) {
      const item = items[i];
      const old = typeof item === 'object' && item !== null ? before.get((item as { id?: unknown }).id) : undefined;
      if (old !== undefined && sameJson(item, old)) {
        out[i] = old;
        continue;
      }
      const checked = ITEM_LISTS[key].schema.safeParse(item);
      if (checked.success) out[i] = checked.data;
      else for (const issue of checked.error.issues) issues.push({ path: [key, i, ...issue.path], message: issue.message });
    }
    lists[key] = out;
  }
  if (issues.length > 0 || !parsedShell.success) {
    // zod's order: by the document's keys, then as found (a stable sort keeps the rest).
    const rank = (issue: Issue) => KEY_ORDER.get(String(issue.path[0])) ?? -1;
    return { ok: false, errors: issues.sort((a, b) => rank(a) - rank(b)).map(documentError) };
  }
  return checkReferences({ ...parsedShell.data, ...lists } as DesignDocument, catalogue);
}

/** Equality of two JSON values (plain objects, arrays, strings, numbers, booleans, null). */
function sameJson(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a)) {
    if (!Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!sameJson(a[i], b[i])) return false;
    return true;
  }
  if (Array.isArray(b)) return false;
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  for (const key of keys) {
    if (!Object.hasOwn(b, key) || !sameJson((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key])) return false;
  }
  return true;
}

/** Like parseDesignDocument but throws one Error listing the problems (for fixtures and scripts). */
export function parseDesignOrThrow(json: unknown, catalogue: Catalogue = defaultCatalogue): DesignDocument {
  const result = parseDesignDocument(json, catalogue);
  if (!result.ok) throw new Error(`Invalid design: ${result.errors.map((e) => `${e.path || '(document)'}: ${e.message}`).join('; ')}`);
  return result.design;
}
