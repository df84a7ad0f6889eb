import { useMemo } from 'react';
import type { ThreeEvent } from '@react-three/fiber';
import { useEditorStoreApi } from '../store/editorStore';
import { partIdOfHit } from './sceneContext';

/** Pointer travel (px) above which a press-and-release is a camera drag, not a click. */
export const CLICK_SLOP_PX = 5;

/** Click selects the part under the pointer (shift adds, ctrl/cmd toggles) while the select tool is active. */
export function useSelectOnClick(pickable: boolean) {
  const store = useEditorStoreApi();
  return useMemo(() => {
    if (!pickable) return undefined;
    return (e: ThreeEvent<MouseEvent>) => {
      const state = store.getState();
      if (state.tool !== 'select' || e.delta > CLICK_SLOP_PX) return;
      const id = partIdOfHit(e.object, e.instanceId);
      if (!id) return;
      e.stopPropagation();
      const mode = e.shiftKey ? 'add' : e.ctrlKey || e.metaKey ? 'toggle' : 'replace';
      state.select([id], mode);
    };
  }, [pickable, store]);
}
