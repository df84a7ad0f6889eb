import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { largeFrame } from '../../bench/largeFrame';
import { documentJson } from '../../server/modules/designs/documentJson';
import { parseDesignOrThrow, parseEditedDocument } from '../../src/domain/design/parse';
import type { DesignDocument } from '../../src/domain/design/schema';
import { demoDesigns } from '../../src/domain/fixtures';

// documentJson must be byte for byte JSON.stringify (ECMAScript's JSON.stringify is the reference).
describe('documentJson', () => {
  it('equals JSON.stringify for the demo designs and a 2,000-profile frame', () => {
    for (const document of [...demoDesigns, parseDesignOrThrow(largeFrame({ profiles: 2000, overlapEvery: 25 }))]) {
      expect(documentJson(document)).toBe(JSON.stringify(document));
      // Again, now from the kept part texts.
      expect(documentJson(document)).toBe(JSON.stringify(document));
    }
  });

  it('equals JSON.stringify after an edit that reuses the previous parts', () => {
    const previous = demoDesigns[0];
    documentJson(previous);
    const edited = JSON.parse(JSON.stringify(previous)) as DesignDocument;
    edited.profiles[0].length += 1;
    edited.profiles[1].label = 'Quote " and \\ and \u2028 inside';
    const parsed = parseEditedDocument(edited, previous);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    expect(parsed.design.profiles[2]).toBe(previous.profiles[2]);
    expect(documentJson(parsed.design)).toBe(JSON.stringify(parsed.design));
  });

  it('equals JSON.stringify for any object of JSON values, with undefined fields and part lists', () => {
    const part = fc.dictionary(fc.string({ maxLength: 6 }), fc.oneof(fc.jsonValue({ maxDepth: 2 }), fc.constant(undefined)), { maxKeys: 5 });
    const document = fc.record(
      {
        name: fc.string(),
        profiles: fc.array(part, { maxLength: 5 }),
        joints: fc.array(part, { maxLength: 5 }),
        panels: fc.array(fc.oneof(part, fc.jsonValue({ maxDepth: 1 }), fc.constant(undefined)), { maxLength: 5 }),
        settings: fc.jsonValue({ maxDepth: 3 }),
        steps: fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 3 }),
        loadCases: fc.constant(undefined),
      },
      { requiredKeys: ['name'] },
    );
    fc.assert(
      fc.property(document, (value) => {
        expect(documentJson(value as unknown as DesignDocument)).toBe(JSON.stringify(value));
      }),
      { numRuns: 300 },
    );
  });
});
