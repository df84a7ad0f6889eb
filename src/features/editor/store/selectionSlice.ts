import type { SelectionMode, SelectionSlice, SliceGet, SliceSet } from './types';

/** Which parts are selected or hovered, and the opening the fill tool picked. */
export function createSelectionSlice(set: SliceSet, get: SliceGet): SelectionSlice {
  return {
    selection: [],
    hoveredId: null,
    pickedOpeningId: null,

    select(ids: string[], mode: SelectionMode = 'replace') {
      const current = get().selection;
      if (mode === 'replace') {
        set({ selection: unique(ids) });
      } else if (mode === 'add') {
        set({ selection: unique([...current, ...ids]) });
      } else {
        const toggled = new Set(current);
        for (const id of unique(ids)) {
          if (toggled.has(id)) toggled.delete(id);
          else toggled.add(id);
        }
        set({ selection: [...toggled] });
      }
    },

    clearSelection() {
      if (get().selection.length > 0) set({ selection: [] });
    },

    setHovered(id: string | null) {
      if (get().hoveredId !== id) set({ hoveredId: id });
    },

    pickOpening(openingId: string | null) {
      set({ pickedOpeningId: openingId });
    },
  };
}

function unique(ids: string[]): string[] {
  return [...new Set(ids)];
}
