/**
 * Forward migrations of the design document. Each step takes the raw JSON of one version and
 * returns the raw JSON of the next; `migrateToCurrent` runs them in order.
 *
 * v0 → v1: profiles were stored by their two end points (`from`, `to`); v1 stores `start`,
 * a unit `direction` and a `length`. Nothing else changed.
 *
 * v1 → v2: the assembly sequence is part of the revision. Each step gains a `kind` (inferred from
 * what it places and its title: flip, join, slide-in, finish or place) and the document gains
 * `sequenceEdited` (false: a version 1 order was always the generated one). The order and ids are
 * kept exactly.
 * v2 → v3: inch catalogue ids are named by nominal size. Profile variants 'i10-1x1', 'i10-1x2',
 * 'i15-1.5x1.5', 'i15-1.5x3' become 'in-1x1', 'in-1x2', 'in-1.5x1.5', 'in-1.5x3'; every other inch
 * catalogue id ('i10-corner-bracket', 'i15-leveling-foot', …) takes the prefix 'in1-' / 'in1.5-'.
 * Only values of catalogue references (variantId, connectorId, partId, fastenerId, tNutId) are
 * renamed; part ids, references to parts (profileId, panelId, …) and labels are the user's own.
 */
import { z } from 'zod';
import { CURRENT_SCHEMA_VERSION, designDocumentSchema } from './schema';

export interface MigrationIssue {
  path: string;
  message: string;
}

type Raw = Record<string, unknown>;
type Migration = (doc: Raw) => { doc: Raw; issues: MigrationIssue[] };

const isPoint = (v: unknown): v is [number, number, number] =>
  Array.isArray(v) && v.length === 3 && v.every((n) => typeof n === 'number' && Number.isFinite(n));

const migrateV0toV1: Migration = (doc) => {
  const issues: MigrationIssue[] = [];
  const profiles = Array.isArray(doc.profiles) ? doc.profiles : [];
  const migrated = profiles.map((p: unknown, index) => {
    if (typeof p !== 'object' || p === null) return p;
    const { from, to, ...rest } = p as Raw;
    if (!('from' in (p as Raw)) && !('to' in (p as Raw))) return p;
    if (!isPoint(from) || !isPoint(to)) {
      issues.push({ path: `profiles.${index}`, message: 'A version 0 profile needs "from" and "to" as [x, y, z] in mm' });
      return p;
    }
    const d = [to[0] - from[0], to[1] - from[1], to[2] - from[2]];
    const length = Math.hypot(d[0], d[1], d[2]);
    if (length === 0) {
      issues.push({ path: `profiles.${index}`, message: 'A version 0 profile has "from" equal to "to": it has no length' });
      return p;
    }
    return { ...rest, start: [...from], direction: d.map((c) => c / length), length };
  });
  return { doc: { ...doc, profiles: migrated, schemaVersion: 1 }, issues };
};

const FINISH_PREFIXES = ['leveling-foot', 'caster', 'end-cap', 'gasket', 'slot-cover'];

/** The kind of a version 1 step, from its title and the kinds of the accessories it places. */
function inferStepKind(step: Raw, accessoryKinds: Map<string, string>): string {
  const title = typeof step.title === 'string' ? step.title.toLowerCase() : '';
  const partIds = Array.isArray(step.partIds) ? step.partIds.filter((x): x is string => typeof x === 'string') : [];
  if (/^(flip|turn|stand the .* up)/.test(title)) return 'flip';
  if (typeof step.subAssemblyId === 'string' && /^(bring|join)/.test(title)) return 'join';
  if (/^slide/.test(title)) return 'slide-in';
  if (partIds.length > 0 && partIds.every((id) => FINISH_PREFIXES.includes(accessoryKinds.get(id) ?? ''))) return 'finish';
  return 'place';
}

