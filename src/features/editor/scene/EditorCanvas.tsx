import { useCallback, useMemo } from 'react';
import { DesignViewer, type CameraRequest, type PartClickMode, type ViewName } from '@/components/viewer';
import { defaultCatalogue, type Catalogue } from '@/domain/catalogue';
import { useEditorStore, useEditorStoreApi } from '../store/editorStore';
import type { EditorView } from '../store/types';
import { DrawProfileTool } from './DrawProfileTool';
import { HoverPicker } from './HoverPicker';
import { MoveGizmo } from './MoveGizmo';
import { OpeningTargets } from './OpeningTargets';

interface EditorCanvasProps {
  /** Catalogue the parts are drawn from (default: the built-in catalogue). */
  catalogue?: Catalogue;
  /** Extra class names for the wrapper, which fills its parent (default none). */
  className?: string;
}

/** The editor's view names map onto the viewer's; "side" looks from the right (+X). */
const VIEW_NAMES: Record<EditorView, ViewName> = { front: 'front', top: 'top', side: 'right', iso: 'iso' };

/**
 * The editor's 3D view: the shared DesignViewer fed from the editor store, with the editor's
 * tools on top (draw, move gizmo, hover picking, opening targets). Clicks select parts only with
 * the select tool; a click on empty space clears the selection.
 */
export function EditorCanvas({ catalogue = defaultCatalogue, className }: EditorCanvasProps) {
  const store = useEditorStoreApi();
  const design = useEditorStore((s) => s.design);
  const analysis = useEditorStore((s) => s.analysis);
  const selection = useEditorStore((s) => s.selection);
  const hoveredId = useEditorStore((s) => s.hoveredId);
  const units = useEditorStore((s) => s.units);
  const designId = useEditorStore((s) => s.designId);
  const frameRequest = useEditorStore((s) => s.frameRequest);
  const viewRequest = useEditorStore((s) => s.viewRequest);

  // Frame and view requests share one nonce counter in the store: the larger nonce is the latest.
  const cameraRequest = useMemo<CameraRequest | null>(() => {
    const frame = frameRequest ? { ids: frameRequest.ids, nonce: frameRequest.nonce } : null;
    const view = viewRequest ? { ids: 'all' as const, view: VIEW_NAMES[viewRequest.view], nonce: viewRequest.nonce } : null;
    if (!frame) return view;
    if (!view) return frame;
    return frame.nonce > view.nonce ? frame : view;
  }, [frameRequest, viewRequest]);

  const onPartClick = useCallback(
    (id: string, mode: PartClickMode) => {
      const state = store.getState();
      if (state.tool === 'select') state.select([id], mode);
    },
    [store],
  );
  const onEmptyClick = useCallback(() => {
    const state = store.getState();
    if (state.tool === 'select') state.clearSelection();
  }, [store]);
  const display = useMemo(() => ({ units }), [units]);

  return (
    <DesignViewer
      design={design}
      analysis={analysis}
      selection={selection}
      hoveredId={hoveredId}
      display={display}
      cameraRequest={cameraRequest}
      frameKey={designId}
      onPartClick={onPartClick}
      onEmptyClick={onEmptyClick}
      catalogue={catalogue}
      className={className}
      testId="editor-canvas"
    >
      <OpeningTargets />
      <DrawProfileTool />
      <MoveGizmo />
      <HoverPicker />
    </DesignViewer>
  );
}
