import { useCallback } from 'react';
import { addedPartIds, deletePartsCommand, duplicatePartsCommand } from '../commands/selectionCommands';
import { useEditorStoreApi } from '../store/editorStore';
import type { EditorCommand } from '../commands/EditorCommand';
import type { EditorStoreApi } from '../store/types';

/** Runs a command that adds parts and selects what it added (a duplicate, a mirrored copy, an array). */
export function executeAndSelectAdded(store: EditorStoreApi, command: EditorCommand): boolean {
  const before = store.getState().design;
  const applied = store.getState().execute(command);
  if (!applied) return false;
  const added = addedPartIds(before, store.getState().design);
  if (added.length > 0) store.getState().select(added);
  return true;
}

/** Delete and duplicate for the current selection (keyboard and inspector share them). */
export function useSelectionActions() {
  const store = useEditorStoreApi();
  const deleteSelection = useCallback(() => {
    const { selection, execute, clearSelection } = store.getState();
    if (selection.length === 0) return;
    if (execute(deletePartsCommand(selection))) clearSelection();
  }, [store]);
  const duplicateSelection = useCallback(() => {
    const { selection, design } = store.getState();
    if (selection.length === 0) return;
    executeAndSelectAdded(store, duplicatePartsCommand(design, selection));
  }, [store]);
  return { deleteSelection, duplicateSelection };
}
