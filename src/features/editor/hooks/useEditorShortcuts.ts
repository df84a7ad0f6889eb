import { useEffect, useRef } from 'react';
import { useEditorStoreApi } from '../store/editorStore';
import type { EditorTool, EditorView } from '../store/types';
import { SHOW_ALL, TOOL_SHORTCUTS, VIEW_SHORTCUTS } from './shortcutList';

export interface ShortcutHandlers {
  save(): void;
  deleteSelection(): void;
  duplicateSelection(): void;
  openShortcutSheet(): void;
  /** True while something covers the model (the full-width outputs): keys that act on the model are ignored. */
  modelCovered?: boolean;
}

const VIEW_KEYS: Record<string, EditorView> = Object.fromEntries(VIEW_SHORTCUTS.map((v) => [v.key, v.view]));
const TOOL_KEYS: Record<string, EditorTool> = Object.fromEntries(TOOL_SHORTCUTS.map((t) => [t.key.toLowerCase(), t.tool]));

/** True when the key press belongs to a text field, select or editable element, not to the editor. */
function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  const tag = target.tagName;
  if (tag === 'TEXTAREA' || tag === 'SELECT') return true;
  if (tag !== 'INPUT') return false;
  const type = (target as HTMLInputElement).type;
  return !['checkbox', 'radio', 'button', 'submit', 'range'].includes(type);
}

/** True while a modal dialog is open: its own keys (Escape, Tab) win. */
const dialogOpen = () => document.querySelector('[aria-modal="true"]') !== null;

/** The editor's keyboard shortcuts (listed in hooks/shortcutList.ts and the shortcut sheet). */
export function useEditorShortcuts(handlers: ShortcutHandlers): void {
  const store = useEditorStoreApi();
  const handlersRef = useRef(handlers);
  handlersRef.current = handlers;

  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      const mod = event.ctrlKey || event.metaKey;
      const key = event.key;
      const lower = key.toLowerCase();
      const state = store.getState();
      const run = (action: () => void) => {
        event.preventDefault();
        action();
      };

      // Saving works from anywhere, even while typing in a field.
      if (mod && !event.altKey && lower === 's') return run(() => handlersRef.current.save());
      if (isTypingTarget(event.target) || dialogOpen()) return;

      if (mod && !event.altKey) {
        if (lower === 'z' && event.shiftKey) return run(state.redo);
        if (lower === 'z') return run(state.undo);
        if (lower === 'y') return run(state.redo);
        if (lower === 'd' && !handlersRef.current.modelCovered) return run(() => handlersRef.current.duplicateSelection());
        return;
      }
      if (event.altKey) return;

      if (key === '?') return run(() => handlersRef.current.openShortcutSheet());
      // The model is covered: selection, tools and views would act on parts nobody can see.
      if (handlersRef.current.modelCovered) return;
      if (key === 'Escape') {
        return run(() => {
          if (state.gestureActive) state.cancelGesture();
          else if (state.selection.length > 0) state.clearSelection();
          else if (state.tool !== 'select') state.setTool('select');
        });
      }
      if (key === 'Delete' || key === 'Backspace') return run(() => handlersRef.current.deleteSelection());
      if (event.shiftKey) return;
      const tool = TOOL_KEYS[lower];
      if (tool) return run(() => state.setTool(tool));
      if (lower === SHOW_ALL.key.toLowerCase()) return run(() => state.requestFrame(state.selection.length > 0 ? state.selection : 'all'));
      const view = VIEW_KEYS[key];
      if (view) return run(() => state.requestView(view));
    }
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [store]);
}
