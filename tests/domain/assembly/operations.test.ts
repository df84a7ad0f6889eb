import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultCatalogue } from '@/domain/catalogue';
import { generateSteps, sequenceFindings } from '@/domain/assembly';
import { buildAnalysisContext } from '@/domain/analysis/context';
import { indexCatalogue } from '@/domain/analysis/catalogueIndex';
import { generateDesign } from '@/domain/design/generators';
import { migrateToCurrent } from '@/domain/design/migrations';
import { applyOperation, OperationError } from '@/domain/design/operations';
import { parseDesignDocument } from '@/domain/design/parse';
import type { DesignDocument } from '@/domain/design/schema';
import { buildPrinterEnclosure } from '@/domain/fixtures/demoDesigns';

const ids = (d: DesignDocument) => d.steps.map((s) => s.id);
const errorsOf = (d: DesignDocument) => sequenceFindings(buildAnalysisContext(d, indexCatalogue(defaultCatalogue))).filter((f) => f.severity === 'error');

describe('assembly sequence: operations', () => {
  const base = buildPrinterEnclosure();

  it('reorders a step by index, before and after another, and marks the order as edited', () => {
    const [a, b, c] = ids(base);
    const moved = applyOperation(base, { type: 'moveStep', payload: { stepId: a, toIndex: 2 } });
    expect(ids(moved).slice(0, 3)).toEqual([b, c, a]);
    expect(moved.sequenceEdited).toBe(true);
    expect(base.sequenceEdited).toBe(false);
    expect(ids(applyOperation(moved, { type: 'moveStepBefore', payload: { stepId: a, beforeStepId: b } })).slice(0, 3)).toEqual([a, b, c]);
    expect(ids(applyOperation(base, { type: 'moveStepAfter', payload: { stepId: a, afterStepId: c } })).slice(0, 3)).toEqual([b, c, a]);
    expect(() => applyOperation(base, { type: 'moveStep', payload: { stepId: 'nope', toIndex: 0 } })).toThrow(OperationError);
  });

  it('merges steps into the first, splits parts out into a new step after it, and moves parts between steps', () => {
    const [a, b] = base.steps;
    const merged = applyOperation(base, { type: 'mergeSteps', payload: { stepIds: [a.id, b.id] } });
    expect(merged.steps).toHaveLength(base.steps.length - 1);
    expect(merged.steps[0]).toMatchObject({ id: a.id, title: a.title, partIds: [...a.partIds, ...b.partIds] });

    const split = applyOperation(merged, { type: 'splitStep', payload: { stepId: a.id, partIds: b.partIds, newStepId: 'step-new' } });
    expect(split.steps[0].partIds).toEqual(a.partIds);
    expect(split.steps[1]).toMatchObject({ id: 'step-new', partIds: b.partIds, title: `${a.title} (continued)` });
    expect(() => applyOperation(merged, { type: 'splitStep', payload: { stepId: a.id, partIds: merged.steps[0].partIds } })).toThrow(/at least one part/);

    const part = b.partIds[0];
    const moved = applyOperation(base, { type: 'movePartsToStep', payload: { partIds: [part], stepId: a.id } });
    expect(moved.steps[0].partIds.at(-1)).toBe(part);
    expect(moved.steps[1].partIds).not.toContain(part);
    const all = moved.steps.flatMap((s) => s.partIds);
    expect(all.filter((x) => x === part)).toHaveLength(1);
  });

  it('sets a title, notes and caution, and clears notes with empty text', () => {
    const id = base.steps[0].id;
    const next = applyOperation(base, { type: 'updateStep', payload: { stepId: id, changes: { title: 'Uprights', notes: 'Square them', caution: 'Heavy' } } });
    expect(next.steps[0]).toMatchObject({ title: 'Uprights', notes: 'Square them', caution: 'Heavy' });
    const cleared = applyOperation(next, { type: 'updateStep', payload: { stepId: id, changes: { notes: '' } } });
    expect(cleared.steps[0].notes).toBeUndefined();
    expect(() => applyOperation(base, { type: 'updateStep', payload: { stepId: id, changes: { title: '  ' } } })).toThrow(/needs a title/);
  });

  it('regenerates the generated order and clears the edited mark', () => {
    const edited = applyOperation(base, { type: 'moveStep', payload: { stepId: base.steps[0].id, toIndex: 5 } });
    const again = applyOperation(edited, { type: 'regenerateSequence' });
    expect(again.sequenceEdited).toBe(false);
    expect(again.steps).toEqual(generateSteps(base));
  });

  it('keeps an unedited order in step with part changes, and keeps an edited order as the designer left it', () => {
    const post = base.profiles[0].id;
    const unedited = applyOperation(base, { type: 'removeParts', payload: { ids: [post] } });
    expect(unedited.steps).toEqual(generateSteps(unedited));
    const edited = applyOperation(base, { type: 'updateStep', payload: { stepId: base.steps[0].id, changes: { title: 'Mine' } } });
    const afterRemove = applyOperation(edited, { type: 'removeParts', payload: { ids: [post] } });
    expect(afterRemove.steps[0].title).toBe('Mine');
    expect(afterRemove.steps.flatMap((s) => s.partIds)).not.toContain(post);
  });

  it('edits the generated order of a design that has no saved steps', () => {
    const bare = { ...base, steps: [] };
    const next = applyOperation(bare, { type: 'updateStep', payload: { stepId: generateSteps(bare)[0].id, changes: { caution: 'Gloves' } } });
    expect(next.steps).toHaveLength(generateSteps(bare).length);
    expect(next.steps[0].caution).toBe('Gloves');
  });
});

