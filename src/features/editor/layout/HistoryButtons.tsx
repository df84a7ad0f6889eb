import { Redo2, Undo2 } from 'lucide-react';
import { useEditorHistory, useEditorStore } from '../store/editorStore';
import { isMacPlatform } from '../hooks/shortcutList';
import { ToolbarButton } from './ToolbarButton';

/** Undo and redo, each naming the command it would reverse or repeat. */
export function HistoryButtons() {
  const { canUndo, canRedo, undoLabel, redoLabel } = useEditorHistory();
  const undo = useEditorStore((state) => state.undo);
  const redo = useEditorStore((state) => state.redo);
  const mod = isMacPlatform() ? '⌘' : 'Ctrl';
  return (
    <div className="flex items-center" role="group" aria-label="History">
      <ToolbarButton
        icon={<Undo2 aria-hidden className="size-5" />}
        label={canUndo ? `Undo ${undoLabel ?? 'last edit'}` : 'Nothing to undo'}
        title={canUndo ? `Undo: ${undoLabel ?? 'last edit'} (${mod}+Z)` : 'Nothing to undo'}
        iconOnly
        disabled={!canUndo}
        onClick={undo}
      />
      <ToolbarButton
        icon={<Redo2 aria-hidden className="size-5" />}
        label={canRedo ? `Redo ${redoLabel ?? 'edit'}` : 'Nothing to redo'}
        title={canRedo ? `Redo: ${redoLabel ?? 'edit'} (${mod}+Shift+Z)` : 'Nothing to redo'}
        iconOnly
        disabled={!canRedo}
        onClick={redo}
      />
    </div>
  );
}
