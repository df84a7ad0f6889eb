import type { DesignDocument } from '../../../src/domain/design/schema';

/** Each part's JSON text, by the part object (parts of a kept revision are reused by the next save). */
const partText = new WeakMap<object, string>();
const PART_LISTS = new Set(['profiles', 'joints', 'panels', 'accessories']);

function textOfPart(part: unknown): string {
  // Not an object (never in a parsed document): as JSON.stringify writes it inside an array.
  if (typeof part !== 'object' || part === null) return JSON.stringify(part) ?? 'null';
  let text = partText.get(part);
  if (text === undefined) {
    text = JSON.stringify(part);
    partText.set(part, text);
  }
  return text;
}

/**
 * Exactly `JSON.stringify(document)`, built from each part's text: a save whose parts are mostly
 * the previous revision's objects (see parseEditedDocument) serialises only the changed ones.
 * JSON.stringify of an object is its keys in order, each `"key":value`, comma-separated, with
 * undefined values left out; of an array, its items' texts comma-separated. Part objects must not
 * be mutated after their text is taken (documents kept for saves never are).
 */
export function documentJson(document: DesignDocument): string {
  const pieces: string[] = [];
  for (const [key, value] of Object.entries(document)) {
    if (value === undefined) continue;
    const text = PART_LISTS.has(key) && Array.isArray(value) ? `[${value.map(textOfPart).join(',')}]` : JSON.stringify(value);
    pieces.push(`${JSON.stringify(key)}:${text}`);
  }
  return `{${pieces.join(',')}}`;
}
