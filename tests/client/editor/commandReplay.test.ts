import { describe, expect, it } from 'vitest';
import { boxFrameGenerator, generateDesign } from '@/domain/design/generators';
import type { DesignDocument } from '@/domain/design/schema';
import { commandFromJSON, groupCommand, operationCommand, type EditorCommand } from '@/features/editor/commands';
import { insertDesignCommand } from '@/features/editor/commands/insertDesignCommand';
import { setDesignUnitsCommand, updateJointCommand, updatePanelCommand, updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { replaceDesignCommand } from '@/features/editor/commands/replaceDesignCommand';
import { deletePartsCommand } from '@/features/editor/commands/selectionCommands';
import { addLoadCaseCommand, removeLoadCaseCommand, updateSettingsCommand } from '@/features/editor/panels/panelCommands';
import { createEditorStore } from '@/features/editor/store/editorStore';

const walled = (): DesignDocument => generateDesign('box-frame', { ...boxFrameGenerator.defaults, panels: 'walls' });

describe('a recorded command history', () => {
  it('replays from its JSON onto the original document and gives the same design', () => {
    const original = walled();
    const store = createEditorStore();
    store.getState().loadDesign(original, { designId: 1, revision: 1 });
    const panel = original.panels[0];
    const joint = original.joints[0];
    const profile = original.profiles[0];
    const history: EditorCommand[] = [
      updateSettingsCommand('Kerf 2.5 mm', { kerf: 2.5, stockLength: 3000 }),
      addLoadCaseCommand({ id: 'load-1', name: 'Shelf load', loads: [{ kind: 'point', profileId: profile.id, along: 100, force: 200, direction: [0, -1, 0] }], support: 'simple' }),
      addLoadCaseCommand({ id: 'load-2', name: 'Spare', loads: [], support: 'fixed' }),
      removeLoadCaseCommand('load-2'),
      updatePanelCommand('Thinner sheet', panel.id, { thickness: 3 }),
      updateJointCommand('Socket heads', joint.id, { fastenerHead: 'socket' }),
      updateProfileCommand('Longer', profile.id, { length: profile.length + 50 }),
      setDesignUnitsCommand('in'),
      insertDesignCommand('Add a box frame', generateDesign('box-frame', boxFrameGenerator.defaults)),
      groupCommand('Two edits', [deletePartsCommand([original.profiles[1].id]), operationCommand('Caps', { type: 'autoEndCaps' })]),
    ];
    const recorded: string[] = [];
    for (const command of history) {
      expect(store.getState().execute(command), command.label).toBe(true);
      recorded.push(JSON.stringify(command.toJSON()));
    }
    const edited = store.getState().design;
    expect(edited).not.toEqual(original);

    const replayed = recorded.map((text) => commandFromJSON(JSON.parse(text))).reduce((design, command) => command.apply(design), original);
    expect(replayed).toEqual(edited);
    expect(replayed.settings.kerf).toBe(2.5);
    expect(replayed.units).toBe('in');
    expect(replayed.loadCases.map((loadCase) => loadCase.id)).toEqual(['load-1']);
    expect(replayed.profiles.length).toBeGreaterThan(original.profiles.length);
  });

  it('replays a whole-document replacement and refuses JSON that is not a command', () => {
    const original = walled();
    const next = generateDesign('box-frame', boxFrameGenerator.defaults);
    const json = JSON.parse(JSON.stringify(replaceDesignCommand('Replace', next).toJSON()));
    expect(commandFromJSON(json).apply(original)).toEqual(next);
    expect(() => commandFromJSON({ type: 'update', id: 'p1' })).toThrow(/Not a recorded command/);
  });
});
