import { describe, expect, it } from 'vitest';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { addProfileCommand, clone, twoRailDesign } from './fixtures';

function loadedStore() {
  const store = createEditorStore();
  store.getState().loadDesign(twoRailDesign(), { designId: 7, revision: 3, savedAt: '2026-01-01T00:00:00Z', savedBy: 'Tomasz Reyes' });
  return store;
}

function history(store: ReturnType<typeof createEditorStore>) {
  const { pastStates, futureStates } = store.temporal.getState();
  return { past: pastStates.length, future: futureStates.length };
}

describe('editor store history', () => {
  it('records one history entry per executed command and undoes it to the exact previous design', () => {
    const store = loadedStore();
    const before = clone(store.getState().design);
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 750 }));
    expect(store.getState().design.profiles[0].length).toBe(750);
    expect(history(store)).toEqual({ past: 1, future: 0 });
    store.getState().undo();
    expect(store.getState().design).toEqual(before);
    expect(history(store)).toEqual({ past: 0, future: 1 });
  });

  it('redo re-applies the undone command', () => {
    const store = loadedStore();
    store.getState().execute(addProfileCommand({ id: 'p3', variantId: 'm40-40x40', length: 360, start: [0, 20, 0], direction: [0, 1, 0] }));
    const after = clone(store.getState().design);
    store.getState().undo();
    expect(store.getState().design.profiles.map((p) => p.id)).toEqual(['p1', 'p2']);
    store.getState().redo();
    expect(store.getState().design).toEqual(after);
  });

  it('a new command after an undo discards the redo branch', () => {
    const store = loadedStore();
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 700 }));
    store.getState().undo();
    store.getState().execute(updateProfileCommand('Set length', 'p2', { length: 650 }));
    expect(history(store)).toEqual({ past: 1, future: 0 });
    store.getState().redo();
    expect(store.getState().design.profiles[0].length).toBe(500);
  });

  it('a drag is one history entry that undoes to the design before the drag', () => {
    const store = loadedStore();
    const beforeDrag = clone(store.getState().design);
    const { beginGesture, previewDesign, endGesture } = store.getState();
    beginGesture();
    for (const x of [10, 20, 30, 40]) {
      const current = store.getState().design;
      previewDesign({ ...current, profiles: current.profiles.map((p) => (p.id === 'p2' ? { ...p, start: [x, 400, 0] as [number, number, number] } : p)) });
    }
    expect(history(store).past).toBe(0);
    endGesture('Move profile');
    expect(store.getState().design.profiles[1].start).toEqual([40, 400, 0]);
    expect(history(store)).toEqual({ past: 1, future: 0 });
    expect(store.getState().historyLabel).toBe('Move profile');
    store.getState().undo();
    expect(store.getState().design).toEqual(beforeDrag);
    store.getState().redo();
    expect(store.getState().design.profiles[1].start).toEqual([40, 400, 0]);
  });

  it('a drag that ends where it began leaves no history entry', () => {
    const store = loadedStore();
    store.getState().beginGesture();
    store.getState().endGesture('Move profile');
    expect(history(store).past).toBe(0);
    // Tracking is back on after the gesture.
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 800 }));
    expect(history(store).past).toBe(1);
  });

  it('cancelling a drag restores the design without a history entry', () => {
    const store = loadedStore();
    const before = store.getState().design;
    store.getState().beginGesture();
    store.getState().previewDesign({ ...before, name: 'moved' });
    store.getState().cancelGesture();
    expect(store.getState().design).toBe(before);
    expect(history(store).past).toBe(0);
  });

  it('previewDesign outside a gesture does not change the design', () => {
    const store = loadedStore();
    const before = store.getState().design;
    store.getState().previewDesign({ ...before, name: 'sneaky' });
    expect(store.getState().design).toBe(before);
  });

  it('loading a design is not undoable and clears earlier history', () => {
    const store = loadedStore();
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 900 }));
    const other = { ...twoRailDesign(), name: 'Other design' };
    store.getState().loadDesign(other, { designId: 8, revision: 1 });
    expect(history(store)).toEqual({ past: 0, future: 0 });
    store.getState().undo();
    expect(store.getState().design.name).toBe('Other design');
    expect(store.getState().designId).toBe(8);
    expect(store.getState().baseRevision).toBe(1);
  });

  it('a refused command leaves the design and history unchanged and says why', () => {
    const store = loadedStore();
    const before = store.getState().design;
    const applied = store.getState().execute(updateProfileCommand('Set length', 'missing', { length: 10 }));
    expect(applied).toBe(false);
    expect(store.getState().design).toBe(before);
    expect(history(store).past).toBe(0);
    expect(store.getState().lastRefusal?.message).toMatch(/missing/);
  });
});

describe('editor store dirty tracking', () => {
  it('is clean after loading, dirty after an edit, clean again after undoing back to the loaded design', () => {
    const store = loadedStore();
    expect(store.getState().dirty).toBe(false);
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 600 }));
    expect(store.getState().dirty).toBe(true);
    store.getState().undo();
    expect(store.getState().dirty).toBe(false);
  });

  it('markSaved makes the saved design the clean one and keeps edits made during the save dirty', () => {
    const store = loadedStore();
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 600 }));
    const sent = store.getState().design;
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 610 }));
    store.getState().markSaved({ revision: 4, at: '2026-01-01T00:05:00Z', by: 'Tomasz Reyes', design: sent });
    expect(store.getState().dirty).toBe(true);
    expect(store.getState().baseRevision).toBe(4);
    expect(store.getState().lastSaved).toEqual({ revision: 4, at: '2026-01-01T00:05:00Z', by: 'Tomasz Reyes' });
    store.getState().undo();
    expect(store.getState().dirty).toBe(false);
  });
});

describe('editor store selection', () => {
  it('replace, add and toggle modes change the selection as named', () => {
    const store = loadedStore();
    const { select } = store.getState();
    select(['p1']);
    expect(store.getState().selection).toEqual(['p1']);
    select(['p2'], 'add');
    expect(store.getState().selection).toEqual(['p1', 'p2']);
    select(['p1'], 'toggle');
    expect(store.getState().selection).toEqual(['p2']);
    select(['p1'], 'toggle');
    expect(store.getState().selection).toEqual(['p2', 'p1']);
    select(['p1', 'p1'], 'replace');
    expect(store.getState().selection).toEqual(['p1']);
    store.getState().clearSelection();
    expect(store.getState().selection).toEqual([]);
  });

  it('selection changes are never history entries', () => {
    const store = loadedStore();
    store.getState().select(['p1']);
    store.getState().setHovered('p2');
    store.getState().setTool('draw-profile');
    expect(history(store).past).toBe(0);
  });

  it('drops parts from the selection when an undo removes them', () => {
    const store = loadedStore();
    store.getState().execute(addProfileCommand({ id: 'p3', variantId: 'm40-40x40', length: 360, start: [0, 20, 0], direction: [0, 1, 0] }));
    store.getState().select(['p1', 'p3']);
    store.getState().undo();
    expect(store.getState().selection).toEqual(['p1']);
  });

  it('camera requests carry a new nonce each time so the scene reacts to repeats', () => {
    const store = loadedStore();
    store.getState().requestView('top');
    const first = store.getState().viewRequest!.nonce;
    store.getState().requestView('top');
    expect(store.getState().viewRequest!.nonce).toBeGreaterThan(first);
    store.getState().requestFrame('all');
    expect(store.getState().frameRequest?.ids).toBe('all');
  });
});
