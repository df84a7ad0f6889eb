import { createContext, useContext, useState, type ReactNode } from 'react';
import { useStore } from 'zustand';
import { createEditorStore } from './createEditorStore';
import type { EditorState, EditorStoreApi } from './types';

const EditorStoreContext = createContext<EditorStoreApi | null>(null);

/** Provides one editor store to the tree: the given one (tests, route) or a fresh one. */
export function EditorStoreProvider({ store, children }: { store?: EditorStoreApi; children: ReactNode }) {
  const [ownStore] = useState(() => store ?? createEditorStore());
  return <EditorStoreContext.Provider value={store ?? ownStore}>{children}</EditorStoreContext.Provider>;
}

/** The store itself, for getState() in handlers and useFrame. */
export function useEditorStoreApi(): EditorStoreApi {
  const store = useContext(EditorStoreContext);
  if (!store) throw new Error('useEditorStoreApi must be used inside <EditorStoreProvider>.');
  return store;
}

/** Subscribes to a slice of editor state; return primitives or stable references (use useShallow for new objects). */
export function useEditorStore<T>(selector: (state: EditorState) => T): T {
  return useStore(useEditorStoreApi(), selector);
}

/** Whether undo and redo are possible, and the labels of the commands they would reverse or repeat. */
export function useEditorHistory(): { canUndo: boolean; canRedo: boolean; undoLabel?: string; redoLabel?: string } {
  const store = useEditorStoreApi();
  const pastCount = useStore(store.temporal, (history) => history.pastStates.length);
  const redoLabel = useStore(store.temporal, (history) => history.futureStates[history.futureStates.length - 1]?.historyLabel);
  const futureCount = useStore(store.temporal, (history) => history.futureStates.length);
  const undoLabel = useStore(store, (state) => state.historyLabel);
  return {
    canUndo: pastCount > 0,
    canRedo: futureCount > 0,
    undoLabel: pastCount > 0 ? undoLabel : undefined,
    redoLabel: futureCount > 0 ? redoLabel : undefined,
  };
}
