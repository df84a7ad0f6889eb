import { createStore } from 'zustand/vanilla';
import { temporal } from 'zundo';
import { CURRENT_SCHEMA_VERSION, designDocumentSchema, type DesignDocument } from '@/domain/design/schema';
import { createAnalysisSlice } from './analysisSlice';
import { createDesignSlice, HISTORY_LIMIT } from './designSlice';
import { createSelectionSlice } from './selectionSlice';
import type { EditorState, EditorStoreApi, HistorySnapshot } from './types';
import { createViewSlice } from './viewSlice';

/** A blank document so the store always holds a valid design before the real one loads. */
export function placeholderDesign(): DesignDocument {
  return designDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION, name: 'Untitled design', systemId: 'metric-40' });
}

type InitialState = Partial<Pick<EditorState, 'design' | 'designId' | 'baseRevision' | 'units' | 'tool' | 'drawSystemVariantId' | 'selection' | 'lastSaved'>>;

/**
 * The editor's store, without React: one zustand store in slices, with zundo recording only
 * the design (and the label of the command that produced it). An initial design is the
 * starting point, not an undoable edit.
 */
export function createEditorStore(initial: InitialState = {}): EditorStoreApi {
  const initialDesign = initial.design ?? placeholderDesign();
  const store = createStore<EditorState>()(
    temporal(
      (set, get, api) => ({
        ...createDesignSlice(set, get, () => (api as unknown as EditorStoreApi).temporal, initialDesign),
        ...createSelectionSlice(set, get),
        ...createViewSlice(set, get),
        ...createAnalysisSlice(set),
        ...initial,
        design: initialDesign,
      }),
      {
        partialize: (state): HistorySnapshot => ({ design: state.design, historyLabel: state.historyLabel }),
        // Only a new design object is an edit; selection, hover, tool and analysis never enter the history.
        equality: (past, current) => past.design === current.design,
        limit: HISTORY_LIMIT,
      },
    ),
  );
  return store as EditorStoreApi;
}
