import { useContext, useMemo } from 'react';
import type { ThreeEvent } from '@react-three/fiber';
import { PartClickContext, partIdOfHit } from './sceneContext';

/** Pointer travel (px) above which a press-and-release is a camera drag, not a click. */
export const CLICK_SLOP_PX = 5;

/**
 * Click hands the part under the pointer to the viewer's `onPartClick` (shift adds, ctrl/cmd
 * toggles); a drag that moved more than CLICK_SLOP_PX is a camera move, not a click.
 */
export function useSelectOnClick(pickable: boolean) {
  const onPartClick = useContext(PartClickContext);
  return useMemo(() => {
    if (!pickable || !onPartClick) return undefined;
    return (e: ThreeEvent<MouseEvent>) => {
      if (e.delta > CLICK_SLOP_PX) return;
      const id = partIdOfHit(e.object, e.instanceId);
      if (!id) return;
      e.stopPropagation();
      onPartClick(id, e.shiftKey ? 'add' : e.ctrlKey || e.metaKey ? 'toggle' : 'replace');
    };
  }, [pickable, onPartClick]);
}
