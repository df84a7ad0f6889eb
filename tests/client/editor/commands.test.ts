import { describe, expect, it } from 'vitest';
import { groupCommand } from '@/features/editor/commands/groupCommand';
import { replaceDesignCommand } from '@/features/editor/commands/replaceDesignCommand';
import { updatePanelCommand, updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { addProfileCommand, clone, twoRailDesign } from './fixtures';

describe('editor commands', () => {
  it('a profile update undoes exactly, restoring only the fields it changed', () => {
    const design = twoRailDesign();
    const before = clone(design);
    const command = updateProfileCommand('Set length and roll', 'p1', { length: 250, rollDeg: 90 });
    const after = command.apply(design);
    expect(after.profiles[0]).toMatchObject({ length: 250, rollDeg: 90 });
    expect(command.undo!(after)).toEqual(before);
  });

  it('a profile update that adds an optional field removes it again on undo', () => {
    const design = twoRailDesign();
    const command = updateProfileCommand('Name profile', 'p1', { label: 'Top rail' });
    const undone = command.undo!(command.apply(design));
    expect('label' in undone.profiles[0]).toBe(false);
    expect(undone).toEqual(design);
  });

  it('a group applies in order and undoes in reverse order', () => {
    const design = twoRailDesign();
    const before = clone(design);
    const group = groupCommand('Add and stretch', [
      addProfileCommand({ id: 'p3', variantId: 'm40-40x40', length: 360, start: [0, 20, 0], direction: [0, 1, 0] }),
      // Only valid after the first member ran: proves the order.
      updateProfileCommand('Stretch', 'p3', { length: 400 }),
    ]);
    const after = group.apply(design);
    expect(after.profiles.find((p) => p.id === 'p3')?.length).toBe(400);
    expect(group.undo!(after)).toEqual(before);
  });

  it('a group is one history entry in the store', () => {
    const store = createEditorStore({ design: twoRailDesign() });
    const before = clone(store.getState().design);
    store.getState().execute(
      groupCommand('Lengthen both', [updateProfileCommand('a', 'p1', { length: 800 }), updateProfileCommand('b', 'p2', { length: 800 })]),
    );
    expect(store.temporal.getState().pastStates).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().design).toEqual(before);
  });

  it('a group whose later member refuses leaves the design unchanged', () => {
    const store = createEditorStore({ design: twoRailDesign() });
    const before = store.getState().design;
    const applied = store.getState().execute(
      groupCommand('Lengthen', [updateProfileCommand('a', 'p1', { length: 800 }), updateProfileCommand('b', 'nope', { length: 800 })]),
    );
    expect(applied).toBe(false);
    expect(store.getState().design).toBe(before);
  });

  it('replacing the design undoes to the previous document', () => {
    const store = createEditorStore({ design: twoRailDesign() });
    const before = clone(store.getState().design);
    store.getState().execute(replaceDesignCommand('Replace with generated frame', { ...twoRailDesign(), name: 'Generated', profiles: [] }));
    expect(store.getState().design.name).toBe('Generated');
    store.getState().undo();
    expect(store.getState().design).toEqual(before);
  });

  it('the JSON form refers to parts by id and survives a JSON round trip', () => {
    const group = groupCommand('Edit', [updateProfileCommand('a', 'p1', { length: 800 }), updatePanelCommand('b', 'panel-1', { thickness: 6 })]);
    const json = JSON.parse(JSON.stringify(group.toJSON()));
    expect(json).toEqual({
      type: 'group',
      label: 'Edit',
      commands: [
        { type: 'operation', label: 'a', operation: { type: 'updateProfile', payload: { profileId: 'p1', changes: { length: 800 } } } },
        { type: 'operation', label: 'b', operation: { type: 'updatePanel', payload: { panelId: 'panel-1', changes: { thickness: 6 } } } },
      ],
    });
  });

  it('the history names the command to undo and the one to redo', () => {
    const store = createEditorStore({ design: twoRailDesign() });
    store.getState().execute(updateProfileCommand('Set length of p1', 'p1', { length: 800 }));
    store.getState().execute(updateProfileCommand('Set length of p2', 'p2', { length: 800 }));
    expect(store.getState().historyLabel).toBe('Set length of p2');
    store.getState().undo();
    expect(store.getState().historyLabel).toBe('Set length of p1');
    const future = store.temporal.getState().futureStates;
    expect(future[future.length - 1].historyLabel).toBe('Set length of p2');
  });
});