const migrateV1toV2: Migration = (doc) => {
  const accessoryKinds = new Map<string, string>();
  if (Array.isArray(doc.accessories)) {
    for (const a of doc.accessories as Raw[]) if (a && typeof a.id === 'string' && typeof a.kind === 'string') accessoryKinds.set(a.id, a.kind);
  }
  const steps = Array.isArray(doc.steps)
    ? doc.steps.map((s: unknown) => (typeof s === 'object' && s !== null && !('kind' in s) ? { ...(s as Raw), kind: inferStepKind(s as Raw, accessoryKinds) } : s))
    : doc.steps;
  return { doc: { ...doc, ...(steps !== undefined ? { steps } : {}), sequenceEdited: doc.sequenceEdited ?? false, schemaVersion: 2 }, issues: [] };
};

/** The inch prefixes before version 3, and what they became. */
export const LEGACY_INCH_PREFIXES: Record<string, { variant: string; other: string }> = {
  i10: { variant: 'in', other: 'in1' },
  i15: { variant: 'in', other: 'in1.5' },
};
const LEGACY_VARIANT_SIZES = new Set(['1x1', '1x2', '1.5x1.5', '1.5x3']);

/** The version 3 name of a version 2 or older catalogue id; ids that were never inch ids come back unchanged. */
export function renameLegacyInchId(id: string): string {
  const match = /^(i10|i15)-(.+)$/.exec(id);
  if (!match) return id;
  const prefixes = LEGACY_INCH_PREFIXES[match[1]];
  return LEGACY_VARIANT_SIZES.has(match[2]) ? `${prefixes.variant}-${match[2]}` : `${prefixes.other}-${match[2]}`;
}

const CATALOGUE_REFERENCE_KEYS = new Set(['variantId', 'connectorId', 'partId', 'fastenerId', 'tNutId']);

function renameCatalogueReferences(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(renameCatalogueReferences);
  if (typeof value !== 'object' || value === null) return value;
  const out: Raw = {};
  for (const [key, v] of Object.entries(value as Raw)) {
    out[key] = CATALOGUE_REFERENCE_KEYS.has(key) && typeof v === 'string' ? renameLegacyInchId(v) : renameCatalogueReferences(v);
  }
  return out;
}

const migrateV2toV3: Migration = (doc) => {
  const renamed = renameCatalogueReferences(doc) as Raw;
  return { doc: { ...renamed, schemaVersion: 3 }, issues: [] };
};

/** migrations[n] turns version n into version n + 1. */
const migrations: Migration[] = [migrateV0toV1, migrateV1toV2, migrateV2toV3];

export function migrateToCurrent(input: Raw): { doc: Raw; issues: MigrationIssue[]; fromVersion: number } {
  const version = input.schemaVersion;
  if (version === undefined) {
    return { doc: input, fromVersion: -1, issues: [{ path: 'schemaVersion', message: `The document has no "schemaVersion"; add "schemaVersion": ${CURRENT_SCHEMA_VERSION}` }] };
  }
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { doc: input, fromVersion: -1, issues: [{ path: 'schemaVersion', message: '"schemaVersion" must be a whole number' }] };
  }
  if (version > CURRENT_SCHEMA_VERSION) {
    return {
      doc: input,
      fromVersion: version,
      issues: [{ path: 'schemaVersion', message: `This document is version ${version}, made by a newer Slotwise; this one reads up to version ${CURRENT_SCHEMA_VERSION}` }],
    };
  }
  let doc = input;
  const issues: MigrationIssue[] = [];
  for (let v = version; v < CURRENT_SCHEMA_VERSION; v++) {
    const step = migrations[v](doc);
    doc = step.doc;
    issues.push(...step.issues);
  }
  return { doc, issues, fromVersion: version };
}

/**
 * The design-document schema for documents read back from storage: older versions are migrated
 * first, so a revision saved as version 1 loads as the current version. Use it wherever a stored
 * document is validated (API responses); use `parseDesignDocument` for files from people.
 */
export const storedDesignDocumentSchema = z.preprocess(
  (raw) => (typeof raw === 'object' && raw !== null && !Array.isArray(raw) ? migrateToCurrent(raw as Raw).doc : raw),
  designDocumentSchema,
);
