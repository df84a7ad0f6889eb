import type { EditorTool, EditorView, DisplayUnits, SliceGet, SliceSet, ViewSlice } from './types';

export const DEFAULT_DRAW_VARIANT_ID = 'm40-40x40';

/** Tool, units and one-shot camera requests (the scene acts when a nonce changes). */
export function createViewSlice(set: SliceSet, get: SliceGet): ViewSlice {
  let nonce = 0;
  return {
    tool: 'select',
    drawSystemVariantId: DEFAULT_DRAW_VARIANT_ID,
    units: 'mm',
    frameRequest: null,
    viewRequest: null,

    setTool(tool: EditorTool) {
      if (get().tool === tool) return;
      // Leaving the fill tool forgets the picked opening, so coming back starts fresh.
      set(tool === 'fill-opening' ? { tool } : { tool, pickedOpeningId: null });
    },
    setDrawVariant(variantId: string) {
      set({ drawSystemVariantId: variantId });
    },
    requestFrame(ids: string[] | 'all') {
      nonce += 1;
      set({ frameRequest: { ids, nonce } });
    },
    requestView(view: EditorView) {
      nonce += 1;
      set({ viewRequest: { view, nonce } });
    },
    setUnits(units: DisplayUnits) {
      if (get().units !== units) set({ units });
    },
  };
}