describe('design document version 2', () => {
  it('migrates a version 1 document: order and ids kept, step kinds inferred, not marked as edited', () => {
    const v1 = {
      schemaVersion: 1,
      name: 'Old rack',
      systemId: 'metric-40',
      profiles: [{ id: 'p-1', variantId: 'm40-40x40', length: 500, start: [0, 0, 0], direction: [0, 1, 0] }],
      accessories: [{ id: 'foot-1', kind: 'leveling-foot', partId: 'm40-leveling-foot', profileId: 'p-1', end: 'start' }],
      subAssemblies: [{ id: 'sub-1', name: 'Side', profileIds: ['p-1'], buildOrientation: 'upside-down' }],
      steps: [
        { id: 'step-1', title: 'Stand the upright', partIds: ['p-1'] },
        { id: 'step-2', title: 'Screw in the feet', partIds: ['foot-1'] },
        { id: 'step-3', title: 'Turn the side over', partIds: [], subAssemblyId: 'sub-1' },
        { id: 'step-4', title: 'Bring the side in', partIds: [], subAssemblyId: 'sub-1' },
        { id: 'step-5', title: 'Slide in the shelf', partIds: [] },
      ],
    };
    const migrated = migrateToCurrent(v1);
    expect(migrated.fromVersion).toBe(1);
    expect(migrated.doc.schemaVersion).toBe(3);
    const parsed = parseDesignDocument(v1);
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
    if (!parsed.ok) return;
    expect(parsed.design.sequenceEdited).toBe(false);
    expect(parsed.design.steps.map((s) => [s.id, s.kind])).toEqual([
      ['step-1', 'place'],
      ['step-2', 'finish'],
      ['step-3', 'flip'],
      ['step-4', 'join'],
      ['step-5', 'slide-in'],
    ]);
  });

  it('keeps the step order, titles, notes and cautions through a save and a reload', () => {
    const base = buildPrinterEnclosure();
    const edited = applyOperation(
      applyOperation(base, { type: 'moveStep', payload: { stepId: base.steps[4].id, toIndex: 0 } }),
      { type: 'updateStep', payload: { stepId: base.steps[4].id, changes: { caution: 'Two people', notes: 'Go slowly' } } },
    );
    const reloaded = parseDesignDocument(JSON.stringify(edited));
    expect(reloaded.ok && reloaded.design.steps).toEqual(edited.steps);
    expect(reloaded.ok && reloaded.design.sequenceEdited).toBe(true);
  });
});

describe('assembly sequence: property', () => {
  it('for random generator frames the generated order is feasible and every part is in exactly one step', () => {
    const arbitrary = fc.record({
      kind: fc.constantFrom('box-frame', 'table', 'shelf-unit', 'cabinet', 'enclosure'),
      systemId: fc.constantFrom('inch-1.0', 'inch-1.5', 'metric-20', 'metric-30', 'metric-40', 'metric-45'),
      width: fc.integer({ min: 300, max: 2400 }),
      depth: fc.integer({ min: 300, max: 1200 }),
      height: fc.integer({ min: 800, max: 2400 }),
      feet: fc.constantFrom('leveling-foot', 'caster', 'none'),
      panels: fc.constantFrom(undefined, 'closed', 'walls'),
    });
    fc.assert(
      fc.property(arbitrary, ({ kind, panels, ...params }) => {
        const design = generateDesign(kind, panels ? { ...params, panels } : params);
        const steps = generateSteps(design);
        const placed = steps.flatMap((s) => s.partIds);
        for (const id of [...design.profiles, ...design.joints, ...design.panels, ...design.accessories].map((x) => x.id)) {
          expect(placed.filter((x) => x === id), `${kind}: ${id}`).toHaveLength(1);
        }
        expect(placed).toHaveLength(new Set(placed).size);
        expect(errorsOf({ ...design, steps })).toEqual([]);
      }),
      { numRuns: 40 },
    );
  });
});
