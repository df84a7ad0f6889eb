import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { largeFrame } from '../../bench/largeFrame';
import { parseDesignDocument, parseEditedDocument } from '../../src/domain/design/parse';
import type { DesignDocument } from '../../src/domain/design/schema';
import { demoDesigns } from '../../src/domain/fixtures';

/**
 * parseEditedDocument skips the schema for parts equal to the previous revision's. It must give
 * exactly what parseDesignDocument gives, for valid edits and for broken ones (same errors, same
 * order), whatever the edit. Edits are drawn at random: a field of a part set to any JSON value or
 * nudged, parts removed, repeated or swapped, unknown keys added, top-level fields broken.
 */

const LISTS = ['profiles', 'joints', 'panels', 'accessories'] as const;
type Json = unknown;

const numberNudge = fc.oneof(
  fc.constant((n: number) => n + 1),
  fc.constant((n: number) => -n),
  fc.constant((n: number) => n * 1e9),
  fc.constant(() => 0),
  fc.constant(() => -0),
  fc.constant((n: number) => n / 3),
);

const edit = fc.oneof(
  // A field of one part set to any JSON value (or removed).
  fc.record({
    kind: fc.constant('set' as const),
    list: fc.constantFrom(...LISTS),
    at: fc.nat(),
    field: fc.nat(),
    value: fc.oneof(fc.jsonValue(), fc.constant(undefined)),
  }),
  // A number of one part nudged (often still valid).
  fc.record({ kind: fc.constant('nudge' as const), list: fc.constantFrom(...LISTS), at: fc.nat(), field: fc.nat(), nudge: numberNudge }),
  fc.record({ kind: fc.constant('remove' as const), list: fc.constantFrom(...LISTS), at: fc.nat() }),
  fc.record({ kind: fc.constant('repeat' as const), list: fc.constantFrom(...LISTS), at: fc.nat() }),
  fc.record({ kind: fc.constant('swap' as const), list: fc.constantFrom(...LISTS), at: fc.nat(), other: fc.nat() }),
  fc.record({ kind: fc.constant('extraKey' as const), list: fc.constantFrom(...LISTS), at: fc.nat(), key: fc.string({ maxLength: 8 }), value: fc.jsonValue() }),
  fc.record({ kind: fc.constant('top' as const), key: fc.constantFrom('name', 'systemId', 'units', 'settings', 'profiles', 'joints', 'schemaVersion', 'steps', 'sequenceEdited', 'loadCases'), value: fc.jsonValue() }),
);
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function apply(document: Record<string, Json>, change: Edit): void {
  if (change.kind === 'top') {
    document[change.key] = change.value;
    return;
  }
  const list = document[change.list] as Record<string, Json>[];
  if (!Array.isArray(list) || list.length === 0) return;
  const at = change.at % list.length;
  const item = list[at];
  // An earlier edit may have put a non-object in the list: only removal, repeats and swaps apply.
  if ((typeof item !== 'object' || item === null) && !['remove', 'repeat', 'swap'].includes(change.kind)) return;
  const fields = typeof item === 'object' && item !== null ? Object.keys(item) : [];
  switch (change.kind) {
    case 'set': {
      if (fields.length === 0) break;
      const field = fields[change.field % fields.length];
      if (change.value === undefined) delete item[field];
      else item[field] = change.value;
      break;
    }
    case 'nudge': {
      const numeric = fields.filter((field) => typeof item[field] === 'number');
      if (numeric.length) {
        const field = numeric[change.field % numeric.length];
        item[field] = change.nudge(item[field] as number);
      }
      break;
    }
    case 'remove':
      list.splice(at, 1);
      break;
    case 'repeat':
      list.push(structuredClone(item));
      break;
    case 'swap': {
      const other = change.other % list.length;
      [list[at], list[other]] = [list[other], list[at]];
      break;
    }
    case 'extraKey':
      item[change.key] = change.value;
      break;
  }
}

const previousDocuments: DesignDocument[] = [...demoDesigns, parseDesignDocumentOrThrow(largeFrame({ profiles: 300, overlapEvery: 25 }))];

function parseDesignDocumentOrThrow(json: unknown): DesignDocument {
  const result = parseDesignDocument(json);
  if (!result.ok) throw new Error(JSON.stringify(result.errors.slice(0, 3)));
  return result.design;
}

describe('parseEditedDocument', () => {
  it('gives what parseDesignDocument gives for any edit of a parsed document', () => {
    fc.assert(
      fc.property(fc.nat({ max: previousDocuments.length - 1 }), fc.array(edit, { minLength: 0, maxLength: 4 }), (which, edits) => {
        const previous = previousDocuments[which];
        const edited = JSON.parse(JSON.stringify(previous)) as Record<string, Json>;
        for (const change of edits) apply(edited, change);
        const full = parseDesignDocument(edited);
        const fast = parseEditedDocument(edited, previous);
        expect(fast).toStrictEqual(full);
      }),
      { numRuns: 300 },
    );
  });

  it('takes unchanged parts as they were and checks a changed one', () => {
    const previous = previousDocuments[0];
    const edited = JSON.parse(JSON.stringify(previous)) as DesignDocument;
    edited.profiles[1].length = -5;
    const broken = parseEditedDocument(edited, previous);
    expect(broken.ok).toBe(false);
    expect(!broken.ok && broken.errors[0].path).toBe('profiles.1.length');

    edited.profiles[1].length = previous.profiles[1].length + 10;
    const fine = parseEditedDocument(edited, previous);
    expect(fine.ok).toBe(true);
    if (!fine.ok) return;
    expect(fine.design.profiles[0]).toBe(previous.profiles[0]); // the same object: not checked again
    expect(fine.design.profiles[1]).not.toBe(previous.profiles[1]);
    expect(fine.design.profiles[1].length).toBe(previous.profiles[1].length + 10);
  });
});
