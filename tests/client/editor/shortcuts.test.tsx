import { editorShortcuts, SHOW_ALL, TOOL_SHORTCUTS } from '@/features/editor/hooks/shortcutList';
// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useEditorShortcuts, type ShortcutHandlers } from '@/features/editor/hooks/useEditorShortcuts';
import { updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { createEditorStore, EditorStoreProvider } from '@/features/editor/store/editorStore';
import { twoRailDesign } from './fixtures';

afterEach(cleanup);

function Harness({ handlers }: { handlers: ShortcutHandlers }) {
  useEditorShortcuts(handlers);
  return <input aria-label="A text field" />;
}

function setup(modelCovered = false) {
  const store = createEditorStore({ design: twoRailDesign() });
  const handlers = { save: vi.fn(), deleteSelection: vi.fn(), duplicateSelection: vi.fn(), openShortcutSheet: vi.fn(), modelCovered };
  render(
    <EditorStoreProvider store={store}>
      <Harness handlers={handlers} />
    </EditorStoreProvider>,
  );
  return { store, handlers, user: userEvent.setup({ delay: null }) };
}

describe('editor keys', () => {
  it('each tool answers to the first letter of its own name: D draws, F fills, M measures, P picks; Escape clears the selection before it leaves a tool', async () => {
    const { store, user } = setup();
    await user.keyboard('d');
    expect(store.getState().tool).toBe('draw-profile');
    await user.keyboard('f');
    expect(store.getState().tool).toBe('fill-opening');
    await user.keyboard('m');
    expect(store.getState().tool).toBe('measure');
    await user.keyboard('v');
    expect(store.getState().tool, 'V is not ours').toBe('measure');
    await user.keyboard('p');
    expect(store.getState().tool).toBe('select');
    store.getState().setTool('draw-profile');
    store.getState().select(['p1']);
    await user.keyboard('{Escape}');
    expect(store.getState().selection).toEqual([]);
    expect(store.getState().tool).toBe('draw-profile');
    await user.keyboard('{Escape}');
    expect(store.getState().tool).toBe('select');
  });

  it('while the full-width outputs cover the model, Delete, duplicate, tools and views do nothing; save and the key sheet still answer', async () => {
    const { store, handlers, user } = setup(true);
    store.getState().select(['p1']);
    await user.keyboard('{Delete}');
    await user.keyboard('{Control>}d{/Control}');
    await user.keyboard('d');
    await user.keyboard('1');
    expect(handlers.deleteSelection).not.toHaveBeenCalled();
    expect(handlers.duplicateSelection).not.toHaveBeenCalled();
    expect(store.getState().tool).toBe('select');
    expect(store.getState().selection).toEqual(['p1']);
    await user.keyboard('{Control>}s{/Control}');
    await user.keyboard('?');
    expect(handlers.save).toHaveBeenCalledTimes(1);
    expect(handlers.openShortcutSheet).toHaveBeenCalledTimes(1);
  });

  it('Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo', async () => {
    const { store, user } = setup();
    store.getState().execute(updateProfileCommand('Set length', 'p1', { length: 800 }));
    await user.keyboard('{Control>}z{/Control}');
    expect(store.getState().design.profiles[0].length).toBe(500);
    await user.keyboard('{Control>}{Shift>}z{/Shift}{/Control}');
    expect(store.getState().design.profiles[0].length).toBe(800);
    await user.keyboard('{Control>}z{/Control}{Control>}y{/Control}');
    expect(store.getState().design.profiles[0].length).toBe(800);
  });

  it('number keys turn the camera, A shows all, and the action keys reach their handlers', async () => {
    const { store, handlers, user } = setup();
    await user.keyboard('2');
    expect(store.getState().viewRequest?.view).toBe('top');
    await user.keyboard('4');
    expect(store.getState().viewRequest?.view).toBe('iso');
    await user.keyboard('a');
    expect(store.getState().frameRequest?.ids).toBe('all');
    await user.keyboard('{Delete}{Control>}d{/Control}?{Control>}s{/Control}');
    expect(handlers.deleteSelection).toHaveBeenCalledTimes(1);
    expect(handlers.duplicateSelection).toHaveBeenCalledTimes(1);
    expect(handlers.openShortcutSheet).toHaveBeenCalledTimes(1);
    expect(handlers.save).toHaveBeenCalledTimes(1);
  });

  it('typing in a field is left alone, except Ctrl+S which still saves', async () => {
    const { store, handlers, user } = setup();
    await user.click(screen.getByRole('textbox', { name: 'A text field' }));
    await user.keyboard('d2{Delete}');
    expect(store.getState().tool).toBe('select');
    expect(store.getState().viewRequest).toBeNull();
    expect(handlers.deleteSelection).not.toHaveBeenCalled();
    await user.keyboard('{Control>}s{/Control}');
    expect(handlers.save).toHaveBeenCalledTimes(1);
  });

  it('the tool keys are the first letters of the tool names, all different, and the sheet lists them', () => {
    const keys = TOOL_SHORTCUTS.map((t) => t.key);
    expect(TOOL_SHORTCUTS.map((t) => t.label.charAt(0))).toEqual(keys);
    expect(new Set([...keys, SHOW_ALL.key]).size).toBe(keys.length + 1);
    const sheet = editorShortcuts('Ctrl').flatMap((entry) => entry.keys);
    for (const key of [...keys, SHOW_ALL.key]) expect(sheet).toContain(key);
    expect(sheet).not.toContain('V');
  });
});
