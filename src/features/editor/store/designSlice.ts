import type { StoreApi } from 'zustand';
import type { TemporalState } from 'zundo';
import type { DesignDocument } from '@/domain/design/schema';
import type { EditorCommand } from '../commands/EditorCommand';
import { pruneSelection } from './partIds';
import type { DesignSlice, EditorState, HistorySnapshot, SliceGet, SliceSet } from './types';

export const HISTORY_LIMIT = 200;

type TemporalApi = StoreApi<TemporalState<HistorySnapshot>>;

/**
 * The document and its history. The temporal middleware records `design` (with its label) on
 * every change while tracking; gestures pause tracking and push one entry on release, and
 * loading clears the history so a load is never undone.
 */
export function createDesignSlice(
  set: SliceSet,
  get: SliceGet,
  temporal: () => TemporalApi,
  initialDesign: DesignDocument,
): DesignSlice {
  // The design the last load or save wrote; `dirty` is "the current design is not that object".
  let savedDesign = initialDesign;
  // Where the running gesture started, to push as the single undo entry on release.
  let gestureStart: HistorySnapshot | null = null;
  let refusalNonce = 0;

  const afterDesignChange = (design: DesignDocument): Partial<EditorState> => ({
    dirty: design !== savedDesign,
    selection: pruneSelection(get().selection, design),
  });

  const finishGesture = (label: string) => {
    const start = gestureStart;
    gestureStart = null;
    const { design } = get();
    if (start && design !== start.design) {
      set({ historyLabel: label, gestureActive: false });
      const { pastStates } = temporal().getState();
      const trimmed = pastStates.length >= HISTORY_LIMIT ? pastStates.slice(1) : pastStates;
      temporal().setState({ pastStates: [...trimmed, start], futureStates: [] });
    } else {
      set({ gestureActive: false });
    }
    temporal().getState().resume();
  };

  return {
    designId: null,
    baseRevision: 0,
    design: initialDesign,
    dirty: false,
    lastSaved: null,
    historyLabel: undefined,
    gestureActive: false,
    lastRefusal: null,

    execute(command: EditorCommand) {
      if (gestureStart) finishGesture('Drag');
      const before = get().design;
      let next: DesignDocument;
      try {
        next = command.apply(before);
      } catch (error) {
        refusalNonce += 1;
        const message = error instanceof Error ? error.message : String(error);
        set({ lastRefusal: { label: command.label, message, nonce: refusalNonce } });
        return false;
      }
      if (next === before) return true;
      set({ design: next, historyLabel: command.label, ...afterDesignChange(next) });
      return true;
    },

    beginGesture() {
      if (gestureStart) return;
      const { design, historyLabel } = get();
      gestureStart = { design, historyLabel };
      temporal().getState().pause();
      set({ gestureActive: true });
    },

    previewDesign(design: DesignDocument) {
      if (!gestureStart) {
        if (import.meta.env?.DEV) console.warn('previewDesign is only recorded inside beginGesture/endGesture; ignored.');
        return;
      }
      set({ design, ...afterDesignChange(design) });
    },

    endGesture(label: string) {
      if (!gestureStart) return;
      finishGesture(label);
    },

    cancelGesture() {
      const start = gestureStart;
      if (!start) return;
      gestureStart = null;
      set({ design: start.design, historyLabel: start.historyLabel, gestureActive: false, ...afterDesignChange(start.design) });
      temporal().getState().resume();
    },

    undo() {
      if (gestureStart) {
        get().cancelGesture();
        return;
      }
      temporal().getState().undo();
      const { design } = get();
      set(afterDesignChange(design));
    },

    redo() {
      if (gestureStart) return;
      temporal().getState().redo();
      const { design } = get();
      set(afterDesignChange(design));
    },

    loadDesign(design, meta) {
      gestureStart = null;
      savedDesign = design;
      const history = temporal().getState();
      history.pause();
      set({
        design,
        designId: meta.designId,
        baseRevision: meta.revision,
        historyLabel: undefined,
        gestureActive: false,
        dirty: false,
        lastRefusal: null,
        selection: [],
        hoveredId: null,
        pickedOpeningId: null,
        analysis: null,
        analysedDesign: null,
        analysisStatus: 'idle',
        lastSaved: meta.savedAt ? { at: meta.savedAt, by: meta.savedBy ?? '', revision: meta.revision } : null,
      });
      history.clear();
      history.resume();
    },

    markSaved(meta) {
      savedDesign = meta.design ?? get().design;
      set({
        baseRevision: meta.revision,
        lastSaved: { at: meta.at, by: meta.by, revision: meta.revision },
        dirty: get().design !== savedDesign,
      });
    },
  };
}
